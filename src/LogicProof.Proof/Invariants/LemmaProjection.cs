using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Carries lemmas proved on a model over to a cone-of-influence slice of it, so that invariants can be generated once
/// per model instead of once per property. A slot is the same slot in both models when its kind and name agree; a
/// lemma is kept when every slot it reads is in the slice. This is sound because a slice keeps everything its slots
/// depend on, and every assumption: each state the slice reaches is the restriction of a state the model reaches
/// (with the same power-up choices), so a lemma over the slice's slots holds there too.
/// </summary>
public static class LemmaProjection
{
    public static IReadOnlyList<Lemma> Onto(IReadOnlyList<Lemma> lemmas, ScanModel source, ScanModel slice)
    {
        ArgumentNullException.ThrowIfNull(lemmas);
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(slice);
        var sliceSlot = slice.StateSlots.ToDictionary(s => (s.Kind, s.Name), s => s.Index);
        var mapping = source.StateSlots
            .Select(s => sliceSlot.TryGetValue((s.Kind, s.Name), out var index) ? index : -1)
            .ToArray();
        var projected = new List<Lemma>();
        foreach (var lemma in lemmas)
        {
            if (Rename(lemma.Expression, mapping) is { } expression)
            {
                projected.Add(lemma with { Expression = expression });
            }
        }

        return projected;
    }

    /// <summary>The expression over the slice's slot numbers, or null when it reads a slot the slice does not have.</summary>
    private static LemmaExpression? Rename(LemmaExpression expression, int[] mapping)
    {
        switch (expression)
        {
            case LemmaSlot slot:
                return mapping[slot.Slot] >= 0 ? new LemmaSlot(mapping[slot.Slot]) : null;
            case LemmaBool or LemmaNumber:
                return expression;
            case LemmaNot not:
                return Rename(not.Operand, mapping) is { } operand ? new LemmaNot(operand) : null;
            case LemmaAnd and:
                var andOperands = and.Operands.Select(o => Rename(o, mapping)).ToList();
                return andOperands.Any(o => o is null) ? null : new LemmaAnd(andOperands!);
            case LemmaOr or:
                var orOperands = or.Operands.Select(o => Rename(o, mapping)).ToList();
                return orOperands.Any(o => o is null) ? null : new LemmaOr(orOperands!);
            case LemmaImplies implies:
                return Both(implies.Left, implies.Right, mapping, (l, r) => new LemmaImplies(l, r));
            case LemmaCompare compare:
                return Both(compare.Left, compare.Right, mapping, (l, r) => new LemmaCompare(compare.Operator, l, r));
            case LemmaAdd add:
                return Both(add.Left, add.Right, mapping, (l, r) => new LemmaAdd(l, r));
            case LemmaScale scale:
                return Rename(scale.Operand, mapping) is { } scaled ? new LemmaScale(scale.Factor, scaled) : null;
            default:
                return null;
        }
    }

    private static LemmaExpression? Both(
        LemmaExpression left, LemmaExpression right, int[] mapping, Func<LemmaExpression, LemmaExpression, LemmaExpression> make) =>
        Rename(left, mapping) is { } l && Rename(right, mapping) is { } r ? make(l, r) : null;
}
