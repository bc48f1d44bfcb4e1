using LogicProof.Core.Text;

namespace LogicProof.Model.Plant;

/// <summary>
/// The checked settings of a <c>breaker_model</c> block. <see cref="TripFree"/> and <see cref="CloseIntoFault"/>
/// are FALSE when not written; <see cref="CloseIntoFaultDelay"/> is set exactly when <see cref="CloseIntoFault"/> is
/// TRUE. <see cref="Span"/> is the whole block.
/// </summary>
public sealed record BreakerModelSettings(
    BreakerTimeRange ClosingTime,
    BreakerTimeRange OpeningTime,
    bool TripFree,
    bool CloseIntoFault,
    BreakerTimeRange? CloseIntoFaultDelay,
    SourceSpan Span);
