using Fractions;
using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

/// <summary>
/// A duration as written: an IEC 61131-3 literal (<c>T#1s200ms</c>) or a number with a unit (<c>2 ms</c>, <c>0.5 s</c>,
/// <c>30 cyc</c>). Exactly one of <see cref="Milliseconds"/> and <see cref="Cycles"/> is set; cycles become time only
/// once the power frequency is known, so the conversion to scans belongs to the model.
/// </summary>
public sealed record DurationSyntax(Fraction? Milliseconds, Fraction? Cycles, string Text, SourceSpan Span)
{
    public static DurationSyntax FromMilliseconds(Fraction ms, string text, SourceSpan span) => new(ms, null, text, span);

    public static DurationSyntax FromCycles(Fraction cycles, string text, SourceSpan span) => new(null, cycles, text, span);
}
