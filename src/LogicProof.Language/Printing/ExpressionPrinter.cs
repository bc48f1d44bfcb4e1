using System.Text;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Printing;

/// <summary>
/// Writes an expression with the fewest parentheses that keep its structure under <see cref="OperatorPrecedence"/>:
/// a child binding less tightly than its parent is parenthesised, and so is a child of equal strength on the side
/// its operator does not associate to (the right for left-associative operators, the left for ->).
/// Recursive: callers run it on a large stack.
/// </summary>
internal static class ExpressionPrinter
{
    public static void Write(StringBuilder output, ExpressionSyntax expression)
    {
        switch (expression)
        {
            case BoolLiteralSyntax b:
                output.Append(b.Value ? "TRUE" : "FALSE");
                break;
            case NumberLiteralSyntax n:
                output.Append(NumberText.Format(n.Value, n.Text));
                break;
            case DurationLiteralSyntax d:
                output.Append(d.Duration.Text);
                break;
            case NameSyntax name:
                output.Append(name.Name);
                break;
            case UnarySyntax unary:
                output.Append(OperatorSpelling.Of(unary.Operator));
                if (unary.Operator == UnaryOperator.Not)
                {
                    output.Append(' ');
                }

                WriteOperand(output, unary.Operand, OperatorPrecedence.Of(unary.Operand) < OperatorPrecedence.Prefix);
                break;
            case BinarySyntax binary:
                WriteBinary(output, binary);
                break;
            case CallSyntax call:
                WriteCall(output, call);
                break;
            default:
                throw new InvalidOperationException($"unknown expression form {expression.GetType().Name}");
        }
    }

    /// <summary>Writes a left-leaning chain (a AND b AND c ...) bottom-up in a loop, so its length costs no stack.</summary>
    private static void WriteBinary(StringBuilder output, BinarySyntax binary)
    {
        var spine = new List<BinarySyntax> { binary };
        while (spine[^1].Left is BinarySyntax left && !LeftNeedsParentheses(spine[^1].Operator, left))
        {
            spine.Add(left);
        }

        var bottom = spine[^1];
        WriteOperand(output, bottom.Left, LeftNeedsParentheses(bottom.Operator, bottom.Left));
        for (var i = spine.Count - 1; i >= 0; i--)
        {
            var node = spine[i];
            var precedence = OperatorPrecedence.Of(node.Operator);
            var right = OperatorPrecedence.Of(node.Right);
            output.Append(' ').Append(OperatorSpelling.Of(node.Operator)).Append(' ');
            WriteOperand(output, node.Right, right < precedence || (right == precedence && !OperatorPrecedence.IsRightAssociative(node.Operator)));
        }
    }

    private static bool LeftNeedsParentheses(BinaryOperator parent, ExpressionSyntax left)
    {
        var precedence = OperatorPrecedence.Of(parent);
        var child = OperatorPrecedence.Of(left);
        return child < precedence || (child == precedence && OperatorPrecedence.IsRightAssociative(parent));
    }

    private static void WriteCall(StringBuilder output, CallSyntax call)
    {
        output.Append(call.Callee).Append('(');
        for (var i = 0; i < call.Arguments.Count; i++)
        {
            if (i > 0)
            {
                output.Append(", ");
            }

            var argument = call.Arguments[i];
            if (argument.Name is not null)
            {
                output.Append(argument.Name).Append(" := ");
            }

            Write(output, argument.Value);
        }

        output.Append(')');
    }

    private static void WriteOperand(StringBuilder output, ExpressionSyntax operand, bool parenthesise)
    {
        if (parenthesise)
        {
            output.Append('(');
        }

        Write(output, operand);
        if (parenthesise)
        {
            output.Append(')');
        }
    }
}
