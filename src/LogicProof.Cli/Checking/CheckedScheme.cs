using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Reports.Check;

namespace LogicProof.Cli.Checking;

/// <summary>One file's report, with the source (for diagnostic excerpts) and the model (for trace exports).</summary>
public sealed record CheckedScheme(FileCheckReport Report, SourceText Source, ScanModel? Model);
