using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// A simulation to render: the scheme, its timing, the number of scans run, the columns, and the rows (one per
/// scan, or only scan 0 and the scans where a column changed). <see cref="Rows"/> is produced lazily while it is
/// enumerated, so a long run streams; enumerate it once.
/// </summary>
public sealed record SimulationRun(
    string SchemeName,
    ScanTiming Timing,
    long ScanCount,
    bool ChangesOnly,
    IReadOnlyList<SimulationColumn> Columns,
    IEnumerable<SimulationRow> Rows);
