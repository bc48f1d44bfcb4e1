using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;
using LogicProof.Model.Simulation;
using LogicProof.Model.Timing;

namespace LogicProof.Model.StaticChecks;

/// <summary>
/// Checks at function-block call sites and formula windows: a timer preset (or HELD/WITHIN window) of zero scans,
/// or one that is not a whole number of scans (a timer counts whole scans, so it is rounded up); and F_TRIG, whose
/// output is TRUE at the first scan when its input is FALSE (IEC 61131-3: its memory starts FALSE and holds
/// NOT CLK).
/// </summary>
internal static class FunctionBlockCheck
{
    public static void Run(BoundScheme scheme, DiagnosticBag diagnostics)
    {
        var timing = ScanTimingBuilder.Build(scheme.Syntax, new DiagnosticBag());
        var converter = timing is null ? null : new DurationConverter(timing);
        var roots = scheme.Equations.Select(e => e.Expression)
            .Concat(scheme.Requirements.Select(r => r.Formula))
            .Concat(scheme.Assumptions.Select(a => a.Formula));
        foreach (var node in roots.SelectMany(BoundTree.PreOrder))
        {
            switch (node)
            {
                case BoundFunctionBlockCall { Kind: FunctionBlockKind.FTrig } fallingEdge:
                    diagnostics.Info(
                        ModelCodes.FallingEdgeAtPowerUp,
                        "this F_TRIG gives TRUE at the first scan if its input is FALSE then (IEC 61131-3: its memory starts " +
                        "FALSE), which looks like a falling edge at power-up",
                        fallingEdge.Span);
                    break;
                case BoundFunctionBlockCall { Preset: { } preset } timer when converter is not null:
                    CheckPreset(converter, preset, $"the preset of this {BoundTree.BlockName(timer.Kind)}", diagnostics);
                    break;
                case BoundTemporal { Window: { } window } temporal when converter is not null:
                    CheckPreset(converter, window, $"the window of this {BoundTree.TemporalName(temporal.Operator)}", diagnostics);
                    break;
            }
        }
    }

    private static void CheckPreset(DurationConverter converter, BoundDuration duration, string what, DiagnosticBag diagnostics)
    {
        var rounding = converter.Convert(duration.Value, new DiagnosticBag());
        if (rounding is null)
        {
            return;
        }

        var scanMs = ExactNumberText.FormatForDisplay(converter.Timing.ScanMilliseconds);
        if (rounding.Scans == 0)
        {
            diagnostics.Warning(
                ModelCodes.TimerPresetZero,
                $"{what} ('{duration.Value.Text}') is zero scans: it has no delay at all",
                duration.Span);
        }
        else if (rounding.WasRounded)
        {
            var usedMs = ExactNumberText.FormatForDisplay(converter.Timing.ScanMilliseconds * rounding.Scans);
            diagnostics.Warning(
                ModelCodes.TimerPresetRounded,
                string.Create(
                    CultureInfo.InvariantCulture,
                    $"{what} ('{duration.Value.Text}') is {ExactNumberText.FormatExact(rounding.ExactScans)} scan intervals of {scanMs} ms, " +
                    $"not a whole number: the timer counts {rounding.Scans} scans ({usedMs} ms)"),
                duration.Span);
        }
    }
}
