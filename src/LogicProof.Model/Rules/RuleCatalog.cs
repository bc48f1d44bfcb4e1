using R = LogicProof.Model.Rules.RoleNames;

namespace LogicProof.Model.Rules;

/// <summary>
/// Every built-in close-supervision rule, written once, here, as data: id, statement, reason in the trade, roles
/// and formula templates (see <see cref="RuleTemplate"/> for the placeholder syntax). Each formula is a past-time
/// formula that must hold at every scan. A role bound to several names reads as <c>(A OR B)</c>. Ids are stable:
/// users switch rules on and off by id. Device numbers follow IEEE C37.2.
/// </summary>
public static class RuleCatalog
{
    public static IReadOnlyList<RuleDefinition> All { get; } =
    [
        new(
            "close-blocked-in-lockout",
            "The close output is never on while the 86 lockout is operated.",
            "An operated 86 lockout relay means that protection found a fault that must be inspected before the breaker is closed again; "
            + "closing into it can wreck the breaker and endanger the people sent to find the fault.",
            [R.CloseOutput, R.Lockout],
            [],
            [new("{lockout} -> NOT {close_output}")]),

        new(
            "lockout-reset-only",
            "An operated lockout clears only through its reset input: the local reset, or the local or remote reset, as lockout_reset_policy says.",
            "The 86 is latched so that a person decides to re-energise after a lockout-class trip; a lockout that drops out "
            + "by itself, or through any other signal, lets a close follow without that decision.",
            [R.Lockout, R.LockoutResetLocal],
            [R.LockoutResetRemote, R.LockoutResetPolicy],
            [
                new("FELL({lockout}) -> {lockout_reset_local} OR PREV({lockout_reset_local})")
                {
                    PolicyRole = R.LockoutResetPolicy, PolicyWord = R.LocalOnly, IsPolicyDefault = true,
                },
                new("FELL({lockout}) -> {lockout_reset_local} OR {lockout_reset_remote} OR PREV({lockout_reset_local} OR {lockout_reset_remote})")
                {
                    PolicyRole = R.LockoutResetPolicy, PolicyWord = R.LocalOrRemote, NeedsRoles = [R.LockoutResetRemote],
                },
            ])
        {
            ComputedRoles = [R.Lockout],
            DesignNote = "Applies to a lockout latch computed by the scheme; an external 86 seen through an input resets outside "
                         + "this logic. PREV lets the reset reach the latch one scan late (a read before its equation). Without "
                         + "lockout_reset_policy the stricter local_only is used. FELL compares with the previous scan, which "
                         + "reads FALSE before the first scan, so a lockout declared init TRUE that is already clear at the "
                         + "first scan is not seen falling.",
        },

        new(
            "close-starts-breaker-open",
            "A close starts only when the breaker reports open (52b) and not closed (52a).",
            "Energising the close coil of a breaker that is closed, or whose status is in doubt, drives the mechanism against its "
            + "latch and hides a status fault; a close must begin from a breaker known to be open.",
            [R.CloseOutput],
            [],
            [
                new("ROSE({close_output}) -> {breaker_open} AND NOT {breaker_closed}") { NeedsRoles = [R.BreakerOpen, R.BreakerClosed] },
                new("ROSE({close_output}) -> {breaker_open}") { NeedsRoles = [R.BreakerOpen] },
                new("ROSE({close_output}) -> NOT {breaker_closed}") { NeedsRoles = [R.BreakerClosed] },
            ])
        {
            OneOfRoles = [R.BreakerOpen, R.BreakerClosed],
        },

        new(
            "close-starts-in-sync",
            "A close starts only with the 25 synchronism-check permissive, or with a dead-line or dead-bus permissive the scheme enables.",
            "Closing two live systems out of synchronism gives current and torque surges that damage machines, transformers and the "
            + "breaker; only a dead side may be energised without a synchronism check.",
            [R.CloseOutput, R.SyncPermissive],
            [R.DeadPermissive],
            [new("ROSE({close_output}) -> {sync_permissive}[ OR {dead_permissive}]")]),

        new(
            "close-starts-healthy",
            "A close starts only with the gas pressure healthy (63 not operated) and the closing spring charged.",
            "With low gas the breaker may not interrupt the fault it could close onto, and a close started without a charged spring "
            + "stalls the mechanism part way.",
            [R.CloseOutput],
            [],
            [
                new("ROSE({close_output}) -> NOT {low_gas} AND {spring_charged}") { NeedsRoles = [R.LowGas, R.SpringCharged] },
                new("ROSE({close_output}) -> NOT {low_gas}") { NeedsRoles = [R.LowGas] },
                new("ROSE({close_output}) -> {spring_charged}") { NeedsRoles = [R.SpringCharged] },
            ])
        {
            OneOfRoles = [R.LowGas, R.SpringCharged],
        },

        new(
            "close-sealed-in",
            "Once started, the close output stays on until the breaker reports closed or the close-fail time has elapsed, even after "
            + "a momentary command; only a trip, a trip command or the lockout may end it sooner.",
            "A close pulse shorter than the mechanism's travel can leave the breaker part-closed; the seal-in holds the coil until "
            + "52a confirms the close, or the close-fail time shows that the breaker failed to close.",
            [R.CloseOutput, R.CloseFailTime, R.BreakerClosed],
            [R.TripOutput, R.TripCommand, R.Lockout],
            [
                new("PREV({close_output}) AND NOT HELD({close_output} OR PREV({close_output}), {close_fail_time})"
                    + "[ AND NOT {breaker_closed}][ AND NOT {trip_output}][ AND NOT {trip_command}][ AND NOT {lockout}]"
                    + " -> {close_output}"),
            ])
        {
            DesignNote = "Legitimate early ends: breaker closed (52a), the trip output, a trip command (it may drop the close although "
                         + "low gas blocks the trip output) and the lockout; each is left out when its role is unbound. Permissives "
                         + "(sync, gas, spring) are deliberately not reasons: they are checked when the close starts, and one that "
                         + "drops for a scan must not cut a close in progress. The close-fail time has elapsed once the output has "
                         + "been on for all of it: HELD(c OR PREV(c), d) is TRUE at the scan after n scans of c (n = d in scans, "
                         + "rounded up like a timer preset), the scan at which an output limited by TON(seal, d) drops. A one-scan "
                         + "gap in the output just before it restarted would count towards the time; a gap that is not itself "
                         + "a legitimate end is reported by this rule at the gap.",
        },

        new(
            "close-not-held-on",
            "The close output is never on for longer than the close-fail time.",
            "Close coils are rated for short duty: a coil held energised after a failed close overheats and burns out, and a close "
            + "output that stays on defeats anti-pumping.",
            [R.CloseOutput, R.CloseFailTime],
            [],
            [new("NOT HELD({close_output}, {close_fail_time})")])
        {
            DesignNote = "No one-scan tolerance: HELD(c, d) is TRUE at the scan after c has been on for all of d (d in scans, rounded "
                         + "up like a timer preset), so the output may be on for exactly the close-fail time and not one scan more, "
                         + "which an output gated by TON(seal, d) in the same scan meets exactly.",
        },

        new(
            "no-pumping",
            "After a close, a second close needs the close command to have been removed (every close command off at some scan) "
            + "since the last scan in which the close output and a close command were on together.",
            "If the breaker trips while a close command is still held (a stuck switch, an operator holding the handle, a close onto "
            + "a fault), a scheme without anti-pumping (the trip-free function of a 94) closes and trips again and again until "
            + "the breaker is destroyed; the command must be released before another close.",
            [R.CloseOutput, R.CloseCommand],
            [],
            [new("ROSE({close_output}) -> NOT PREV({close_command} SINCE ({close_output} AND {close_command}))")])
        {
            DesignNote = "Checked on small traces in the simulator: the form ROSE(c) AND PREV(ONCE(c)) -> PREV((NOT ROSE(c)) SINCE "
                         + "(NOT cmd)) misses a command released and pressed again while the first close is still sealed in, and a "
                         + "command that arrives after the close started. This form blocks on the command seen together with the "
                         + "close output, as the anti-pumping seal of a 94 trip-free relay does.",
        },

        new(
            "trip-not-blocked",
            "A trip command with the breaker closed reaches the trip output in the same scan; only low gas, with low_gas_policy = "
            + "block_trip, may block it.",
            "Close permissives, interlocks and status supervision belong to closing; a fault must be cleared whatever they say, "
            + "and a trip held back by a scan of logic is a slower clearance of every fault.",
            [R.TripCommand, R.TripOutput],
            [R.BreakerClosed, R.LowGasPolicy, R.LowGas],
            [
                new("{trip_command}[ AND {breaker_closed}] -> {trip_output}")
                {
                    PolicyRole = R.LowGasPolicy, PolicyWord = R.TripOnLowGas, IsPolicyDefault = true,
                },
                new("{trip_command}[ AND {breaker_closed}] AND NOT {low_gas} -> {trip_output}")
                {
                    PolicyRole = R.LowGasPolicy, PolicyWord = R.BlockTripOnLowGas, NeedsRoles = [R.LowGas],
                },
            ])
        {
            DesignNote = "Without breaker_closed every trip command must reach the trip output. Without low_gas_policy the stricter "
                         + "trip form is used.",
        },

        new(
            "trip-wins",
            "The close output and the trip output are never on together.",
            "With both coils energised the breaker is told to close and open at once; trip-free design means the trip must win, and "
            + "logic that drives both wastes the close and can pump the mechanism.",
            [R.CloseOutput, R.TripOutput],
            [],
            [new("NOT ({close_output} AND {trip_output})")]),

        new(
            "lockout-trips",
            "An operated lockout with the breaker closed drives the trip output.",
            "The 86 operates for faults that must be isolated and kept isolated; like the trip contacts of a hard-wired 86, an "
            + "operated lockout keeps the trip output on while the breaker is closed.",
            [R.Lockout, R.TripOutput],
            [R.BreakerClosed, R.LowGasPolicy, R.LowGas],
            [
                new("{lockout}[ AND {breaker_closed}] -> {trip_output}")
                {
                    PolicyRole = R.LowGasPolicy, PolicyWord = R.TripOnLowGas, IsPolicyDefault = true,
                },
                new("{lockout}[ AND {breaker_closed}] AND NOT {low_gas} -> {trip_output}")
                {
                    PolicyRole = R.LowGasPolicy, PolicyWord = R.BlockTripOnLowGas, NeedsRoles = [R.LowGas],
                },
            ]),

        new(
            "trip-circuit-supervised",
            "A loss of trip-circuit continuity with the breaker closed raises the supervision alarm within the stated time.",
            "A broken trip circuit is silent until the breaker fails to trip for a fault; supervision must alarm while there is "
            + "still time to repair it.",
            [R.TripCircuitHealthy, R.TripCircuitAlarm, R.TripCircuitAlarmTime],
            [R.BreakerClosed],
            [new("HELD(NOT {trip_circuit_healthy}[ AND {breaker_closed}], {trip_circuit_alarm_time}) -> {trip_circuit_alarm}")]),

        new(
            "low-gas-philosophy",
            "Low gas acts on the trip output as low_gas_policy says: it trips a closed breaker (trip), or it blocks the trip output "
            + "(block_trip).",
            "Both philosophies are in use: tripping while the gas can still interrupt leaves the breaker open and safe; blocking "
            + "prevents an interruption the breaker can no longer survive, and leaves the clearance to breaker-failure protection.",
            [R.LowGas, R.LowGasPolicy, R.TripOutput],
            [R.BreakerClosed],
            [
                new("{low_gas}[ AND {breaker_closed}] -> {trip_output}") { PolicyRole = R.LowGasPolicy, PolicyWord = R.TripOnLowGas },
                new("{low_gas} -> NOT {trip_output}") { PolicyRole = R.LowGasPolicy, PolicyWord = R.BlockTripOnLowGas },
            ]),
    ];

    private static readonly Dictionary<string, RuleDefinition> ById =
        All.ToDictionary(rule => rule.Id, StringComparer.OrdinalIgnoreCase);

    public static RuleDefinition? Find(string id) => ById.GetValueOrDefault(id);
}
