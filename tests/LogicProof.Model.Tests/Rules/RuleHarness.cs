using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Rules;

/// <summary>Loads invented test schemes, applies the rules (and the breaker model) and simulates the result.</summary>
internal static class RuleHarness
{
    public const string Header = """
        // Quillmere 115 kV substation (fictional)
        scheme QM5_TEST;
        frequency 60 Hz;
        scan 2 ms;

        """;

    public static BoundScheme Bind(string text)
    {
        var front = FrontEnd.LoadText("test.lpl", text);
        return front.Scheme ?? throw new InvalidOperationException(Describe(front.Diagnostics));
    }

    public static RuleSetupResult Setup(string text, RuleSelection? selection = null) => RuleSetup.Prepare(Bind(text), selection);

    /// <summary>The model of the scheme with the selected rules as properties; any error fails the test.</summary>
    public static ScanModel Model(string text, RuleSelection? selection = null)
    {
        var setup = Setup(text, selection);
        if (setup.ModelScheme is null)
        {
            throw new InvalidOperationException(Describe(setup.Diagnostics));
        }

        var built = ModelBuilder.Build(setup.ModelScheme, setup.ExtraProperties);
        return built.Model ?? throw new InvalidOperationException(Describe(built.Diagnostics));
    }

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join(Environment.NewLine, diagnostics.Select(d => DiagnosticFormatter.Format(d, null)));
}
