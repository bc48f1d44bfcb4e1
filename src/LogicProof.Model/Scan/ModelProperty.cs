using LogicProof.Core.Text;

namespace LogicProof.Model.Scan;

public enum PropertyOrigin
{
    /// <summary>A <c>require</c> formula written in the scheme.</summary>
    Requirement,

    /// <summary>A built-in close-supervision rule applied through the scheme's roles.</summary>
    Rule,
}

/// <summary>A bool cell that must be TRUE at every scan of every input sequence that satisfies the assumptions.</summary>
public sealed record ModelProperty(string Name, int Cell, PropertyOrigin Origin, SourceSpan Span)
{
    public string? Statement { get; init; }
}

/// <summary>
/// A bool cell that restricts the input sequences considered: a sequence counts only up to (and including) the
/// first scan where an assumption would be FALSE, that is, only scans at which every assumption has held so far.
/// </summary>
public sealed record ModelAssumption(string? Name, int Cell, SourceSpan Span);
