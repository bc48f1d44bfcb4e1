namespace LogicProof.Model.Rules;

/// <summary>
/// The fixed role names (the examples and users' schemes use them, so they never change) and the words of the two
/// policy roles. Device numbers in descriptions follow IEEE C37.2.
/// </summary>
public static class RoleNames
{
    public const string CloseOutput = "close_output";
    public const string CloseCommand = "close_command";
    public const string Lockout = "lockout";
    public const string LockoutResetLocal = "lockout_reset_local";
    public const string LockoutResetRemote = "lockout_reset_remote";
    public const string LockoutResetPolicy = "lockout_reset_policy";
    public const string BreakerClosed = "breaker_closed";
    public const string BreakerOpen = "breaker_open";
    public const string SyncPermissive = "sync_permissive";
    public const string DeadPermissive = "dead_permissive";
    public const string LowGas = "low_gas";
    public const string LowGasPolicy = "low_gas_policy";
    public const string SpringCharged = "spring_charged";
    public const string TripCommand = "trip_command";
    public const string TripOutput = "trip_output";
    public const string CloseFailTime = "close_fail_time";
    public const string TripCircuitHealthy = "trip_circuit_healthy";
    public const string TripCircuitAlarm = "trip_circuit_alarm";
    public const string TripCircuitAlarmTime = "trip_circuit_alarm_time";

    /// <summary>lockout_reset_policy: only the local reset input may clear the lockout.</summary>
    public const string LocalOnly = "local_only";

    /// <summary>lockout_reset_policy: the local or the remote reset input may clear the lockout.</summary>
    public const string LocalOrRemote = "local_or_remote";

    /// <summary>low_gas_policy: low gas trips the breaker.</summary>
    public const string TripOnLowGas = "trip";

    /// <summary>low_gas_policy: low gas blocks the trip output (a breaker without enough gas must not interrupt).</summary>
    public const string BlockTripOnLowGas = "block_trip";
}
