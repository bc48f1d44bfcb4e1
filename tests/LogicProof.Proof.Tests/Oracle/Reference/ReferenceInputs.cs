using Fractions;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>The inputs of one scan, by the input's position in the declaration order; only the array of its type is read.</summary>
internal sealed record ReferenceInputs(bool[] Bools, Fraction[] Reals);
