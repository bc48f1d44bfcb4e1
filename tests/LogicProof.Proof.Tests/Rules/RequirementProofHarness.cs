using LogicProof.Model.Scan;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>Checks one <c>require</c> of a scheme (with its roles and breaker model applied) with the portfolio, as <see cref="RuleProofHarness"/> checks a rule.</summary>
internal static class RequirementProofHarness
{
    public static async Task<PropertyVerdict> RequirementAsync(string text, string name)
    {
        var (model, _) = RuleProofHarness.Load(text);
        var property = model.Properties.Single(p => p.Name == name && p.Origin == PropertyOrigin.Requirement);
        var result = await new PortfolioChecker().CheckPropertyAsync(model, property, RuleProofHarness.Options);
        return result.Verdict;
    }
}
