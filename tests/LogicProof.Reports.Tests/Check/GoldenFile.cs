using System.Runtime.CompilerServices;
using System.Text;

namespace LogicProof.Reports.Tests.Check;

/// <summary>
/// Compares rendered output with a golden file in <c>Golden/NAME.expected</c> (the copy in the test output folder
/// when the project copies it there, else the one in the source tree). On a mismatch the actual output is written
/// next to the source golden as <c>NAME.actual</c> and the assertion shows the first differing lines. Setting
/// LOGICPROOF_UPDATE_GOLDEN=1 rewrites the golden instead (review the diff before committing it).
/// </summary>
internal static class GoldenFile
{
    private const int ContextLines = 3;

    public static void AssertMatches(string name, string actual, [CallerFilePath] string callerPath = "")
    {
        var sourceGolden = Path.Combine(Path.GetDirectoryName(callerPath) ?? ".", "..", "Golden", name + ".expected");
        var outputGolden = Path.Combine(AppContext.BaseDirectory, "Golden", name + ".expected");
        if (Environment.GetEnvironmentVariable("LOGICPROOF_UPDATE_GOLDEN") == "1")
        {
            File.WriteAllText(sourceGolden, actual, new UTF8Encoding(false));
            return;
        }

        var golden = File.Exists(outputGolden) ? outputGolden : sourceGolden;
        Assert.True(File.Exists(golden), $"golden file {name}.expected is missing; run with LOGICPROOF_UPDATE_GOLDEN=1 to create it.");
        var expected = File.ReadAllText(golden).ReplaceLineEndings("\n");
        if (expected == actual)
        {
            return;
        }

        var actualPath = Path.ChangeExtension(File.Exists(sourceGolden) ? sourceGolden : golden, ".actual");
        File.WriteAllText(actualPath, actual, new UTF8Encoding(false));
        Assert.Fail($"output differs from {name}.expected (actual written to {actualPath}):\n{Difference(expected, actual)}");
    }

    /// <summary>The first differing line with a few lines of context, expected lines as -, actual as +.</summary>
    public static string Difference(string expected, string actual)
    {
        var expectedLines = expected.Split('\n');
        var actualLines = actual.Split('\n');
        var first = 0;
        while (first < expectedLines.Length && first < actualLines.Length && expectedLines[first] == actualLines[first])
        {
            first++;
        }

        var text = new StringBuilder();
        for (var i = Math.Max(0, first - ContextLines); i < first; i++)
        {
            text.Append("  ").Append(i + 1).Append(": ").Append(expectedLines[i]).Append('\n');
        }

        for (var i = first; i < Math.Min(expectedLines.Length, first + ContextLines); i++)
        {
            text.Append("- ").Append(i + 1).Append(": ").Append(expectedLines[i]).Append('\n');
        }

        for (var i = first; i < Math.Min(actualLines.Length, first + ContextLines); i++)
        {
            text.Append("+ ").Append(i + 1).Append(": ").Append(actualLines[i]).Append('\n');
        }

        return text.ToString();
    }
}
