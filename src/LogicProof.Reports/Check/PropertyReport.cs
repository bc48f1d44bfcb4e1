using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Reports.Check;

/// <summary>
/// The verdict on one requirement or built-in rule. <see cref="Span"/> is where a finding is located: the
/// <c>require</c> for a requirement, the close output's equation for a rule. <see cref="Counterexample"/> is set
/// exactly when <see cref="Verdict"/> is <see cref="Violated"/>.
/// </summary>
public sealed record PropertyReport(
    string Name,
    PropertyOrigin Origin,
    string? Statement,
    SourceSpan Span,
    PropertyVerdict Verdict,
    TimeSpan Elapsed)
{
    public CounterexampleView? Counterexample { get; init; }
}
