using LogicProof.Model.Scan;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Marks the PreviousValue slot of a declared variable until the feedback analysis has decided its power-up;
/// none may remain in a finished model.
/// </summary>
internal sealed record PendingPowerUp : PowerUp
{
    public static PendingPowerUp Instance { get; } = new();
}
