namespace LogicProof.Reports.Check;

/// <summary>What a column of a counterexample is; columns are grouped in this order.</summary>
public enum TraceSignalRole
{
    /// <summary>A scheme input, sampled once per scan.</summary>
    Input,

    /// <summary>A declared output of the scheme.</summary>
    Output,

    /// <summary>Any other cell of the property's cone of influence: a local, a function-block output, a monitor.</summary>
    Internal,

    /// <summary>A timer's scan counter at the start of the row (the only values that change inside an accelerated row).</summary>
    Timer,

    /// <summary>The property itself: TRUE at every row but the failing one.</summary>
    Property,
}
