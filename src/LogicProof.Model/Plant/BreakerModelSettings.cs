using LogicProof.Core.Text;

namespace LogicProof.Model.Plant;

/// <summary>
/// The checked settings of a <c>breaker_model</c> block. <see cref="TripFree"/> and <see cref="CloseIntoFault"/>
/// are FALSE when not written; <see cref="CloseIntoFaultDelay"/> is set exactly when <see cref="CloseIntoFault"/> is
/// TRUE. <see cref="Span"/> is the whole block. The failure options (all FALSE or null when not written, which gives
/// exactly the healthy breaker) add behaviours the checker may choose: see <see cref="BreakerProgramWriter"/>.
/// </summary>
public sealed record BreakerModelSettings(
    BreakerTimeRange ClosingTime,
    BreakerTimeRange OpeningTime,
    bool TripFree,
    bool CloseIntoFault,
    BreakerTimeRange? CloseIntoFaultDelay,
    SourceSpan Span)
{
    /// <summary><c>fails_to_close</c>: the mechanism may ignore the close coil (close-fail paths are exercised).</summary>
    public bool FailsToClose { get; init; }

    /// <summary><c>fails_to_trip</c>: the mechanism may ignore the trip coil (breaker-failure paths are exercised).</summary>
    public bool FailsToTrip { get; init; }

    /// <summary><c>spring_recharge_time</c>: a close discharges the closing spring, which recharges within this range; the spring_charged input becomes model-driven.</summary>
    public BreakerTimeRange? SpringRechargeTime { get; init; }

    /// <summary><c>travel_contacts_free</c>: during travel 52a and 52b each take any value (they may agree).</summary>
    public bool TravelContactsFree { get; init; }

    /// <summary><c>aux_contact_fault</c>: 52a or 52b may fail at any scan and then stay at one value, whatever the breaker does.</summary>
    public bool AuxContactFault { get; init; }
}
