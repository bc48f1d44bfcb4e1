using LogicProof.Core.Text;

namespace LogicProof.Proof.Results;

/// <summary>
/// A cell's value at a scan and what made it: <paramref name="Equation"/> is the span of the equation (or the
/// declaration, for an input); <paramref name="Terms"/> are the deciding terms of that equation with their values
/// (for AND that is FALSE, the FALSE operands; for OR that is TRUE, the TRUE ones; for a function block, its inputs
/// and elapsed scans); <paramref name="Causes"/> explain the cells those terms read. <paramref name="Note"/> says
/// why a node is not explained further (an input, the power-up value, the depth limit).
/// </summary>
public sealed record JustificationNode(
    string Cell,
    TraceValue Value,
    long Scan,
    SourceSpan Equation,
    IReadOnlyList<JustifyingTerm> Terms,
    IReadOnlyList<JustificationNode> Causes)
{
    public string? Note { get; init; }
}
