using System.Globalization;
using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Syntax;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Timing;

/// <summary>
/// Converts durations to whole scans for one scan timing. The exact number of scan intervals is
/// duration / scan interval as a rational; a timer counts whole scans, so it uses the ceiling (a preset is never
/// shortened). Example: 25 ms at a quarter-cycle scan at 60 Hz (1/240 s) is exactly 6 scans; at a 2 ms scan it is
/// 12.5, used as 13 (and reported as rounded).
/// </summary>
public sealed class DurationConverter(ScanTiming timing)
{
    /// <summary>The largest preset a timer may have, in scans: a counter of this size never overflows an int.</summary>
    public const int MaxPresetScans = 1_000_000_000;

    public ScanTiming Timing { get; } = timing;

    /// <summary>A duration in exact milliseconds; cycles are converted with the power frequency (1000 / f ms each).</summary>
    public static Fraction ToMilliseconds(DurationSyntax duration, Fraction frequencyHz)
    {
        if (duration.Milliseconds is { } milliseconds)
        {
            return milliseconds;
        }

        if (duration.Cycles is { } cycles)
        {
            return cycles * new Fraction(1000) / frequencyHz;
        }

        throw new InvalidOperationException($"the duration '{duration.Text}' has neither milliseconds nor cycles");
    }

    public Fraction ToMilliseconds(DurationSyntax duration) => ToMilliseconds(duration, Timing.FrequencyHz);

    /// <summary>The duration in scan intervals, exactly.</summary>
    public Fraction ExactScans(DurationSyntax duration) => ToMilliseconds(duration) / Timing.ScanMilliseconds;

    /// <summary>
    /// The duration in whole scans (rounded up), or null with an error when it is negative or longer than
    /// <see cref="MaxPresetScans"/>.
    /// </summary>
    public PresetRounding? Convert(DurationSyntax duration, DiagnosticBag diagnostics)
    {
        var exact = ExactScans(duration);
        var scans = ExactArithmetic.Ceiling(exact);
        if (scans.Sign < 0 || scans > MaxPresetScans)
        {
            diagnostics.Error(
                ModelCodes.PresetTooLong,
                string.Create(
                    CultureInfo.InvariantCulture,
                    $"the duration '{duration.Text}' is {ExactNumberText.FormatExact(exact)} scan intervals of " +
                    $"{ExactNumberText.FormatForDisplay(Timing.ScanMilliseconds)} ms; a timer can count from 0 to {MaxPresetScans} scans"),
                duration.Span);
            return null;
        }

        return new PresetRounding(duration.Text, exact, (int)scans, duration.Span);
    }
}
