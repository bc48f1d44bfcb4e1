using LogicProof.Core.Text;

namespace LogicProof.Core.Diagnostics;

/// <summary>
/// One finding about a source file. The code is stable across releases (tests and CI filters key on it);
/// the message is for people and may be reworded. Related spans name other places involved, for example the
/// equation that writes a name which an earlier equation reads.
/// </summary>
public sealed record Diagnostic(string Code, Severity Severity, string Message, SourceSpan Span)
{
    public IReadOnlyList<RelatedLocation> Related { get; init; } = [];

    public bool IsError => Severity == Severity.Error;
}
