using LogicProof.Core.Diagnostics;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>The scan model of a scheme, or null when it cannot be built (then the diagnostics hold an error).</summary>
public sealed record ModelBuildResult(ScanModel? Model, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool HasErrors => Diagnostics.Any(d => d.IsError);
}
