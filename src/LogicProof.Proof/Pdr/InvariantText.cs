using System.Globalization;
using Microsoft.Z3;

namespace LogicProof.Proof.Pdr;

/// <summary>
/// Writes a Z3 formula over state-slot constants as readable text: infix operators, the slot names, exact numbers,
/// NOT/AND/OR/-> in capitals like the equation language, and each compound operand in parentheses.
/// </summary>
internal static class InvariantText
{
    public static string Write(Expr formula)
    {
        if (formula.IsTrue)
        {
            return "TRUE";
        }

        if (formula.IsFalse)
        {
            return "FALSE";
        }

        if (formula.IsIntNum || formula.IsRatNum)
        {
            return Number(formula);
        }

        if (formula.IsConst)
        {
            return formula.FuncDecl.Name.ToString();
        }

        var args = formula.Args;
        if (formula.IsNot)
        {
            return Negated(args[0]) ?? "NOT " + Operand(args[0]);
        }

        if (formula.IsAnd)
        {
            return Join(" AND ", args);
        }

        if (formula.IsOr)
        {
            return Join(" OR ", args);
        }

        if (formula.IsImplies)
        {
            return Join(" -> ", args);
        }

        if (formula.IsXor)
        {
            return Join(" XOR ", args);
        }

        if (formula.IsEq || formula.IsIff)
        {
            return Join(" = ", args);
        }

        if (formula.IsDistinct)
        {
            return Join(" <> ", args);
        }

        if (formula.IsLE)
        {
            return Join(" <= ", args);
        }

        if (formula.IsGE)
        {
            return Join(" >= ", args);
        }

        if (formula.IsLT)
        {
            return Join(" < ", args);
        }

        if (formula.IsGT)
        {
            return Join(" > ", args);
        }

        if (formula.IsAdd)
        {
            return Sum(args);
        }

        if (formula.IsSub)
        {
            return Join(" - ", args);
        }

        if (formula.IsMul)
        {
            return IsMinusOne(args[0]) && args.Length == 2 ? "-" + Operand(args[1]) : Join(" * ", args);
        }

        if (formula.IsUMinus)
        {
            return "-" + Operand(args[0]);
        }

        if (formula.IsITE)
        {
            return $"IF {Write(args[0])} THEN {Write(args[1])} ELSE {Write(args[2])}";
        }

        if (formula.IsIntToReal || formula.IsRealToInt)
        {
            return Write(args[0]);
        }

        // Anything else (rare in Spacer's answers) in the solver's own notation, still with the slot names.
        return formula.ToString();
    }

    /// <summary>A negated comparison written as the opposite comparison: NOT (a &lt;= b) is a &gt; b.</summary>
    private static string? Negated(Expr comparison)
    {
        var args = comparison.Args;
        return comparison.IsLE ? Join(" > ", args)
            : comparison.IsGE ? Join(" < ", args)
            : comparison.IsLT ? Join(" >= ", args)
            : comparison.IsGT ? Join(" <= ", args)
            : null;
    }

    /// <summary>a + (-1 * b) is written a - b.</summary>
    private static string Sum(Expr[] operands)
    {
        var text = Operand(operands[0]);
        foreach (var operand in operands.Skip(1))
        {
            text += operand.IsMul && operand.Args.Length == 2 && IsMinusOne(operand.Args[0])
                ? " - " + Operand(operand.Args[1])
                : " + " + Operand(operand);
        }

        return text;
    }

    private static bool IsMinusOne(Expr term) =>
        (term.IsIntNum || term.IsRatNum) && Encoding.RealTerms.Read(term) == -1;

    private static string Join(string separator, Expr[] operands) => string.Join(separator, operands.Select(Operand));

    private static string Operand(Expr operand)
    {
        var text = Write(operand);
        var atomic = operand.IsConst || operand.IsTrue || operand.IsFalse
            || ((operand.IsIntNum || operand.IsRatNum) && !text.StartsWith('-'));
        return atomic ? text : $"({text})";
    }

    private static string Number(Expr numeral)
    {
        var value = Encoding.RealTerms.Read(numeral).Reduce();
        return value.Denominator.IsOne
            ? value.Numerator.ToString(CultureInfo.InvariantCulture)
            : Tracing.ExpressionText.Number(value);
    }
}
