using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using LogicProof.Model.Scan;
using LogicProof.Model.Timing;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Lowers a bound scheme to its <see cref="ScanModel"/>.
/// <para>
/// Cells: the inputs in declaration order, then the locals and outputs in declaration order, then hidden cells in
/// the order they are made (function-block outputs <c>X.TON#1</c>, formula monitors <c>R.ONCE#2</c>, one cell per
/// requirement, rule and assumption). A function block that is the whole right side of an equation writes the
/// variable's cell directly.
/// </para>
/// <para>
/// Steps: first a hold step <c>V := last(V)</c> for every variable no equation writes (so it keeps its power-up
/// value and every non-input cell has exactly one writer); then each equation in scan order, preceded by the steps
/// of the function blocks it calls; <see cref="ScanModel.EquationStepCount"/> counts these. Then the monitor steps
/// and the cell of each requirement, extra property and assumption.
/// </para>
/// <para>
/// Memories: see <see cref="MemoryPowerUpResolver"/> for variables (a declared <c>init retained</c> is unknown); timers start at 0 (TOF at its preset, that is
/// expired), edge memories FALSE, an SR/RS memory at its variable's <c>init</c> when it is the whole equation, else
/// unknown.
/// </para>
/// Deep expressions are lowered recursively: run the build inside <c>LargeStack.Run</c> for big inputs.
/// </summary>
public static class ModelBuilder
{
    public static ModelBuildResult Build(BoundScheme scheme, IReadOnlyList<ExtraProperty>? extraProperties = null)
    {
        var diagnostics = new DiagnosticBag();
        var timing = ScanTimingBuilder.Build(scheme.Syntax, diagnostics);
        if (timing is null)
        {
            return new ModelBuildResult(null, diagnostics.ToList());
        }

        var model = new ModelAssembly(scheme.Syntax.Inputs.Count + scheme.Syntax.Variables.Count + 16);
        var (cellOfSymbol, inputs, variables) = AddDeclaredCells(scheme, model);
        var writerEquationOfCell = WriterEquations(scheme, cellOfSymbol, model.Cells.Count);
        var declaredPowerUps = DeclaredPowerUps(scheme, cellOfSymbol);
        var lowerer = new ExpressionLowerer(model, new DurationConverter(timing), diagnostics, cellOfSymbol, writerEquationOfCell);

        foreach (var cell in variables)
        {
            if (writerEquationOfCell[cell] < 0)
            {
                var type = model.Cells[cell].Type;
                var powerUp = declaredPowerUps.GetValueOrDefault(cell) ?? MemoryPowerUpResolver.Default(type);
                model.PreviousSlot(cell, powerUp);
                var hold = new CellReadExpression(cell, ReadTiming.Previous, type);
                model.AddStep(new AssignStep(cell, hold, model.Cells[cell].Span));
            }
        }

        var wholeLatchesWithoutInit = new HashSet<int>();
        foreach (var equation in scheme.Equations)
        {
            var target = cellOfSymbol[equation.Target.Name];
            var latchPowerUp = declaredPowerUps.GetValueOrDefault(target);
            if (latchPowerUp is null && equation.Expression is BoundFunctionBlockCall { Kind: FunctionBlockKind.Sr or FunctionBlockKind.Rs })
            {
                wholeLatchesWithoutInit.Add(target);
            }

            lowerer.LowerEquation(equation, target, latchPowerUp ?? new UnknownPowerUp());
        }

        var equationStepCount = model.Steps.Count;
        MemoryPowerUpResolver.Resolve(model, equationStepCount, variables, declaredPowerUps, writerEquationOfCell, wholeLatchesWithoutInit);
        var (properties, assumptions) = LowerFormulas(scheme, extraProperties ?? [], lowerer);

        if (diagnostics.HasErrors)
        {
            return new ModelBuildResult(null, diagnostics.ToList());
        }

        var scanModel = new ScanModel(
            scheme.Syntax.Name,
            timing,
            model.Cells,
            inputs,
            model.Steps,
            model.Slots,
            properties,
            assumptions)
        {
            EquationStepCount = equationStepCount,
            WriterOfCell = ModelConsistency.WriterOfCell(model),
            Roundings = model.Roundings,
        };
        ModelConsistency.Verify(scanModel);
        return new ModelBuildResult(scanModel, diagnostics.ToList());
    }

