using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// A bool fact about one state (a bool slot, or a comparison of a counter with a constant) that mined relations are
/// made of, with its text.
/// </summary>
internal sealed record Atom(string Text, LemmaExpression Expression)
{
    public Atom Negated => new("NOT " + Operand, new LemmaNot(Expression));

    /// <summary>The text as an operand of a longer one: in parentheses unless it is a single name.</summary>
    public string Operand => Text.Contains(' ', StringComparison.Ordinal) ? $"({Text})" : Text;
}
