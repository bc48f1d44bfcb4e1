using System.Globalization;
using System.Numerics;
using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Proof.Tracing;

/// <summary>
/// Writes a scan expression with the scheme's names, for explanations. A read of the previous scan's value is
/// written <c>PREV(name)</c>; every compound operand is parenthesised, so no precedence rules are needed to read it.
/// </summary>
public static class ExpressionText
{
    public static string Write(ScanExpression expression, ScanModel model) => expression switch
    {
        BoolConstantExpression b => b.Value ? "TRUE" : "FALSE",
        RealConstantExpression r => Number(r.Value),
        CellReadExpression read => read.Timing == ReadTiming.Current
            ? model.Cells[read.Cell].Name
            : $"PREV({model.Cells[read.Cell].Name})",
        NotExpression not => $"NOT {Operand(not.Operand, model)}",
        AndExpression and => string.Join(" AND ", and.Operands.Select(o => Operand(o, model))),
        OrExpression or => string.Join(" OR ", or.Operands.Select(o => Operand(o, model))),
        XorExpression xor => $"{Operand(xor.Left, model)} XOR {Operand(xor.Right, model)}",
        ImpliesExpression implies => $"{Operand(implies.Left, model)} -> {Operand(implies.Right, model)}",
        CompareExpression compare => $"{Operand(compare.Left, model)} {Symbol(compare.Operator)} {Operand(compare.Right, model)}",
        AddExpression add => $"{Operand(add.Left, model)} + {Operand(add.Right, model)}",
        SubtractExpression subtract => $"{Operand(subtract.Left, model)} - {Operand(subtract.Right, model)}",
        NegateExpression negate => $"-{Operand(negate.Operand, model)}",
        ScaleExpression scale => $"{Number(scale.Factor)} * {Operand(scale.Operand, model)}",
        AbsExpression abs => $"ABS({Write(abs.Operand, model)})",
        MinExpression min => $"MIN({Write(min.Left, model)}, {Write(min.Right, model)})",
        MaxExpression max => $"MAX({Write(max.Left, model)}, {Write(max.Right, model)})",
        _ => expression.GetType().Name,
    };

    /// <summary>An exact number: a whole number, a terminating decimal, or numerator/denominator.</summary>
    public static string Number(Fraction value)
    {
        var reduced = value.Reduce();
        if (reduced.Denominator.IsOne)
        {
            return reduced.Numerator.ToString(CultureInfo.InvariantCulture);
        }

        var denominator = reduced.Denominator;
        var twos = 0;
        var fives = 0;
        while (denominator % 2 == 0)
        {
            denominator /= 2;
            twos++;
        }

        while (denominator % 5 == 0)
        {
            denominator /= 5;
            fives++;
        }

        if (!denominator.IsOne)
        {
            return reduced.ToString(CultureInfo.InvariantCulture);
        }

        // A terminating decimal: scale to a whole number and place the point, exactly.
        var places = Math.Max(twos, fives);
        var scaled = BigInteger.Abs(reduced.Numerator) * BigInteger.Pow(10, places) / reduced.Denominator;
        var digits = scaled.ToString(CultureInfo.InvariantCulture).PadLeft(places + 1, '0');
        var sign = reduced.Numerator.Sign < 0 ? "-" : string.Empty;
        return $"{sign}{digits[..^places]}.{digits[^places..]}";
    }

    private static string Operand(ScanExpression expression, ScanModel model)
    {
        var text = Write(expression, model);
        return expression is BoolConstantExpression or RealConstantExpression or CellReadExpression
            or AbsExpression or MinExpression or MaxExpression
            ? text
            : $"({text})";
    }

    private static string Symbol(CompareOperator op) => op switch
    {
        CompareOperator.Equal => "=",
        CompareOperator.NotEqual => "<>",
        CompareOperator.Less => "<",
        CompareOperator.LessOrEqual => "<=",
        CompareOperator.Greater => ">",
        CompareOperator.GreaterOrEqual => ">=",
        _ => op.ToString(),
    };
}
