namespace LogicProof.Model.Graph;

public enum DependencyVertexKind
{
    Input,
    Local,
    Output,

    /// <summary>One call site of a function block (TON, SR, ...), named <c>TARGET.KIND#n</c>.</summary>
    FunctionBlock,

    /// <summary>A <c>require</c> formula (only when formulas are asked for).</summary>
    Requirement,

    /// <summary>An <c>assume</c> formula (only when formulas are asked for).</summary>
    Assumption,
}
