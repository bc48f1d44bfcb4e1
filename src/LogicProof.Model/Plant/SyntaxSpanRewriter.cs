using LogicProof.Core.Text;
using LogicProof.Language.Syntax;

namespace LogicProof.Model.Plant;

/// <summary>
/// Moves every span of a generated expression onto one place of the user's file (the breaker_model line it comes
/// from), so that any diagnostic about generated text points where the user can act. Recursive: only for the small
/// expressions the breaker model writes.
/// </summary>
internal static class SyntaxSpanRewriter
{
    public static ExpressionSyntax Remap(ExpressionSyntax expression, SourceSpan span) => expression switch
    {
        BoolLiteralSyntax b => b with { Span = span },
        NumberLiteralSyntax n => n with { Span = span },
        DurationLiteralSyntax d => d with { Duration = d.Duration with { Span = span }, Span = span },
        NameSyntax name => name with { Span = span },
        UnarySyntax unary => unary with { Operand = Remap(unary.Operand, span), Span = span },
        BinarySyntax binary => binary with { Left = Remap(binary.Left, span), Right = Remap(binary.Right, span), Span = span },
        CallSyntax call => call with
        {
            CalleeSpan = span,
            Arguments = [.. call.Arguments.Select(a => a with { Value = Remap(a.Value, span), Span = span })],
            Span = span,
        },
        _ => throw new InvalidOperationException($"unknown expression form {expression.GetType().Name}"),
    };
}
