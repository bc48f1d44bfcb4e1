using Fractions;

namespace LogicProof.Model.Simulation;

/// <summary>
/// One scan of a model as compiled code: a few delegates, each running a consecutive run of steps, the last one
/// ending with the copy of this scan's values into the PreviousValue slots. Arguments: the cells' bool and real
/// values of this scan (inputs already filled in), then the state's bool, counter and real arrays.
/// </summary>
internal sealed class ScanProgram(IReadOnlyList<Action<bool[], Fraction[], bool[], int[], Fraction[]>> chunks)
{
    public int ChunkCount => chunks.Count;

    public void Run(bool[] cellBools, Fraction[] cellReals, bool[] stateBools, int[] stateCounters, Fraction[] stateReals)
    {
        foreach (var chunk in chunks)
        {
            chunk(cellBools, cellReals, stateBools, stateCounters, stateReals);
        }
    }
}
