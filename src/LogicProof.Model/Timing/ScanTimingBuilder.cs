using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Syntax;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Timing;

/// <summary>
/// Turns the header's power frequency and scan interval into an exact <see cref="ScanTiming"/>. A scan interval
/// given in cycles is converted with the frequency: cycles / frequency seconds (a quarter cycle at 60 Hz is
/// exactly 1/240 s).
/// </summary>
public static class ScanTimingBuilder
{
    public static ScanTiming? Build(SchemeSyntax scheme, DiagnosticBag diagnostics) =>
        Build(scheme.FrequencyHz, scheme.ScanInterval, scheme.Span, diagnostics);

    /// <param name="frequencySpan">Where the frequency is written (the header), for the diagnostic.</param>
    public static ScanTiming? Build(Fraction frequencyHz, DurationSyntax scanInterval, SourceSpan frequencySpan, DiagnosticBag diagnostics)
    {
        if (!IsPositive(frequencyHz))
        {
            diagnostics.Error(
                ModelCodes.FrequencyNotPositive,
                $"the power frequency must be greater than zero, but it is {ExactNumberText.FormatExact(frequencyHz)} Hz",
                frequencySpan);
            return null;
        }

        var milliseconds = DurationConverter.ToMilliseconds(scanInterval, frequencyHz);
        if (!IsPositive(milliseconds))
        {
            diagnostics.Error(
                ModelCodes.ScanIntervalNotPositive,
                $"the scan interval must be greater than zero, but it is '{scanInterval.Text}'",
                scanInterval.Span);
            return null;
        }

        return new ScanTiming(frequencyHz, milliseconds);
    }

    private static bool IsPositive(Fraction value) =>
        !value.IsNaN && !value.IsInfinity && value.CompareTo(Fraction.Zero) > 0;
}
