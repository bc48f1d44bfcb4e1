namespace LogicProof.Proof.Orchestration;

/// <summary>Which engines check each property: all available ones as a portfolio, or one.</summary>
public enum EngineSelection
{
    /// <summary>Every available engine in parallel; the first conclusive verdict wins and the others are cancelled.</summary>
    Auto,

    Bmc,

    KInduction,

    Pdr,
}
