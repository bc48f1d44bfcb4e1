namespace LogicProof.Proof.Results;

/// <summary>The property fails on <paramref name="Trace"/>, which has been replayed in the simulator.</summary>
public sealed record Violated(Counterexample Trace, string Engine) : PropertyVerdict;
