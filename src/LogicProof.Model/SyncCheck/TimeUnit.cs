namespace LogicProof.Model.SyncCheck;

public enum TimeUnit
{
    Milliseconds,
    Seconds,

    /// <summary>Cycles of the power frequency, so the length in seconds depends on that frequency.</summary>
    Cycles,
}
