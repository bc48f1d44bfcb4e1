namespace LogicProof.Model.Rules;

/// <summary>What a role may be bound to.</summary>
public enum RoleValueKind
{
    /// <summary>Names of bool inputs, locals or outputs.</summary>
    Signal,

    /// <summary>The name of a bool local or output: something the scheme itself computes (a coil output, an alarm).</summary>
    ComputedSignal,

    /// <summary>A duration literal (<c>T#500ms</c>, <c>30 cyc</c>) or a setting of type time.</summary>
    Duration,

    /// <summary>One word out of the role's choices.</summary>
    Policy,
}
