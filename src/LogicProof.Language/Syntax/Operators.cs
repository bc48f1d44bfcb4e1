namespace LogicProof.Language.Syntax;

public enum UnaryOperator
{
    Not,
    Negate,
}

/// <summary>Binary operators, lowest precedence first within each group as the grammar defines them.</summary>
public enum BinaryOperator
{
    Implies,
    Since,
    Or,
    Xor,
    And,
    Equal,
    NotEqual,
    Less,
    LessOrEqual,
    Greater,
    GreaterOrEqual,
    Add,
    Subtract,
    Multiply,
    Divide,
}
