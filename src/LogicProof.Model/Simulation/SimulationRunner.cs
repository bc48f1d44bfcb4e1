using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>Runs a simulator over per-scan inputs and turns each scan into a <see cref="SimulationRow"/>.</summary>
public static class SimulationRunner
{
    /// <summary>
    /// The rows of a run from <paramref name="powerUp"/> (left unchanged), produced lazily. With
    /// <paramref name="changesOnly"/> only scan 0 and the scans where some column changed are returned.
    /// </summary>
    public static IEnumerable<SimulationRow> Rows(
        ScanSimulator simulator,
        ScanState powerUp,
        IEnumerable<ScanInputs> inputsPerScan,
        IReadOnlyList<SimulationColumn> columns,
        bool changesOnly)
    {
        ArgumentNullException.ThrowIfNull(simulator);
        ArgumentNullException.ThrowIfNull(powerUp);
        ArgumentNullException.ThrowIfNull(inputsPerScan);
        ArgumentNullException.ThrowIfNull(columns);
        return Enumerate(simulator, powerUp.Clone(), inputsPerScan, columns, changesOnly);
    }

    /// <summary>The columns of a run: every input, every output, then the named extra cells not already shown.</summary>
    public static IReadOnlyList<SimulationColumn> DefaultColumns(ScanModel model, IEnumerable<int> shownCells)
    {
        var columns = new List<SimulationColumn>();
        var taken = new HashSet<int>();
        void Add(int cell, SimulationColumnKind kind)
        {
            if (taken.Add(cell))
            {
                columns.Add(new SimulationColumn(model.Cells[cell].Name, cell, kind, model.Cells[cell].Type));
            }
        }

        foreach (var input in model.Inputs)
        {
            Add(input, SimulationColumnKind.Input);
        }

        foreach (var cell in model.Cells.Where(cell => cell.IsOutput))
        {
            Add(cell.Index, SimulationColumnKind.Output);
        }

        foreach (var cell in shownCells)
        {
            Add(cell, SimulationColumnKind.Shown);
        }

        return columns;
    }

    private static IEnumerable<SimulationRow> Enumerate(
        ScanSimulator simulator,
        ScanState state,
        IEnumerable<ScanInputs> inputsPerScan,
        IReadOnlyList<SimulationColumn> columns,
        bool changesOnly)
    {
        var values = simulator.CreateValues();
        var timing = simulator.Model.Timing;
        SignalValue[]? previous = null;
        long scan = 0;
        foreach (var inputs in inputsPerScan)
        {
            simulator.Step(state, inputs, values);
            var current = new SignalValue[columns.Count];
            var changed = new bool[columns.Count];
            var anyChange = false;
            for (var i = 0; i < columns.Count; i++)
            {
                var cell = columns[i].Cell;
                current[i] = columns[i].Type == SignalType.Bool ? SignalValue.Of(values.GetBool(cell)) : SignalValue.Of(values.GetReal(cell));
                changed[i] = previous is not null && !current[i].SameAs(previous[i]);
                anyChange |= changed[i];
            }

            if (!changesOnly || previous is null || anyChange)
            {
                yield return new SimulationRow(scan, timing.TimeOfScan(scan), current, changed);
            }

            previous = current;
            scan++;
        }
    }
}
