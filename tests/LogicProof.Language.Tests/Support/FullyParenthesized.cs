using System.Globalization;
using System.Text;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Tests.Support;

/// <summary>Renders an expression with every operation in parentheses, to show the shape of a tree in tests.</summary>
internal static class FullyParenthesized
{
    public static string Render(ExpressionSyntax expression)
    {
        var output = new StringBuilder();
        Write(output, expression);
        return output.ToString();
    }

    private static void Write(StringBuilder output, ExpressionSyntax expression)
    {
        switch (expression)
        {
            case NameSyntax name:
                output.Append(name.Name);
                break;
            case BoolLiteralSyntax b:
                output.Append(b.Value ? "TRUE" : "FALSE");
                break;
            case NumberLiteralSyntax n:
                output.Append(n.Value.ToString(CultureInfo.InvariantCulture));
                break;
            case DurationLiteralSyntax d:
                output.Append(d.Duration.Text);
                break;
            case UnarySyntax u:
                output.Append('(').Append(u.Operator == UnaryOperator.Not ? "NOT " : "-");
                Write(output, u.Operand);
                output.Append(')');
                break;
            case BinarySyntax b:
                output.Append('(');
                Write(output, b.Left);
                output.Append(' ').Append(b.Operator).Append(' ');
                Write(output, b.Right);
                output.Append(')');
                break;
            case CallSyntax c:
                output.Append(c.Callee).Append('[');
                for (var i = 0; i < c.Arguments.Count; i++)
                {
                    output.Append(i > 0 ? ", " : string.Empty).Append(c.Arguments[i].Name is { } n ? n + "=" : string.Empty);
                    Write(output, c.Arguments[i].Value);
                }

                output.Append(']');
                break;
        }
    }
}
