using System.Globalization;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// A canonical text of a lemma for removing duplicates: operands of AND, OR and of = / &lt;&gt; are sorted, so
/// "a = b" and "b = a" (one proposed from the model's shape, one mined) count once.
/// </summary>
internal static class LemmaKey
{
    public static string Of(LemmaExpression expression) => expression switch
    {
        LemmaBool b => b.Value ? "T" : "F",
        LemmaSlot slot => string.Create(CultureInfo.InvariantCulture, $"s{slot.Slot}"),
        LemmaNumber number => number.Value.ToString(CultureInfo.InvariantCulture),
        LemmaNot not => $"!({Of(not.Operand)})",
        LemmaAnd and => $"&({string.Join(',', and.Operands.Select(Of).Order(StringComparer.Ordinal))})",
        LemmaOr or => $"|({string.Join(',', or.Operands.Select(Of).Order(StringComparer.Ordinal))})",
        LemmaImplies implies => $">({Of(implies.Left)},{Of(implies.Right)})",
        LemmaCompare { Operator: Model.Scan.CompareOperator.Equal or Model.Scan.CompareOperator.NotEqual } compare =>
            $"{compare.Operator}({string.Join(',', new[] { Of(compare.Left), Of(compare.Right) }.Order(StringComparer.Ordinal))})",
        LemmaCompare compare => $"{compare.Operator}({Of(compare.Left)},{Of(compare.Right)})",
        LemmaAdd add => $"+({Of(add.Left)},{Of(add.Right)})",
        LemmaScale scale => $"*({scale.Factor.ToString(CultureInfo.InvariantCulture)},{Of(scale.Operand)})",
        _ => expression.GetType().Name,
    };
}
