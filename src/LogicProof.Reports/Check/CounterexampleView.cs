using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Reports.Check;

/// <summary>
/// A counterexample with what a reader needs beside it: the scheme and property names, the scan timing, the
/// columns to show (<see cref="Signals"/>, grouped by role: inputs, outputs, internal cells, timer counters, the
/// property) and the latches the trace starts at a chosen power-up value. Built by
/// <see cref="CheckReportBuilder"/> from the model that was checked; every export reads only this.
/// </summary>
public sealed record CounterexampleView(
    string SchemeName,
    string PropertyName,
    ScanTiming Timing,
    string Engine,
    IReadOnlyList<TraceSignal> Signals,
    Counterexample Trace)
{
    public IReadOnlyList<PowerUpNote> PowerUp { get; init; } = [];

    /// <summary>The time at which the failing scan starts, in ms from power-up.</summary>
    public Fractions.Fraction FailingMilliseconds => Timing.TimeOfScan(Trace.FailingScan);

    /// <summary>The time at which the failing scan ends, in ms from power-up: the length of the trace.</summary>
    public Fractions.Fraction EndMilliseconds => Timing.TimeOfScan(Trace.FailingScan + 1);
}
