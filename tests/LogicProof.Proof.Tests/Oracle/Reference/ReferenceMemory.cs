namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>Where one stateful node keeps its memory in <see cref="ReferenceState"/> (-1: not used), and its time in scans.</summary>
internal readonly record struct ReferenceMemory(int Flag, int SecondFlag, int Count, int Real, int Scans);
