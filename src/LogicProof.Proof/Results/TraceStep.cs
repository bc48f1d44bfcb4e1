using Fractions;

namespace LogicProof.Proof.Results;

/// <summary>
/// One row of a counterexample: <paramref name="ScanCount"/> consecutive scans starting at scan
/// <paramref name="FirstScan"/> (0-based) at <paramref name="StartMilliseconds"/> from power-up, under the same
/// inputs, during which every cell keeps the value listed (only timer counters advance, one per scan).
/// <paramref name="Memories"/> are the state slots at the start of the row's first scan.
/// </summary>
public sealed record TraceStep(
    long FirstScan,
    long ScanCount,
    Fraction StartMilliseconds,
    IReadOnlyList<NamedValue> Inputs,
    IReadOnlyList<NamedValue> Cells,
    IReadOnlyList<NamedValue> Memories)
{
    public long LastScan => FirstScan + ScanCount - 1;
}
