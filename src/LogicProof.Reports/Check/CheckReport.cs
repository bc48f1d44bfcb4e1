namespace LogicProof.Reports.Check;

/// <summary>
/// Everything one <c>check</c> run found, ready to render: the tool and solver versions, one entry per checked file
/// in the order given, and the run summary with its exit code. Renderers only read it; they never check anything.
/// Every format carries <see cref="SafetyStatement.Text"/>.
/// </summary>
public sealed record CheckReport(
    string ToolVersion,
    string Z3Version,
    IReadOnlyList<FileCheckReport> Files,
    CheckRunSummary Summary);
