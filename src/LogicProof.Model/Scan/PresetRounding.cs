using Fractions;
using LogicProof.Core.Text;

namespace LogicProof.Model.Scan;

/// <summary>A duration converted to scans: the exact quotient and the whole number used (rounded up).</summary>
public sealed record PresetRounding(string Text, Fraction ExactScans, int Scans, SourceSpan Span)
{
    public bool WasRounded => ExactScans != new Fraction(Scans);
}
