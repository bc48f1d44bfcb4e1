using System.Text;
using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Parsing;

/// <summary>Reads literal tokens: numbers (exact), texts in double quotes, durations and setting/init values.</summary>
internal sealed class LiteralReader(SourceText source, DiagnosticBag diagnostics)
{
    public string? Description(LogicProofParser.DescriptionContext? context) =>
        context is null ? null : Unquote(source.TextOf(context.STRING().Symbol));

    public Fraction Number(Antlr4.Runtime.IToken token) => DecimalNumber.Parse(source.TextOf(token));

    public (Fraction Value, string Text) SignedNumber(LogicProofParser.SignedNumberContext context)
    {
        var digits = source.TextOf(context.NUMBER().Symbol);
        var value = DecimalNumber.Parse(digits);
        return context.MINUS() is null ? (value, digits) : (-value, "-" + digits);
    }

    public ExpressionSyntax Literal(LogicProofParser.LiteralContext context)
    {
        var span = source.SpanOf(context);
        switch (context)
        {
            case LogicProofParser.TrueLiteralContext:
                return new BoolLiteralSyntax(true, span);
            case LogicProofParser.FalseLiteralContext:
                return new BoolLiteralSyntax(false, span);
            case LogicProofParser.NumberLiteralContext number:
                var (value, text) = SignedNumber(number.signedNumber());
                return new NumberLiteralSyntax(value, text, span);
            case LogicProofParser.DurationLiteralContext duration:
                return new DurationLiteralSyntax(Duration(duration.duration()), span);
            default:
                throw new InvalidOperationException($"unknown literal form {context.GetType().Name}");
        }
    }

    /// <summary>A duration; an invalid one is reported and read as 0 ms so that checking can go on.</summary>
    public DurationSyntax Duration(LogicProofParser.DurationContext context)
    {
        var span = source.SpanOf(context);
        switch (context)
        {
            case LogicProofParser.IecDurationContext iec:
            {
                var text = source.TextOf(iec.TIME_LITERAL().Symbol);
                var (milliseconds, error) = DurationParser.ParseIec(text);
                return Result(milliseconds, null, error, text, span);
            }

            case LogicProofParser.UnitDurationContext unit:
            {
                var number = source.TextOf(unit.NUMBER().Symbol);
                var unitText = source.TextOf(unit.unit);
                var (milliseconds, cycles, error) = DurationParser.ParseWithUnit(number, unitText);
                return Result(milliseconds, cycles, error, $"{number} {unitText}", span);
            }

            default:
                throw new InvalidOperationException($"unknown duration form {context.GetType().Name}");
        }
    }

    private DurationSyntax Result(Fraction? milliseconds, Fraction? cycles, string? error, string text, SourceSpan span)
    {
        if (error is not null)
        {
            diagnostics.Error(LanguageCodes.InvalidDuration, error, span);
            return DurationSyntax.FromMilliseconds(Fraction.Zero, text, span);
        }

        return cycles is { } c ? DurationSyntax.FromCycles(c, text, span) : DurationSyntax.FromMilliseconds(milliseconds ?? Fraction.Zero, text, span);
    }

    private static string Unquote(string quoted)
    {
        var inner = quoted.AsSpan(1, quoted.Length - 2);
        var builder = new StringBuilder(inner.Length);
        for (var i = 0; i < inner.Length; i++)
        {
            builder.Append(inner[i]);
            if (inner[i] == '"')
            {
                i++; // the second quote of an escaped pair
            }
        }

        return builder.ToString();
    }
}
