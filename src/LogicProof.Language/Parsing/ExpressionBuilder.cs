using Antlr4.Runtime;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Builds expression syntax from the parse tree with the precedence of <see cref="OperatorPrecedence"/>, without
/// recursing along operator chains. The shape of the parse tree is not trusted: ANTLR binds the alternative listed
/// first tightest, and grammar/LogicProof.g4 lists the loosest operator (->) first, so the generated parser groups
/// <c>NOT a AND b</c> as <c>NOT (a AND b)</c>. The builder therefore reads the operands and operators of one
/// parenthesis level in source order (walking the parse tree with an explicit stack) and combines them by
/// precedence climbing with two stacks. This is right whatever shape the parser produced, and long chains such as
/// 200,000 ANDs (a parse tree 200,000 levels deep) cost no stack. Recursion happens only into parentheses and call
/// arguments, whose depth the nesting guard has bounded.
/// </summary>
internal sealed class ExpressionBuilder(SourceText source, LiteralReader literals)
{
    public ExpressionSyntax Build(LogicProofParser.ExprContext root)
    {
        var operands = new Stack<Operand>();
        var operators = new Stack<Operator>();

        // Walks the parse tree in source order with an explicit stack: a pending item is either an expression
        // context still to be opened or an operator token to hand to the precedence climbing.
        var pending = new Stack<Pending>();
        pending.Push(new Pending(root, default));
        while (pending.Count > 0)
        {
            var item = pending.Pop();
            switch (item.Context)
            {
                case null:
                    Accept(item.Operator, operands, operators);
                    break;
                case LogicProofParser.PrimaryExprContext primaryExpr:
                    operands.Push(BuildPrimary(primaryExpr.primary()));
                    break;
                case LogicProofParser.UnaryExprContext unary:
                    pending.Push(new Pending(unary.operand, default));
                    operators.Push(new Operator(unary.op, default, unary.op.Type == LogicProofParser.NOT ? UnaryOperator.Not : UnaryOperator.Negate, IsPrefix: true));
                    break;
                default:
                    var (left, op, right) = Split(item.Context);
                    pending.Push(new Pending(right, default));
                    pending.Push(new Pending(null, new Operator(op, ToBinary(op), default, IsPrefix: false)));
                    pending.Push(new Pending(left, default));
                    break;
            }
        }

        while (operators.Count > 0)
        {
            Reduce(operands, operators.Pop());
        }

        return operands.Pop().Node;
    }

    /// <summary>A binary operator arrives: first combine what binds at least as tightly on its left.</summary>
    private void Accept(Operator binary, Stack<Operand> operands, Stack<Operator> operators)
    {
        while (operators.Count > 0 && ReducesBefore(operators.Peek(), binary))
        {
            Reduce(operands, operators.Pop());
        }

        operators.Push(binary);
    }

    private static bool ReducesBefore(Operator onStack, Operator incoming)
    {
        if (onStack.IsPrefix)
        {
            return true;
        }

        var stacked = OperatorPrecedence.Of(onStack.Binary);
        var next = OperatorPrecedence.Of(incoming.Binary);
        return stacked > next || (stacked == next && !OperatorPrecedence.IsRightAssociative(incoming.Binary));
    }

    private void Reduce(Stack<Operand> operands, Operator op)
    {
        if (op.IsPrefix)
        {
            var operand = operands.Pop();
            var span = source.Between(op.Token.StartIndex, operand.End);
            operands.Push(new Operand(new UnarySyntax(op.Unary, operand.Node, span), op.Token.StartIndex, operand.End));
            return;
        }

        var right = operands.Pop();
        var left = operands.Pop();
        var binarySpan = source.Between(left.Start, right.End);
        operands.Push(new Operand(new BinarySyntax(op.Binary, left.Node, right.Node, binarySpan), left.Start, right.End));
    }

