using LogicProof.Core.Diagnostics;

namespace LogicProof.Language.Tests.Support;

/// <summary>Helpers to load scheme text in tests and to show diagnostics when an assertion fails.</summary>
internal static class Scheme
{
    public const string Header = "scheme T;\nfrequency 60 Hz;\nscan 2 ms;\n";

    public static FrontEndResult Load(string text) => FrontEnd.LoadText("test.lpl", text);

    /// <summary>Loads <see cref="Header"/> followed by <paramref name="body"/>, so line numbers in the body start at 4.</summary>
    public static FrontEndResult LoadBody(string body) => Load(Header + body);

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join("\n", diagnostics.Select(d => DiagnosticFormatter.Format(d, null)));

    public static FrontEndResult LoadValid(string text)
    {
        var result = Load(text);
        Assert.True(!result.HasErrors && result.Scheme is not null, Describe(result.Diagnostics));
        return result;
    }
}
