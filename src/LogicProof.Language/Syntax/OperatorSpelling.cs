namespace LogicProof.Language.Syntax;

/// <summary>How operators are written in canonical source: keywords in upper case, symbols as they are.</summary>
internal static class OperatorSpelling
{
    public static string Of(BinaryOperator op) => op switch
    {
        BinaryOperator.Implies => "->",
        BinaryOperator.Since => "SINCE",
        BinaryOperator.Or => "OR",
        BinaryOperator.Xor => "XOR",
        BinaryOperator.And => "AND",
        BinaryOperator.Equal => "=",
        BinaryOperator.NotEqual => "<>",
        BinaryOperator.Less => "<",
        BinaryOperator.LessOrEqual => "<=",
        BinaryOperator.Greater => ">",
        BinaryOperator.GreaterOrEqual => ">=",
        BinaryOperator.Add => "+",
        BinaryOperator.Subtract => "-",
        BinaryOperator.Multiply => "*",
        BinaryOperator.Divide => "/",
        _ => throw new ArgumentOutOfRangeException(nameof(op), op, null),
    };

    public static string Of(UnaryOperator op) => op == UnaryOperator.Not ? "NOT" : "-";
}
