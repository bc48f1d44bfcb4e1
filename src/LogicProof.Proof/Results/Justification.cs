namespace LogicProof.Proof.Results;

/// <summary>
/// Why the property cell is FALSE at the failing scan: a tree whose root is the property cell; each node names the
/// equation that computed a cell, the terms of it that decided the value, and, a few levels deep, the same for the
/// cells those terms read.
/// </summary>
public sealed record Justification(JustificationNode Root);
