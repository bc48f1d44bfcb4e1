namespace LogicProof.Proof.Results;

/// <summary>A term of an equation as text, written with the scheme's names, and its value at the scan.</summary>
public sealed record JustifyingTerm(string Text, TraceValue Value);
