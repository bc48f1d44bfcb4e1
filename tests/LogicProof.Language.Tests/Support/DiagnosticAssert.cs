using LogicProof.Core.Diagnostics;

namespace LogicProof.Language.Tests.Support;

internal static class DiagnosticAssert
{
    /// <summary>Loads the marked text and checks that an error with <paramref name="code"/> is reported at the marker and no scheme is produced.</summary>
    public static FrontEndResult ErrorAtMarker(string code, string markedText)
    {
        var (text, line, column) = MarkedText.Split(markedText);
        var result = Scheme.Load(text);
        HasErrorAt(result, code, line, column);
        return result;
    }

    public static void HasErrorAt(FrontEndResult result, string code, int line, int column)
    {
        Assert.True(
            result.Diagnostics.Any(d => d.Code == code && d.Severity == Severity.Error && d.Span.Line == line && d.Span.Column == column),
            $"expected {code} at {line}:{column}; got:\n{Scheme.Describe(result.Diagnostics)}");
        Assert.Null(result.Scheme);
        Assert.True(result.HasErrors);
    }
}
