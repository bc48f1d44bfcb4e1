namespace LogicProof.Proof.Engines;

public enum EngineKind
{
    /// <summary>Bounded model checking: finds the shortest violation, never proves.</summary>
    Bmc,

    /// <summary>k-induction: proves with an induction depth, and finds violations through its base case.</summary>
    KInduction,

    /// <summary>Property-directed reachability (Z3 Spacer over constrained Horn clauses).</summary>
    Pdr,
}
