using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>Applies the built-in rules to an invented scheme and checks them with the portfolio, within a short time limit.</summary>
internal static class RuleProofHarness
{
    public static readonly CheckOptions Options = new() { TimeLimitPerProperty = TimeSpan.FromSeconds(30), MaxParallelProperties = 2 };

    /// <summary>The model with the selected rules as properties; any error fails the test.</summary>
    public static (ScanModel Model, RuleSetupResult Setup) Load(string text, params string[] ruleIds)
    {
        var front = FrontEnd.LoadText("rules.lpl", text);
        if (front.Scheme is null)
        {
            throw new InvalidOperationException(SchemeLoader.Describe(front.Diagnostics));
        }

        var setup = RuleSetup.Prepare(front.Scheme, ruleIds.Length == 0 ? null : new RuleSelection(ruleIds, []));
        if (setup.ModelScheme is null)
        {
            throw new InvalidOperationException(SchemeLoader.Describe(setup.Diagnostics));
        }

        var built = ModelBuilder.Build(setup.ModelScheme, setup.ExtraProperties);
        return (built.Model ?? throw new InvalidOperationException(SchemeLoader.Describe(built.Diagnostics)), setup);
    }

    public static async Task<PropertyVerdict> CheckAsync(string text, string ruleId)
    {
        var (model, _) = Load(text, ruleId);
        var property = model.Properties.Single(p => p.Name == ruleId && p.Origin == PropertyOrigin.Rule);
        var result = await new PortfolioChecker().CheckPropertyAsync(model, property, Options);
        return result.Verdict;
    }

    public static async Task<Counterexample> ViolationAsync(string text, string ruleId)
    {
        var verdict = await CheckAsync(text, ruleId);
        return Assert.IsType<Violated>(verdict).Trace;
    }

    /// <summary>The bool value of an input or cell at the failing scan.</summary>
    public static bool AtFailure(Counterexample trace, string name) => At(trace.Steps[trace.FailingStep], name);

    /// <summary>The bool value of an input or cell at every scan from power-up, as '1' and '0'.</summary>
    public static string Wave(Counterexample trace, string name) =>
        string.Concat(trace.Steps.Select(step => new string(At(step, name) ? '1' : '0', (int)step.ScanCount)));

    public static string Replace(string text, string from, string to)
    {
        Assert.Contains(from, text, StringComparison.Ordinal);
        return text.Replace(from, to, StringComparison.Ordinal);
    }

    private static bool At(TraceStep step, string name)
    {
        var value = step.Inputs.Concat(step.Cells).FirstOrDefault(v => v.Name == name)
            ?? throw new InvalidOperationException($"'{name}' is not in the trace");
        return Assert.IsType<BoolTraceValue>(value.Value).Value;
    }
}
