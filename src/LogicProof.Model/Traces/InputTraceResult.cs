using LogicProof.Core.Diagnostics;

namespace LogicProof.Model.Traces;

/// <summary>The trace read from a CSV file, or null if it had errors; the diagnostics (warnings too) either way.</summary>
public sealed record InputTraceResult(InputTrace? Trace, IReadOnlyList<Diagnostic> Diagnostics);
