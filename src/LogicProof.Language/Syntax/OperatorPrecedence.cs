namespace LogicProof.Language.Syntax;

/// <summary>
/// Binding strength of the operators, lowest first: -> (right-associative), SINCE, OR, XOR, AND, the comparisons,
/// + and -, * and /, then the prefix operators NOT and unary minus, which bind tightest. All binary operators but
/// -> associate to the left. The syntax-tree builder and the printer both use this table.
/// </summary>
public static class OperatorPrecedence
{
    public const int Prefix = 9;

    /// <summary>Higher than any operator: names, literals and calls never need parentheses.</summary>
    public const int Primary = 10;

    public static int Of(BinaryOperator op) => op switch
    {
        BinaryOperator.Implies => 1,
        BinaryOperator.Since => 2,
        BinaryOperator.Or => 3,
        BinaryOperator.Xor => 4,
        BinaryOperator.And => 5,
        BinaryOperator.Equal or BinaryOperator.NotEqual or BinaryOperator.Less or BinaryOperator.LessOrEqual
            or BinaryOperator.Greater or BinaryOperator.GreaterOrEqual => 6,
        BinaryOperator.Add or BinaryOperator.Subtract => 7,
        BinaryOperator.Multiply or BinaryOperator.Divide => 8,
        _ => throw new ArgumentOutOfRangeException(nameof(op), op, null),
    };

    public static bool IsRightAssociative(BinaryOperator op) => op == BinaryOperator.Implies;

    public static int Of(ExpressionSyntax expression) => expression switch
    {
        BinarySyntax binary => Of(binary.Operator),
        UnarySyntax => Prefix,
        _ => Primary,
    };
}
