using Fractions;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Traces;

/// <summary>
/// One row of an input trace: from <see cref="TimeMs"/> on (until the next row), the inputs hold
/// <see cref="Inputs"/>, every input's value and not only the ones the row changed. <see cref="Line"/> is the
/// row's 1-based line in the CSV file, or 0 for a row that was not read from a file.
/// </summary>
public sealed record InputTraceRow(Fraction TimeMs, ScanInputs Inputs)
{
    public int Line { get; init; }
}
