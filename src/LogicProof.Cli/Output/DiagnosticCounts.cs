using System.Globalization;
using LogicProof.Core.Diagnostics;

namespace LogicProof.Cli.Output;

/// <summary>How many diagnostics of each severity a command printed, for its summary line.</summary>
public sealed record DiagnosticCounts(int Errors, int Warnings, int Notes)
{
    public static DiagnosticCounts None { get; } = new(0, 0, 0);

    public static DiagnosticCounts Of(IEnumerable<Diagnostic> diagnostics)
    {
        var list = diagnostics.ToList();
        return new DiagnosticCounts(
            list.Count(d => d.Severity == Severity.Error),
            list.Count(d => d.Severity == Severity.Warning),
            list.Count(d => d.Severity == Severity.Info));
    }

    public static DiagnosticCounts operator +(DiagnosticCounts left, DiagnosticCounts right) =>
        new(left.Errors + right.Errors, left.Warnings + right.Warnings, left.Notes + right.Notes);

    /// <summary>"2 errors, 1 warning, 0 notes".</summary>
    public override string ToString() =>
        $"{Plural(Errors, "error")}, {Plural(Warnings, "warning")}, {Plural(Notes, "note")}";

    private static string Plural(int count, string noun) =>
        count.ToString(CultureInfo.InvariantCulture) + " " + noun + (count == 1 ? string.Empty : "s");
}
