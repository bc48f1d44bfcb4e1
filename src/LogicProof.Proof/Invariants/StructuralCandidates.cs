using LogicProof.Model.Scan;
using LogicProof.Proof.Lemmas;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Candidate lemmas read off the model's shape: counter bounds; for two timers of the same kind (TON or TOF) on
/// structurally equal inputs, or inputs that count in exactly the same scans, the shorter counter is
/// min(longer counter, shorter preset) (the longer timer's output then implies the shorter's, also proposed over
/// their previous values); when only one counts whenever the other does (an implied input: a TON counts while its
/// input is TRUE, a TOF while it is FALSE), min(c_b, n_a) &lt;= c_a; a TON output seen TRUE last scan
/// means its counter is at the preset (TOF: seen FALSE); an edge memory equals the previous value of its clock cell
/// (negated for F_TRIG); a latch memory equals the previous value of its output cell. None is trusted: sampling and
/// Houdini decide.
/// </summary>
internal static class StructuralCandidates
{
    public static IEnumerable<Lemma> Propose(ScanModel model, CountingImplications implications)
    {
        var terms = new LemmaTerms(model);
        var previousSlotOfCell = model.StateSlots
            .Where(s => s.Kind == StateSlotKind.PreviousValue && s.Type == SignalType.Bool)
            .GroupBy(s => s.Cell)
            .ToDictionary(g => g.Key, g => g.First().Index);
        var timers = model.Steps.OfType<TimerStep>().ToList();

        foreach (var timer in timers)
        {
            yield return terms.CounterBounds(timer.StateSlot, timer.PresetScans);
            if (previousSlotOfCell.TryGetValue(timer.Target, out var output))
            {
                switch (timer.Kind)
                {
                    case TimerKind.OnDelay:
                        yield return LemmaTerms.Implies(terms.BoolSlot(output), terms.CounterAt(timer.StateSlot, timer.PresetScans));
                        break;
                    case TimerKind.OffDelay:
                        yield return LemmaTerms.Implies(terms.BoolSlot(output).Negated, terms.CounterAt(timer.StateSlot, timer.PresetScans));
                        break;
                }
            }
        }

        foreach (var lemma in TimerPairs(timers, terms, previousSlotOfCell, implications))
        {
            yield return lemma;
        }

        foreach (var edge in model.Steps.OfType<EdgeStep>())
        {
            if (ClockCell(edge.Clock) is ({ } cell, var negated) && previousSlotOfCell.TryGetValue(cell, out var previous))
            {
                var memory = terms.BoolSlot(edge.StateSlot);
                var clock = terms.BoolSlot(previous);
                var sameSense = (edge.Kind == EdgeKind.Rising) != negated;
                yield return LemmaTerms.Equal(memory, sameSense ? clock : clock.Negated);
            }
        }

        foreach (var latch in model.Steps.OfType<LatchStep>())
        {
            if (previousSlotOfCell.TryGetValue(latch.Target, out var previous))
            {
                yield return LemmaTerms.Equal(terms.BoolSlot(latch.StateSlot), terms.BoolSlot(previous));
            }
        }
    }

    private static IEnumerable<Lemma> TimerPairs(
        List<TimerStep> timers, LemmaTerms terms, Dictionary<int, int> previousSlotOfCell, CountingImplications implications)
    {
        var countsWhenever = new Dictionary<(int, int), bool>();
        bool CountsWhenever(int i, int j)
        {
            if (!countsWhenever.TryGetValue((i, j), out var answer))
            {
                answer = implications.CountsWhenever(timers[i], timers[j]);
                countsWhenever[(i, j)] = answer;
            }

            return answer;
        }

        for (var i = 0; i < timers.Count; i++)
        {
            for (var j = 0; j < timers.Count; j++)
            {
                var a = timers[i];
                var b = timers[j];
                if (i == j || a.Kind != b.Kind || a.Kind == TimerKind.Pulse)
                {
                    continue;
                }

                var aWheneverB = ScanExpressionEquality.AreEqual(a.Input, b.Input) || CountsWhenever(i, j);
                if (!aWheneverB)
                {
                    continue;
                }

                if (ScanExpressionEquality.AreEqual(a.Input, b.Input) || CountsWhenever(j, i))
                {
                    // Proposed once per pair, from the shorter timer's side (the earlier one when presets are equal).
                    if (a.PresetScans < b.PresetScans || (a.PresetScans == b.PresetScans && i < j))
                    {
                        yield return terms.MinOf(a.StateSlot, b.StateSlot, a.PresetScans);
                        if (a.Kind == TimerKind.OnDelay
                            && previousSlotOfCell.TryGetValue(a.Target, out var shorterOutput)
                            && previousSlotOfCell.TryGetValue(b.Target, out var longerOutput))
                        {
                            yield return LemmaTerms.Implies(terms.BoolSlot(longerOutput), terms.BoolSlot(shorterOutput));
                        }
                    }
                }
                else
                {
                    yield return terms.CountsAtLeast(a.StateSlot, a.PresetScans, b.StateSlot);
                }
            }
        }
    }

    /// <summary>The cell an edge watches when its clock is a current read of one cell, possibly negated.</summary>
    private static (int? Cell, bool Negated) ClockCell(ScanExpression clock) => clock switch
    {
        CellReadExpression { Timing: ReadTiming.Current } read => (read.Cell, false),
        NotExpression { Operand: CellReadExpression { Timing: ReadTiming.Current } read } => (read.Cell, true),
        _ => (null, false),
    };
}
