using LogicProof.Model.Scan;

namespace LogicProof.Proof.Results;

/// <summary>The verdict on one property of the checked model, and the wall-clock time spent on it.</summary>
public sealed record PropertyResult(ModelProperty Property, PropertyVerdict Verdict, TimeSpan Elapsed);
