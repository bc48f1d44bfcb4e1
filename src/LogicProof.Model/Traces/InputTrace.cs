using System.Numerics;
using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Traces;

/// <summary>
/// Input values over time for one model, as rows that each hold from their time until the next row. Scan k starts
/// at k·Δ ms (Δ the model's scan interval, exact) and sees the last row whose time is at most k·Δ; before the first
/// row every input is at its <see cref="InitialInputs"/> (FALSE, and 0 or the range end nearest 0 for reals).
/// <para>
/// Run length (<see cref="ScanCount"/>): with an explicit end time E (the END row, or <c>--until</c>, which wins),
/// the scans that start before E, that is ⌈E/Δ⌉ scans; without one, the run ends after the scan in which the
/// last row takes effect, that is ⌈T/Δ⌉ + 1 scans for the last row's time T.
/// </para>
/// </summary>
public sealed class InputTrace
{
    /// <summary>The largest time accepted, in ms (about 31 years): keeps every scan number within a long.</summary>
    public static readonly Fraction MaxTimeMs = new(1_000_000_000_000L);

    /// <summary>
    /// The longest run a caller should start: 50 million scans, about 28 hours of relay time at 2 ms scans. A longer
    /// run is almost always a mistyped time, and would keep the machine busy for hours.
    /// </summary>
    public const long MaxScans = 50_000_000;

    public InputTrace(ScanModel model, ScanInputs initialInputs, IReadOnlyList<InputTraceRow> rows, Fraction? endMs)
    {
        ArgumentNullException.ThrowIfNull(model);
        for (var i = 1; i < rows.Count; i++)
        {
            if (rows[i].TimeMs.CompareTo(rows[i - 1].TimeMs) < 0)
            {
                throw new ArgumentException("rows must be in non-decreasing time order.", nameof(rows));
            }
        }

        Model = model;
        InitialInputs = initialInputs;
        Rows = rows;
        EndMs = endMs;
    }

    public ScanModel Model { get; }

    /// <summary>The inputs in force before the first row.</summary>
    public ScanInputs InitialInputs { get; }

    public IReadOnlyList<InputTraceRow> Rows { get; }

    /// <summary>The time of the END row: the run covers the scans that start before it.</summary>
    public Fraction? EndMs { get; }

    /// <summary>The first scan that starts at or after <paramref name="timeMs"/>: ⌈t/Δ⌉.</summary>
    public static long FirstScanAtOrAfter(Fraction timeMs, ScanTiming timing)
    {
        var scans = ExactArithmetic.Ceiling(timeMs / timing.ScanMilliseconds);
        return (long)BigInteger.Max(scans, BigInteger.Zero);
    }

    /// <summary>Number of scans of the run, as described on the class; <paramref name="untilMs"/> overrides the trace.</summary>
    public long ScanCount(Fraction? untilMs = null)
    {
        var timing = Model.Timing;
        if ((untilMs ?? EndMs) is { } end)
        {
            return FirstScanAtOrAfter(end, timing);
        }

        return Rows.Count == 0 ? 0 : FirstScanAtOrAfter(Rows[^1].TimeMs, timing) + 1;
    }

    /// <summary>
    /// The inputs of each scan 0 .. <paramref name="scanCount"/> - 1. The same instance is returned for every scan a
    /// row is in force; callers read it and must not change it.
    /// </summary>
    public IEnumerable<ScanInputs> InputsPerScan(long scanCount)
    {
        var firstScanOfRow = Rows.Select(row => FirstScanAtOrAfter(row.TimeMs, Model.Timing)).ToArray();
        var current = InitialInputs;
        var nextRow = 0;
        for (long scan = 0; scan < scanCount; scan++)
        {
            while (nextRow < Rows.Count && firstScanOfRow[nextRow] <= scan)
            {
                current = Rows[nextRow].Inputs;
                nextRow++;
            }

            yield return current;
        }
    }

    /// <summary>The inputs of a model before any row: bools FALSE, reals 0 or, if 0 is outside the range, the nearest end.</summary>
    public static ScanInputs DefaultInputs(ScanModel model)
    {
        var inputs = new ScanInputs(model);
        foreach (var cell in model.Inputs.Where(cell => model.Cells[cell].Type == SignalType.Real))
        {
            inputs.SetReal(cell, DefaultReal(model.Cells[cell]));
        }

        return inputs;
    }

    internal static Fraction DefaultReal(Cell cell)
    {
        if (cell.Type != SignalType.Real || cell.Range is not { } range)
        {
            return Fraction.Zero;
        }

        if (range.Low.CompareTo(Fraction.Zero) > 0)
        {
            return range.Low;
        }

        return range.High.CompareTo(Fraction.Zero) < 0 ? range.High : Fraction.Zero;
    }
}
