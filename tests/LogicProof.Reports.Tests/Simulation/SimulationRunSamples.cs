using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Tests.Simulation;

/// <summary>A small invented run (breaker QM-7 of the fictional Quillmere 115 kV substation), built by hand.</summary>
internal static class SimulationRunSamples
{
    public static SimulationRun QuarterCycleRun(bool changesOnly = false)
    {
        // Scans of 25/6 ms (a quarter cycle at 60 Hz): scan starts without a finite decimal form.
        var timing = new ScanTiming(60, new Fraction(25, 6));
        var columns = new List<SimulationColumn>
        {
            new("CS_CLOSE", 0, SimulationColumnKind.Input, SignalType.Bool),
            new("SLIP_HZ", 1, SimulationColumnKind.Input, SignalType.Real),
            new("CLOSE_OUT", 2, SimulationColumnKind.Output, SignalType.Bool),
            new("DV_PU", 3, SimulationColumnKind.Shown, SignalType.Real),
        };
        var rows = new List<SimulationRow>
        {
            Row(0, timing, [SignalValue.Of(false), SignalValue.Of(new Fraction(1, 10)), SignalValue.Of(false), SignalValue.Of(new Fraction(1, 3))], [false, false, false, false]),
            Row(1, timing, [SignalValue.Of(true), SignalValue.Of(new Fraction(1, 10)), SignalValue.Of(true), SignalValue.Of(new Fraction(1, 3))], [true, false, true, false]),
            Row(2, timing, [SignalValue.Of(true), SignalValue.Of(new Fraction(-1, 20)), SignalValue.Of(true), SignalValue.Of(new Fraction(3, 10))], [false, true, false, true]),
        };
        return new SimulationRun("QM7_CLOSE", timing, 3, changesOnly, columns, rows);
    }

    private static SimulationRow Row(long scan, ScanTiming timing, SignalValue[] values, bool[] changed) =>
        new(scan, timing.TimeOfScan(scan), values, changed);
}
