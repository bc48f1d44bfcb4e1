using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Relations between bool facts that no sampled state falsifies. The facts (atoms) are the bool slots and, per
/// timer counter, "running" (c &gt; 0) and "at its preset" (c = n). Each atom's values over the samples form a bit
/// set; an atom with one value throughout gives a constant candidate; atoms with equal (or complementary) bit sets
/// form a class and give equalities with the class's first atom; between the first atoms of the non-constant classes
/// every implication a -&gt; b, b -&gt; a, a -&gt; NOT b and NOT a -&gt; b that the samples allow is a candidate.
/// Candidates come out in that order (constants, equalities, implications) and stop at the given cap.
/// </summary>
internal static class RelationMiner
{
    public static List<Lemma> Mine(ScanModel model, IReadOnlyList<ScanState> samples, int cap)
    {
        var terms = new LemmaTerms(model);
        var evaluator = new LemmaEvaluator(model);
        var atoms = Atoms(model, terms);
        var words = (samples.Count + 63) / 64;
        var lastMask = samples.Count % 64 == 0 ? ulong.MaxValue : (1UL << (samples.Count % 64)) - 1;
        var bits = atoms.Select(atom => Bits(atom, samples, evaluator, words)).ToList();

        var result = new List<Lemma>();
        var classes = new List<(int Atom, ulong[] Key)>();
        var equalities = new List<Lemma>();
        for (var a = 0; a < atoms.Count; a++)
        {
            var ones = Count(bits[a]);
            if (ones == samples.Count)
            {
                result.Add(LemmaTerms.Always(atoms[a]));
                continue;
            }

            if (ones == 0)
            {
                result.Add(LemmaTerms.Always(atoms[a].Negated));
                continue;
            }

            var complement = Complement(bits[a], lastMask);
            var match = classes.FindIndex(c => c.Key.AsSpan().SequenceEqual(bits[a]) || c.Key.AsSpan().SequenceEqual(complement));
            if (match < 0)
            {
                classes.Add((a, bits[a]));
            }
            else
            {
                var first = atoms[classes[match].Atom];
                var same = classes[match].Key.AsSpan().SequenceEqual(bits[a]);
                equalities.Add(LemmaTerms.Equal(first, same ? atoms[a] : atoms[a].Negated));
            }
        }

        result.AddRange(equalities);
        for (var i = 0; i < classes.Count && result.Count < cap; i++)
        {
            for (var j = i + 1; j < classes.Count && result.Count < cap; j++)
            {
                var (x, y) = (classes[i].Key, classes[j].Key);
                var (ax, ay) = (atoms[classes[i].Atom], atoms[classes[j].Atom]);
                if (Never(x, y, lastMask, negateLeft: false, negateRight: true))
                {
                    result.Add(LemmaTerms.Implies(ax, ay));
                }

                if (Never(y, x, lastMask, negateLeft: false, negateRight: true))
                {
                    result.Add(LemmaTerms.Implies(ay, ax));
                }

                if (Never(x, y, lastMask, negateLeft: false, negateRight: false))
                {
                    result.Add(LemmaTerms.Implies(ax, ay.Negated));
                }

                if (Never(x, y, lastMask, negateLeft: true, negateRight: true))
                {
                    result.Add(LemmaTerms.Implies(ax.Negated, ay));
                }
            }
        }

        return result.Count > cap ? result[..cap] : result;
    }

    private static List<Atom> Atoms(ScanModel model, LemmaTerms terms)
    {
        var atoms = new List<Atom>();
        foreach (var slot in model.StateSlots)
        {
            switch (slot.Kind)
            {
                case StateSlotKind.TimerCounter:
                    var preset = model.Steps.OfType<TimerStep>().First(t => t.StateSlot == slot.Index).PresetScans;
                    atoms.Add(terms.CounterRunning(slot.Index));
                    if (preset > 1)
                    {
                        atoms.Add(terms.CounterAt(slot.Index, preset));
                    }

                    break;
                case StateSlotKind.PreviousValue when slot.Type == SignalType.Real:
                    break;
                default:
                    atoms.Add(terms.BoolSlot(slot.Index));
                    break;
            }
        }

        return atoms;
    }

    private static ulong[] Bits(Atom atom, IReadOnlyList<ScanState> samples, LemmaEvaluator evaluator, int words)
    {
        var bits = new ulong[words];
        for (var s = 0; s < samples.Count; s++)
        {
            if (evaluator.Holds(atom.Expression, samples[s]))
            {
                bits[s / 64] |= 1UL << (s % 64);
            }
        }

        return bits;
    }

    /// <summary>No sample has (left, negated if asked) and (right, negated if asked) together.</summary>
    private static bool Never(ulong[] left, ulong[] right, ulong lastMask, bool negateLeft, bool negateRight)
    {
        for (var w = 0; w < left.Length; w++)
        {
            var mask = w == left.Length - 1 ? lastMask : ulong.MaxValue;
            var l = negateLeft ? ~left[w] : left[w];
            var r = negateRight ? ~right[w] : right[w];
            if ((l & r & mask) != 0)
            {
                return false;
            }
        }

        return true;
    }

    private static ulong[] Complement(ulong[] bits, ulong lastMask)
    {
        var result = new ulong[bits.Length];
        for (var w = 0; w < bits.Length; w++)
        {
            result[w] = ~bits[w] & (w == bits.Length - 1 ? lastMask : ulong.MaxValue);
        }

        return result;
    }

    private static int Count(ulong[] bits) => bits.Sum(w => System.Numerics.BitOperations.PopCount(w));
}
