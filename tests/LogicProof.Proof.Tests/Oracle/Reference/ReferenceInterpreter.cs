using LogicProof.Language.Binding;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// The oracle's own reading of the brief's semantics, run directly on the bound syntax tree (no lowering, no model,
/// no product simulator). One call of <see cref="Step"/> is one scan: the inputs are sampled once and hold for the
/// whole scan; the equations run in the order written, and a variable read at or before its own equation gives its
/// value from the previous scan; then every property and every assumption is evaluated on the values of this scan.
/// Function blocks follow IEC 61131-3 (<see cref="ReferenceBlocks"/>), durations are whole scans rounded up
/// (<see cref="ReferenceTiming"/>), reals are exact rationals, and power-up is as <see cref="ReferenceLayout"/> says.
/// </summary>
internal sealed class ReferenceInterpreter
{
    private readonly ReferenceLayout _layout;
    private readonly Dictionary<string, int> _inputIndex = new(StringComparer.OrdinalIgnoreCase);
    private readonly Dictionary<string, int> _variableIndex = new(StringComparer.OrdinalIgnoreCase);

    public ReferenceInterpreter(ReferenceProgram program)
    {
        Program = program;
        _layout = new ReferenceLayout(program);
        Inputs = [.. program.Scheme.Syntax.Inputs.Select(i => program.Scheme.Symbols[i.Name])];
        for (var i = 0; i < Inputs.Count; i++)
        {
            _inputIndex.Add(Inputs[i].Name, i);
        }

        foreach (var variable in program.Scheme.Syntax.Variables)
        {
            _variableIndex.Add(variable.Name, _variableIndex.Count);
        }
    }

    public ReferenceProgram Program { get; }

    /// <summary>The inputs in declaration order; <see cref="ReferenceInputs"/> are indexed the same way.</summary>
    public IReadOnlyList<Symbol> Inputs { get; }

    public IReadOnlyList<ReferenceProperty> Properties => Program.Properties;

    public int InputIndex(string name) => _inputIndex.TryGetValue(name, out var index) ? index : -1;

    public IEnumerable<ReferenceState> PowerUpStates() => _layout.PowerUpStates();

    /// <summary>A bool variable's value from the scan before, as kept in <paramref name="state"/>; null when it is not kept.</summary>
    public bool? LastScanValue(ReferenceState state, string variable) =>
        _layout.LastValue.TryGetValue(variable, out var last) && !last.IsReal ? state.Flags[last.Slot] : null;

    /// <summary>
    /// One scan from <paramref name="before"/> (left unchanged). Fills <paramref name="properties"/> with each
    /// property's value at this scan and returns whether every assumption holds at it.
    /// </summary>
    public bool Step(ReferenceState before, ReferenceInputs inputs, bool[] properties, out ReferenceState after)
    {
        var scan = new ReferenceScan(_layout, _inputIndex, _variableIndex, before.Copy(), inputs);
        foreach (var equation in Program.Scheme.Equations)
        {
            scan.Run(equation);
        }

        for (var p = 0; p < Program.Properties.Count; p++)
        {
            properties[p] = scan.Formula(Program.Properties[p].Formula);
        }

        var assumptionsHold = true;
        foreach (var assumption in Program.Scheme.Assumptions)
        {
            assumptionsHold &= scan.Formula(assumption.Formula);
        }

        after = scan.End();
        return assumptionsHold;
    }
}