    private static (LogicProofParser.ExprContext Left, IToken Op, LogicProofParser.ExprContext Right) Split(LogicProofParser.ExprContext context) =>
        context switch
        {
            LogicProofParser.ImpliesExprContext c => (c.left, c.IMPLIES().Symbol, c.right),
            LogicProofParser.SinceExprContext c => (c.left, c.SINCE().Symbol, c.right),
            LogicProofParser.OrExprContext c => (c.left, c.OR().Symbol, c.right),
            LogicProofParser.XorExprContext c => (c.left, c.XOR().Symbol, c.right),
            LogicProofParser.AndExprContext c => (c.left, c.AND().Symbol, c.right),
            LogicProofParser.CompareExprContext c => (c.left, c.op, c.right),
            LogicProofParser.AdditiveExprContext c => (c.left, c.op, c.right),
            LogicProofParser.MultiplicativeExprContext c => (c.left, c.op, c.right),
            _ => throw new InvalidOperationException($"unknown expression form {context.GetType().Name}"),
        };

    private static BinaryOperator ToBinary(IToken op) => op.Type switch
    {
        LogicProofParser.IMPLIES => BinaryOperator.Implies,
        LogicProofParser.SINCE => BinaryOperator.Since,
        LogicProofParser.OR => BinaryOperator.Or,
        LogicProofParser.XOR => BinaryOperator.Xor,
        LogicProofParser.AND => BinaryOperator.And,
        LogicProofParser.EQ => BinaryOperator.Equal,
        LogicProofParser.NEQ => BinaryOperator.NotEqual,
        LogicProofParser.LT => BinaryOperator.Less,
        LogicProofParser.LE => BinaryOperator.LessOrEqual,
        LogicProofParser.GT => BinaryOperator.Greater,
        LogicProofParser.GE => BinaryOperator.GreaterOrEqual,
        LogicProofParser.PLUS => BinaryOperator.Add,
        LogicProofParser.MINUS => BinaryOperator.Subtract,
        LogicProofParser.STAR => BinaryOperator.Multiply,
        LogicProofParser.SLASH => BinaryOperator.Divide,
        _ => throw new InvalidOperationException($"unknown operator token {op.Type}"),
    };

    private Operand BuildPrimary(LogicProofParser.PrimaryContext context)
    {
        var start = context.Start.StartIndex;
        var end = context.Stop.StopIndex + 1;
        var span = source.Between(start, end);
        ExpressionSyntax node = context switch
        {
            LogicProofParser.ParenPrimaryContext paren => Build(paren.expr()),
            LogicProofParser.TruePrimaryContext => new BoolLiteralSyntax(true, span),
            LogicProofParser.FalsePrimaryContext => new BoolLiteralSyntax(false, span),
            LogicProofParser.NumberPrimaryContext number => new NumberLiteralSyntax(literals.Number(number.NUMBER().Symbol), source.TextOf(number.NUMBER().Symbol), span),
            LogicProofParser.DurationPrimaryContext duration => new DurationLiteralSyntax(literals.Duration(duration.duration()), span),
            LogicProofParser.NamePrimaryContext name => new NameSyntax(source.TextOf(name.IDENT().Symbol), span),
            LogicProofParser.CallPrimaryContext call => BuildCall(call, span),
            _ => throw new InvalidOperationException($"unknown primary form {context.GetType().Name}"),
        };
        return new Operand(node, start, end);
    }

    private CallSyntax BuildCall(LogicProofParser.CallPrimaryContext call, SourceSpan span)
    {
        var arguments = new List<ArgumentSyntax>();
        foreach (var argument in call.argument())
        {
            var name = argument.name is null ? null : source.TextOf(argument.name);
            arguments.Add(new ArgumentSyntax(name, Build(argument.expr()), source.SpanOf(argument)));
        }

        return new CallSyntax(source.TextOf(call.callee), source.SpanOf(call.callee), arguments, span);
    }

    /// <summary>A built operand with its source extent, which includes any parentheses around it.</summary>
    private readonly record struct Operand(ExpressionSyntax Node, int Start, int End);

    private readonly record struct Operator(IToken Token, BinaryOperator Binary, UnaryOperator Unary, bool IsPrefix);

    /// <summary>An expression context to open, or (when <see cref="Context"/> is null) an operator to accept.</summary>
    private readonly record struct Pending(LogicProofParser.ExprContext? Context, Operator Operator);
}
