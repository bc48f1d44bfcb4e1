using System.Runtime.CompilerServices;

namespace LogicProof.Language.Tests.Support;

/// <summary>Locates the repository and the scheme files the tests read.</summary>
internal static class TestFiles
{
    /// <summary>
    /// The folder holding LogicProof.sln, found by walking up from the test assembly; when the build output is
    /// outside the repository (an --artifacts-path elsewhere), from this source file's compile-time location.
    /// </summary>
    public static string RepositoryRoot([CallerFilePath] string sourceFile = "")
    {
        foreach (var start in new[] { AppContext.BaseDirectory, Path.GetDirectoryName(sourceFile) ?? string.Empty })
        {
            for (var directory = new DirectoryInfo(start); directory is not null; directory = directory.Parent)
            {
                if (File.Exists(Path.Combine(directory.FullName, "LogicProof.sln")))
                {
                    return directory.FullName;
                }
            }
        }

        throw new InvalidOperationException($"no LogicProof.sln above {AppContext.BaseDirectory} or {sourceFile}");
    }

    /// <summary>Every .lpl file under the repository's examples/ folder (none if the folder is missing).</summary>
    public static IReadOnlyList<string> Examples()
    {
        var examples = Path.Combine(RepositoryRoot(), "examples");
        return Directory.Exists(examples)
            ? Directory.GetFiles(examples, "*.lpl", SearchOption.AllDirectories).Order(StringComparer.Ordinal).ToList()
            : [];
    }

    /// <summary>The sample schemes copied next to the test assembly.</summary>
    public static IReadOnlyList<string> Samples() =>
        Directory.GetFiles(Path.Combine(AppContext.BaseDirectory, "Samples"), "*.lpl").Order(StringComparer.Ordinal).ToList();
}
