using Fractions;
using LogicProof.Language.Binding;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// The memories of a program and their power-up values, decided from the brief: variables start FALSE or 0, or at
/// their declared <c>init</c>; a latch without <c>init</c> has an unknown power-up (both values are explored). A
/// variable's last-scan value is kept only when an equation reads it at or before the variable's own equation. A
/// latch is an SR/RS (its memory Q1, and the variable it is the whole equation of) or a seal-in: a variable whose
/// last-scan value is read by an equation of a variable that itself depends, through this scan's equations, on the
/// first (a loop through the equations). An SR/RS that is the whole equation of a variable with <c>init</c> starts at
/// that value; one inside a larger expression has no declared value. Timers start idle (TOF expired), edge
/// memories FALSE, ONCE and SINCE FALSE, HISTORICALLY TRUE, PREV FALSE or 0.
/// </summary>
internal sealed class ReferenceLayout
{
    private readonly List<bool?> _flags = [];
    private readonly List<int> _counts = [];
    private readonly List<Fraction> _reals = [];

    public ReferenceLayout(ReferenceProgram program)
    {
        var scheme = program.Scheme;
        Timing = new ReferenceTiming(scheme.Syntax);
        foreach (var equation in scheme.Equations)
        {
            Writer.Add(equation.Target.Name, equation.Index);
        }

        foreach (var declaration in scheme.Syntax.Variables)
        {
            AddLastValue(scheme, scheme.Symbols[declaration.Name]);
        }

        foreach (var equation in scheme.Equations)
        {
            var whole = equation.Expression;
            foreach (var node in BoundWalk.Nodes(equation.Expression))
            {
                if (node is BoundFunctionBlockCall block)
                {
                    var declared = ReferenceEquals(node, whole) && equation.Target.PowerUp is BoundBoolConstant init ? init.Value : (bool?)null;
                    AddBlock(block, declared);
                }
            }
        }

        foreach (var formula in program.Properties.Select(p => p.Formula).Concat(scheme.Assumptions.Select(a => a.Formula)))
        {
            foreach (var node in BoundWalk.Nodes(formula))
            {
                AddFormulaNode(node);
            }
        }
    }

    public ReferenceTiming Timing { get; }

    /// <summary>The equation (scan-order index) that writes each variable.</summary>
    public Dictionary<string, int> Writer { get; } = new(StringComparer.OrdinalIgnoreCase);

    /// <summary>The memory of a variable's last-scan value: an index into the flags or the reals, by its type.</summary>
    public Dictionary<string, (int Slot, bool IsReal)> LastValue { get; } = new(StringComparer.OrdinalIgnoreCase);

    public Dictionary<BoundExpression, ReferenceMemory> Nodes { get; } = new(ReferenceEqualityComparer.Instance);

    /// <summary>Every power-up state: one per combination of values of the flags with unknown power-up.</summary>
    public IEnumerable<ReferenceState> PowerUpStates()
    {
        var unknown = Enumerable.Range(0, _flags.Count).Where(f => _flags[f] is null).ToList();
        for (var combination = 0L; combination < 1L << unknown.Count; combination++)
        {
            var flags = _flags.Select(f => f ?? false).ToArray();
            for (var bit = 0; bit < unknown.Count; bit++)
            {
                flags[unknown[bit]] = (combination >> bit & 1) == 1;
            }

            yield return new ReferenceState(flags, [.. _counts], [.. _reals]);
        }
    }

