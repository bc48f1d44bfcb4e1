using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Encoding;
using Microsoft.Z3;

namespace LogicProof.Proof.Invariants;

/// <summary>
/// Concrete successors of a solver's witness state, to drop many Houdini candidates per solver call: the state s of a
/// model of "all active candidates hold at s, one scan, some candidate fails after it" is read back as a simulator
/// state, and a few scans from s under varied inputs (each with every assumption TRUE) give more successors of a
/// state that satisfies every active candidate. A candidate FALSE in any of them belongs to no inductive subset.
/// </summary>
internal sealed class SuccessorProbe
{
    private const int InputVectors = 8;

    private readonly ScanModel _model;
    private readonly ScanSimulator _simulator;
    private readonly InputChoices _choices;
    private readonly Random _random;

    public SuccessorProbe(ScanModel model, ScanSimulator simulator, InputChoices choices, Random random)
    {
        _model = model;
        _simulator = simulator;
        _choices = choices;
        _random = random;
    }

    public List<ScanState> Successors(Microsoft.Z3.Model solution, SymbolicState state)
    {
        var start = ReadState(solution, state);
        var successors = new List<ScanState>();
        if (start is null)
        {
            return successors;
        }

        var inputs = _simulator.CreateInputs();
        var values = _simulator.CreateValues();
        for (var v = 0; v < InputVectors; v++)
        {
            _choices.Randomize(inputs, _random, hold: 0);
            var next = start.Clone();
            _simulator.Step(next, inputs, values);
            if (_model.Assumptions.All(a => values.GetBool(a.Cell)))
            {
                successors.Add(next);
            }
        }

        return successors;
    }

    /// <summary>The witness as a simulator state, or null when a value does not fit (then nothing is probed).</summary>
    private ScanState? ReadState(Microsoft.Z3.Model solution, SymbolicState state)
    {
        var result = _simulator.CreateState();
        foreach (var slot in _model.StateSlots)
        {
            var value = solution.Eval(state[slot.Index], true);
            switch (slot.Kind)
            {
                case StateSlotKind.TimerCounter:
                    if (value is not IntNum number || number.Int64 < 0 || number.Int64 > slot.CounterMax)
                    {
                        return null;
                    }

                    result.SetCounter(slot.Index, (int)number.Int64);
                    break;
                case StateSlotKind.PreviousValue when slot.Type == SignalType.Real:
                    if (!value.IsRatNum && !value.IsIntNum)
                    {
                        return null;
                    }

                    result.SetReal(slot.Index, RealTerms.Read(value));
                    break;
                default:
                    if (!value.IsTrue && !value.IsFalse)
                    {
                        return null;
                    }

                    result.SetBool(slot.Index, value.IsTrue);
                    break;
            }
        }

        return result;
    }
}
