using LogicProof.Core.Diagnostics;
using LogicProof.Model.Scan;

namespace LogicProof.Reports.Check;

/// <summary>
/// The findings for one scheme file. <see cref="SchemeName"/> and <see cref="Timing"/> are null when the file could
/// not be read or modelled (then <see cref="Diagnostics"/> says why and there are no properties).
/// <see cref="BreakerModelled"/> says whether the breaker's 52a/52b followed a breaker model or were free inputs;
/// every format prints the matching sentence from <see cref="ReportSentences.Breaker"/>.
/// </summary>
public sealed record FileCheckReport(
    string Path,
    string? SchemeName,
    ScanTiming? Timing,
    IReadOnlyList<Diagnostic> Diagnostics,
    IReadOnlyList<PropertyReport> Properties)
{
    /// <summary>The scan interval and power frequency for people, e.g. "scan 2 ms, 60 Hz".</summary>
    public string ScanTimingText { get; init; } = Timing is null ? string.Empty : ScanTimingDescription.Describe(Timing);

    public IReadOnlyList<NotApplicableRule> NotApplicableRules { get; init; } = [];

    public IReadOnlyList<PowerUpNote> PowerUpNotes { get; init; } = [];

    public bool BreakerModelled { get; init; }
}
