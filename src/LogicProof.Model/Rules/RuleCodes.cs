namespace LogicProof.Model.Rules;

/// <summary>
/// Diagnostic codes of the roles, the built-in rules and the breaker model (the LP6xxx range): LP600x roles,
/// LP602x rule selection and expansion, LP603x and LP604x the breaker model, LP605x warnings on settings and power-up
/// found before any proof. Codes are stable: tests and CI filters
/// key on them, and a code is never reused for a different meaning. Messages may be reworded.
/// </summary>
public static class RuleCodes
{
    /// <summary>Error: a role name that is not one of the fixed role names.</summary>
    public const string UnknownRole = "LP6001";

    /// <summary>Error: a role bound by two lines of the roles section; the first line is a related location.</summary>
    public const string RoleBoundTwice = "LP6002";

    /// <summary>Error: a role value of the wrong kind (a duration or TRUE/FALSE where names are expected, and so on).</summary>
    public const string RoleValueKind = "LP6003";

    /// <summary>Error: a role names something the scheme does not declare.</summary>
    public const string RoleNameUndeclared = "LP6004";

    /// <summary>Error: a signal role names a real, or a setting, where a bool input, local or output is needed.</summary>
    public const string RoleNeedsBoolSignal = "LP6005";

    /// <summary>Error: a role that takes one name is given several.</summary>
    public const string RoleTakesOneValue = "LP6006";

    /// <summary>Error: a policy role given a word that is not one of its choices.</summary>
    public const string UnknownPolicyWord = "LP6007";

    /// <summary>Error: an output role (close_output, trip_output, trip_circuit_alarm) names an input: it must be computed by the scheme.</summary>
    public const string RoleNeedsComputedSignal = "LP6008";

    /// <summary>Error: a time role that is not a duration literal or a setting of type time.</summary>
    public const string RoleNeedsDuration = "LP6009";

    /// <summary>Warning: the same name given twice to one role.</summary>
    public const string RoleNameRepeated = "LP6010";

    /// <summary>Error: a rule id given to --rules or --skip-rules that no built-in rule has.</summary>
    public const string UnknownRuleId = "LP6020";

    /// <summary>Internal error: a built-in rule's formula did not parse or bind against the scheme (a defect of ours).</summary>
    public const string RuleFormulaInvalid = "LP6021";

    /// <summary>Error: a key of the breaker_model block that is not one of its keys.</summary>
    public const string UnknownBreakerModelKey = "LP6030";

    /// <summary>Error: a breaker_model key given twice; the first is a related location.</summary>
    public const string BreakerModelKeyTwice = "LP6031";

    /// <summary>Error: a breaker_model value of the wrong kind (a duration range where TRUE/FALSE is needed, and so on).</summary>
    public const string BreakerModelValueKind = "LP6032";

    /// <summary>Error: a time range whose low end is above its high end, or whose high end is zero.</summary>
    public const string BreakerModelRangeInvalid = "LP6033";

    /// <summary>Error: a breaker_model key that is needed is missing (closing_time, opening_time, or close_into_fault_delay with close_into_fault = TRUE).</summary>
    public const string BreakerModelKeyMissing = "LP6034";

    /// <summary>Error: the breaker model needs a role that is not bound (close_output, trip_output, breaker_closed or breaker_open).</summary>
    public const string BreakerModelNeedsRole = "LP6035";

    /// <summary>Error: breaker_closed or breaker_open names a local or output; the breaker model can drive inputs only.</summary>
    public const string BreakerStatusNotInput = "LP6036";

    /// <summary>Warning: an assumption of the scheme reads a breaker status that the breaker model now drives.</summary>
    public const string AssumptionReadsModelledStatus = "LP6037";

    /// <summary>Error: close_into_fault = TRUE needs a trip_command role whose first name is an input.</summary>
    public const string CloseIntoFaultNeedsTripInput = "LP6038";

    /// <summary>Internal error: the generated breaker program did not parse or bind (a defect of ours).</summary>
    public const string BreakerProgramInvalid = "LP6039";

    /// <summary>Warning: a breaker travel time that is not a whole number of scans; it is rounded up, as a timer preset is.</summary>
    public const string BreakerTimeRounded = "LP6042";

    /// <summary>Warning: close_into_fault_delay is given while close_into_fault is not TRUE; it is ignored.</summary>
    public const string CloseIntoFaultDelayIgnored = "LP6043";

    /// <summary>Warning: close_fail_time is not longer than the breaker model's longest closing time, so a healthy slow close would be called a failure.</summary>
    public const string CloseFailNotAboveClosingTime = "LP6050";

    /// <summary>Warning: a lockout (86) declared init TRUE: it comes up operated and trips an in-service breaker at every relay restart.</summary>
    public const string LockoutOperatedAtPowerUp = "LP6051";
}
