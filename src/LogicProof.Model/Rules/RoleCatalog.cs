namespace LogicProof.Model.Rules;

/// <summary>
/// Every role, in the order the <c>rules --explain</c> output and the documentation list them. Device numbers are
/// IEEE C37.2 standard device function numbers: 25 synchronism check, 52 ac circuit breaker (52a/52b its auxiliary
/// contacts), 63 pressure switch, 79 ac reclosing relay, 86 lockout relay, 94 tripping or trip-free relay.
/// </summary>
public static class RoleCatalog
{
    public static IReadOnlyList<RoleDefinition> All { get; } =
    [
        new(RoleNames.CloseOutput, RoleValueKind.ComputedSignal, false, "the close coil output"),
        new(RoleNames.CloseCommand, RoleValueKind.Signal, true, "the close commands: control switch, remote control, 79 reclosing relay"),
        new(RoleNames.Lockout, RoleValueKind.Signal, false, "86 lockout relay operated"),
        new(RoleNames.LockoutResetLocal, RoleValueKind.Signal, true, "the local manual reset of the 86 lockout"),
        new(RoleNames.LockoutResetRemote, RoleValueKind.Signal, true, "the remote operator reset of the 86 lockout"),
        new(RoleNames.LockoutResetPolicy, RoleValueKind.Policy, false, "who may reset the 86 lockout")
        {
            Choices = [RoleNames.LocalOnly, RoleNames.LocalOrRemote],
        },
        new(RoleNames.BreakerClosed, RoleValueKind.Signal, false, "52a breaker auxiliary contact: TRUE when the breaker is closed"),
        new(RoleNames.BreakerOpen, RoleValueKind.Signal, false, "52b breaker auxiliary contact: TRUE when the breaker is open"),
        new(RoleNames.SyncPermissive, RoleValueKind.Signal, true, "25 synchronism-check permissive (live line, live bus, in synchronism)"),
        new(RoleNames.DeadPermissive, RoleValueKind.Signal, true, "dead-line or dead-bus close permissive, as enabled by the scheme"),
        new(RoleNames.LowGas, RoleValueKind.Signal, true, "63 pressure switch: gas pressure or density too low"),
        new(RoleNames.LowGasPolicy, RoleValueKind.Policy, false, "what low gas does to the trip output")
        {
            Choices = [RoleNames.TripOnLowGas, RoleNames.BlockTripOnLowGas],
        },
        new(RoleNames.SpringCharged, RoleValueKind.Signal, false, "the closing spring is charged"),
        new(RoleNames.TripCommand, RoleValueKind.Signal, true, "the trip commands: protection, control switch, remote control"),
        new(RoleNames.TripOutput, RoleValueKind.ComputedSignal, false, "the trip coil output (the 94 tripping function)"),
        new(RoleNames.CloseFailTime, RoleValueKind.Duration, false, "the longest time the close coil may stay energised (close-fail time)"),
        new(RoleNames.TripCircuitHealthy, RoleValueKind.Signal, false, "trip-circuit continuity is seen"),
        new(RoleNames.TripCircuitAlarm, RoleValueKind.ComputedSignal, false, "the trip-circuit supervision alarm"),
        new(RoleNames.TripCircuitAlarmTime, RoleValueKind.Duration, false, "the longest time a loss of trip-circuit continuity may last before the alarm"),
    ];

    private static readonly Dictionary<string, RoleDefinition> ByName =
        All.ToDictionary(role => role.Name, StringComparer.OrdinalIgnoreCase);

    public static RoleDefinition? Find(string name) => ByName.GetValueOrDefault(name);
}
