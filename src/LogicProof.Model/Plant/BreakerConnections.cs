namespace LogicProof.Model.Plant;

/// <summary>
/// The scheme's names the breaker model connects to: the coil outputs it obeys, the status inputs it drives (either
/// may be absent, not both), for close-into-fault the protection trip command it constrains, and, when the spring is
/// modelled, the spring-charged input it drives.
/// </summary>
public sealed record BreakerConnections(string CloseOutput, string TripOutput, string? ClosedStatus, string? OpenStatus, string? ProtectionTrip)
{
    public string? SpringStatus { get; init; }
}
