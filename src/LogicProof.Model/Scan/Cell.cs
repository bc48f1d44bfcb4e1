using Fractions;
using LogicProof.Core.Text;

namespace LogicProof.Model.Scan;

/// <summary>
/// One named value that exists at every scan: an input, a declared variable, or a value the model introduces.
/// A cell is written by at most one step; an input by none.
/// </summary>
public sealed record Cell(int Index, string Name, CellKind Kind, SignalType Type, SourceSpan Span)
{
    public string? Description { get; init; }

    public bool IsOutput { get; init; }

    /// <summary>Declared variables only: <c>init retained</c>, a non-volatile memory whose power-up value is unknown.</summary>
    public bool IsRetained { get; init; }

    /// <summary>Real inputs only: the declared range, both ends included.</summary>
    public (Fraction Low, Fraction High)? Range { get; init; }
}