    private void AddLastValue(BoundScheme scheme, Symbol variable)
    {
        if (!Writer.TryGetValue(variable.Name, out var writer))
        {
            return;
        }

        var earlyReaders = scheme.Equations
            .Where(e => e.Index <= writer && BoundWalk.VariablesRead(e.Expression).Contains(variable.Name, StringComparer.OrdinalIgnoreCase))
            .Select(e => e.Target.Name)
            .ToList();
        if (earlyReaders.Count == 0)
        {
            return;
        }

        var isLatch = scheme.Equations[writer].Expression is BoundFunctionBlockCall { Kind: FunctionBlockKind.Sr or FunctionBlockKind.Rs }
            || earlyReaders.Any(reader => DependsOn(scheme, variable.Name, reader));
        if (variable.Type == ValueType.Real)
        {
            if (variable.PowerUp is null && isLatch)
            {
                throw new NotSupportedException($"'{variable.Name}' is a real latch without init: its power-up values cannot be enumerated");
            }

            LastValue.Add(variable.Name, (AddReal((variable.PowerUp as BoundRealConstant)?.Value ?? Fraction.Zero), true));
            return;
        }

        var declared = (variable.PowerUp as BoundBoolConstant)?.Value;
        LastValue.Add(variable.Name, (AddFlag(declared ?? (isLatch ? null : false)), false));
    }

    /// <summary>Whether <paramref name="variable"/> depends, through this scan's equations, on <paramref name="source"/> (or is it).</summary>
    private static bool DependsOn(BoundScheme scheme, string variable, string source)
    {
        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase) { source };
        var frontier = new Queue<string>([source]);
        while (frontier.Count > 0)
        {
            var name = frontier.Dequeue();
            if (string.Equals(name, variable, StringComparison.OrdinalIgnoreCase))
            {
                return true;
            }

            foreach (var reader in scheme.Equations.Where(e => BoundWalk.VariablesRead(e.Expression).Contains(name, StringComparer.OrdinalIgnoreCase)))
            {
                if (seen.Add(reader.Target.Name))
                {
                    frontier.Enqueue(reader.Target.Name);
                }
            }
        }

        return false;
    }

    private void AddBlock(BoundFunctionBlockCall block, bool? declaredLatch)
    {
        var scans = block.Preset is { } preset ? Timing.Scans(preset.Value) : 0;
        var memory = block.Kind switch
        {
            FunctionBlockKind.Ton => new ReferenceMemory(AddFlag(false), -1, AddCount(0), -1, scans),
            FunctionBlockKind.Tof => new ReferenceMemory(AddFlag(false), -1, AddCount(scans), -1, scans),
            FunctionBlockKind.Tp => new ReferenceMemory(AddFlag(false), AddFlag(false), AddCount(0), -1, scans),
            FunctionBlockKind.RTrig or FunctionBlockKind.FTrig => new ReferenceMemory(AddFlag(false), -1, -1, -1, 0),
            _ => new ReferenceMemory(AddFlag(declaredLatch), -1, -1, -1, 0),
        };
        Nodes.Add(block, memory);
    }

    private void AddFormulaNode(BoundExpression node)
    {
        switch (node)
        {
            case BoundBinary { Operator: Language.Syntax.BinaryOperator.Since }:
                Nodes.Add(node, new ReferenceMemory(AddFlag(false), -1, -1, -1, 0));
                break;
            case BoundTemporal temporal:
                var scans = temporal.Window is { } window ? Timing.Scans(window.Value) : 0;
                Nodes.Add(node, temporal.Operator switch
                {
                    TemporalOperator.Prev when temporal.Operand.Type == ValueType.Real => new ReferenceMemory(-1, -1, -1, AddReal(Fraction.Zero), 0),
                    TemporalOperator.Historically => new ReferenceMemory(AddFlag(true), -1, -1, -1, 0),
                    TemporalOperator.Held => new ReferenceMemory(-1, -1, AddCount(0), -1, scans),
                    TemporalOperator.Within => new ReferenceMemory(-1, -1, AddCount(scans + 1), -1, scans),
                    _ => new ReferenceMemory(AddFlag(false), -1, -1, -1, 0),
                });
                break;
        }
    }

    private int AddFlag(bool? powerUp)
    {
        _flags.Add(powerUp);
        return _flags.Count - 1;
    }

    private int AddCount(int powerUp)
    {
        _counts.Add(powerUp);
        return _counts.Count - 1;
    }

    private int AddReal(Fraction powerUp)
    {
        _reals.Add(powerUp);
        return _reals.Count - 1;
    }
}