    private static (Dictionary<string, int> CellOfSymbol, List<int> Inputs, List<int> Variables) AddDeclaredCells(
        BoundScheme scheme, ModelAssembly model)
    {
        var cellOfSymbol = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var inputs = new List<int>();
        foreach (var declaration in scheme.Syntax.Inputs)
        {
            var symbol = SymbolOf(scheme, declaration.Name);
            var range = symbol.Range is { } r ? (r.Low, r.High) : ((Fractions.Fraction, Fractions.Fraction)?)null;
            var cell = model.AddDeclaredCell(new Cell(model.Cells.Count, symbol.Name, CellKind.Input, ExpressionLowerer.ToSignalType(symbol.Type), symbol.DeclarationSpan)
            {
                Description = symbol.Description,
                Range = range,
            });
            cellOfSymbol.Add(symbol.Name, cell);
            inputs.Add(cell);
        }

        var variables = new List<int>();
        foreach (var declaration in scheme.Syntax.Variables)
        {
            var symbol = SymbolOf(scheme, declaration.Name);
            var cell = model.AddDeclaredCell(new Cell(model.Cells.Count, symbol.Name, CellKind.Variable, ExpressionLowerer.ToSignalType(symbol.Type), symbol.DeclarationSpan)
            {
                Description = symbol.Description,
                IsOutput = symbol.Kind == SymbolKind.Output,
                IsRetained = symbol.Retained,
            });
            cellOfSymbol.Add(symbol.Name, cell);
            variables.Add(cell);
        }

        return (cellOfSymbol, inputs, variables);
    }

    private static Symbol SymbolOf(BoundScheme scheme, string name) =>
        scheme.Symbols.TryGetValue(name, out var symbol)
            ? symbol
            : throw new InvalidOperationException($"'{name}' is declared but has no symbol");

    private static int[] WriterEquations(BoundScheme scheme, IReadOnlyDictionary<string, int> cellOfSymbol, int cellCount)
    {
        var writer = new int[cellCount];
        Array.Fill(writer, -1);
        for (var i = 0; i < scheme.Equations.Count; i++)
        {
            var equation = scheme.Equations[i];
            if (equation.Index != i)
            {
                throw new InvalidOperationException($"equation {i} has index {equation.Index}");
            }

            if (equation.Target.Kind is not (SymbolKind.Local or SymbolKind.Output)
                || !cellOfSymbol.TryGetValue(equation.Target.Name, out var cell)
                || writer[cell] >= 0)
            {
                throw new InvalidOperationException(
                    $"equation {i} writes '{equation.Target.Name}', which is not a variable or is written twice");
            }

            writer[cell] = i;
        }

        return writer;
    }

    private static Dictionary<int, PowerUp> DeclaredPowerUps(BoundScheme scheme, IReadOnlyDictionary<string, int> cellOfSymbol)
    {
        var powerUps = new Dictionary<int, PowerUp>();
        foreach (var declaration in scheme.Syntax.Variables)
        {
            var symbol = SymbolOf(scheme, declaration.Name);
            PowerUp? powerUp = symbol.PowerUp switch
            {
                // init retained (IEC 61131-3 RETAIN): the value before the restart. The precise set of such values is
                // every value the memory reaches in any run, itself started from a retained value: a fixed point the
                // checker does not compute. Unknown (both values, every other memory fresh) contains that set, so a
                // proof from it holds after any restart; it may only add runs, giving a counterexample that starts
                // from a value the scheme could never have reached, which the report shows as a power-up choice.
                null when symbol.Retained => new UnknownPowerUp(),
                null => null,
                BoundBoolConstant b when symbol.Type == Language.Syntax.ValueType.Bool => new KnownBoolPowerUp(b.Value),
                BoundRealConstant r when symbol.Type == Language.Syntax.ValueType.Real => new KnownRealPowerUp(r.Value),
                _ => throw new InvalidOperationException($"the init value of '{symbol.Name}' does not match its type"),
            };
            if (powerUp is not null)
            {
                powerUps.Add(cellOfSymbol[symbol.Name], powerUp);
            }
        }

        return powerUps;
    }

    private static (List<ModelProperty> Properties, List<ModelAssumption> Assumptions) LowerFormulas(
        BoundScheme scheme, IReadOnlyList<ExtraProperty> extraProperties, ExpressionLowerer lowerer)
    {
        var properties = new List<ModelProperty>();
        foreach (var requirement in scheme.Requirements)
        {
            var cell = lowerer.LowerFormula(requirement.Name, requirement.Formula, requirement.Syntax.Span);
            properties.Add(new ModelProperty(requirement.Name, cell, PropertyOrigin.Requirement, requirement.Syntax.Span));
        }

        foreach (var extra in extraProperties)
        {
            var cell = lowerer.LowerFormula(extra.Name, extra.Formula, extra.Span);
            properties.Add(new ModelProperty(extra.Name, cell, extra.Origin, extra.Span) { Statement = extra.Statement });
        }

        var assumptions = new List<ModelAssumption>();
        for (var i = 0; i < scheme.Assumptions.Count; i++)
        {
            var assumption = scheme.Assumptions[i];
            var cellName = HiddenNames.Assumption(assumption.Name, i);
            var cell = lowerer.LowerFormula(cellName, assumption.Formula, assumption.Syntax.Span);
            assumptions.Add(new ModelAssumption(assumption.Name, cell, assumption.Syntax.Span));
        }

        return (properties, assumptions);
    }
}
