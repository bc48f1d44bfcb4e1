using Fractions;
using LogicProof.Proof.Results;

namespace LogicProof.Reports.Check;

/// <summary>
/// A counterexample as a grid: one row per trace step, one column per signal of the view, with each value looked
/// up once. A value is marked changed when it differs from the row above; timer counters are never marked, since
/// they advance on their own.
/// </summary>
internal sealed class TraceGrid
{
    private readonly TraceValue?[][] _values;

    public TraceGrid(CounterexampleView view)
    {
        View = view;
        _values = [.. view.Trace.Steps.Select(step => Lookup(view.Signals, step))];
    }

    public CounterexampleView View { get; }

    public IReadOnlyList<TraceSignal> Signals => View.Signals;

    public IReadOnlyList<TraceStep> Rows => View.Trace.Steps;

    public int FailingRow => View.Trace.FailingStep;

    public TraceValue? Value(int row, int signal) => _values[row][signal];

    public bool Changed(int row, int signal) =>
        row > 0 && Signals[signal].Role != TraceSignalRole.Timer && !Same(_values[row][signal], _values[row - 1][signal]);

    /// <summary>How long the row lasts: its scans times the scan interval.</summary>
    public Fraction Duration(int row) => View.Timing.ScanMilliseconds * Rows[row].ScanCount;

    /// <summary>Whether the value equals the one in force before the trace started (bools FALSE, numbers 0).</summary>
    public static bool IsRest(TraceValue? value) => value switch
    {
        BoolTraceValue b => !b.Value,
        RealTraceValue r => r.Value.CompareTo(Fraction.Zero) == 0,
        CounterTraceValue c => c.Scans == 0,
        _ => true,
    };

    public static bool Same(TraceValue? left, TraceValue? right) => (left, right) switch
    {
        (RealTraceValue a, RealTraceValue b) => a.Value.CompareTo(b.Value) == 0,
        _ => Equals(left, right),
    };

    private static TraceValue?[] Lookup(IReadOnlyList<TraceSignal> signals, TraceStep step)
    {
        var inputs = ByIndex(step.Inputs);
        var cells = ByIndex(step.Cells);
        var memories = ByIndex(step.Memories);
        return [.. signals.Select(signal => (signal.Role switch
        {
            TraceSignalRole.Input => inputs,
            TraceSignalRole.Timer => memories,
            _ => cells,
        }).GetValueOrDefault(signal.Index))];
    }

    private static Dictionary<int, TraceValue> ByIndex(IReadOnlyList<NamedValue> values)
    {
        var byIndex = new Dictionary<int, TraceValue>(values.Count);
        foreach (var value in values)
        {
            byIndex[value.Index] = value.Value;
        }

        return byIndex;
    }
}
