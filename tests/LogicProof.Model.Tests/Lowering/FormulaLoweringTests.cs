using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Lowering;

public sealed class FormulaLoweringTests
{
    private const string Bay = Header + """
        inputs CMD : bool; CLOSED : bool; LEVEL : real; end
        outputs CLOSE : bool; end
        logic CLOSE := CMD AND NOT CLOSED; end

        """;

    private static StateSlot LastOf(ScanModel model, string cell) => model.PreviousSlotOf(cell);

    [Fact]
    public void Build_WhenRequirement_MakesAPropertyCellComputedAfterEveryEquation()
    {
        var model = BuildModel(Bay + "require NO_CLOSE_WHEN_CLOSED: CLOSED -> NOT CLOSE;\n");

        var property = Assert.Single(model.Properties);
        Assert.Equal("NO_CLOSE_WHEN_CLOSED", property.Name);
        Assert.Equal(PropertyOrigin.Requirement, property.Origin);
        Assert.Equal("NO_CLOSE_WHEN_CLOSED", model.Cells[property.Cell].Name);
        Assert.Equal(CellKind.Hidden, model.Cells[property.Cell].Kind);
        Assert.True(model.WriterOfCell[property.Cell] >= model.EquationStepCount);
        Assert.Equal((7, 1), (property.Span.Line, property.Span.Column));
        Assert.IsType<ImpliesExpression>(Assert.IsType<AssignStep>(model.Steps[model.WriterOfCell[property.Cell]]).Value);
    }

    [Fact]
    public void Build_WhenPrev_LiftsTheOperandIntoACellReadAtTheLastScanStartingFalse()
    {
        var model = BuildModel(Bay + "require R: PREV(CLOSE) -> CMD;\nrequire V: PREV(LEVEL) >= 0;\n");

        var lifted = Assert.IsType<AssignStep>(model.WriterOf("R.PREV#1"));
        Assert.Equal(model.CellNamed("CLOSE").Index, Assert.IsType<CellReadExpression>(lifted.Value).Cell);
        Assert.Equal(new KnownBoolPowerUp(false), LastOf(model, "R.PREV#1").PowerUp);
        var implies = Assert.IsType<ImpliesExpression>(Assert.IsType<AssignStep>(model.WriterOf("R")).Value);
        var read = Assert.IsType<CellReadExpression>(implies.Left);
        Assert.Equal((lifted.Target, ReadTiming.Previous), (read.Cell, read.Timing));

        // PREV of a real starts at 0.
        Assert.Equal(SignalType.Real, model.CellNamed("V.PREV#1").Type);
        Assert.Equal(new KnownRealPowerUp(Fractions.Fraction.Zero), LastOf(model, "V.PREV#1").PowerUp);
    }

    [Fact]
    public void Build_WhenRoseAndFell_CompareTheLiftedCellNowAndAtTheLastScan()
    {
        var model = BuildModel(Bay + "require R: ROSE(CLOSE) OR FELL(CMD);\n");

        var or = Assert.IsType<OrExpression>(Assert.IsType<AssignStep>(model.WriterOf("R")).Value);
        var rose = Assert.IsType<AndExpression>(or.Operands[0]);
        var fell = Assert.IsType<AndExpression>(or.Operands[1]);
        var roseCell = model.CellNamed("R.ROSE#1").Index;
        var fellCell = model.CellNamed("R.FELL#2").Index;
        Assert.Equal((roseCell, ReadTiming.Current), Read(rose.Operands[0]));
        Assert.Equal((roseCell, ReadTiming.Previous), Read(Assert.IsType<NotExpression>(rose.Operands[1]).Operand));
        Assert.Equal((fellCell, ReadTiming.Current), Read(Assert.IsType<NotExpression>(fell.Operands[0]).Operand));
        Assert.Equal((fellCell, ReadTiming.Previous), Read(fell.Operands[1]));
    }

    [Fact]
    public void Build_WhenOnceAndHistorically_MakeSelfHoldingMonitorsStartingFalseAndTrue()
    {
        var model = BuildModel(Bay + "require R: ONCE(CLOSE) -> HISTORICALLY(NOT CLOSED);\n");

        var once = Assert.IsType<OrExpression>(Assert.IsType<AssignStep>(model.WriterOf("R.ONCE#1")).Value);
        Assert.Equal((model.CellNamed("R.ONCE#1").Index, ReadTiming.Previous), Read(once.Operands[1]));
        Assert.Equal(new KnownBoolPowerUp(false), LastOf(model, "R.ONCE#1").PowerUp);
        var historically = Assert.IsType<AndExpression>(Assert.IsType<AssignStep>(model.WriterOf("R.HISTORICALLY#2")).Value);
        Assert.Equal((model.CellNamed("R.HISTORICALLY#2").Index, ReadTiming.Previous), Read(historically.Operands[1]));
        Assert.Equal(new KnownBoolPowerUp(true), LastOf(model, "R.HISTORICALLY#2").PowerUp);
    }

    [Fact]
    public void Build_WhenSince_HoldsFromTheStartWhileTheLeftSideHolds()
    {
        var model = BuildModel(Bay + "require R: CMD SINCE CLOSE;\n");

        // s := b OR (a AND last(s)), power-up FALSE.
        var since = model.CellNamed("R.SINCE#1").Index;
        var value = Assert.IsType<OrExpression>(Assert.IsType<AssignStep>(model.Steps[model.WriterOfCell[since]]).Value);
        Assert.Equal((model.CellNamed("CLOSE").Index, ReadTiming.Current), Read(value.Operands[0]));
        var holding = Assert.IsType<AndExpression>(value.Operands[1]);
        Assert.Equal((model.CellNamed("CMD").Index, ReadTiming.Current), Read(holding.Operands[0]));
        Assert.Equal((since, ReadTiming.Previous), Read(holding.Operands[1]));
        Assert.Equal(new KnownBoolPowerUp(false), LastOf(model, "R.SINCE#1").PowerUp);
    }

    [Fact]
    public void Build_WhenHeldAndWithin_UseAnOnDelayAndAnOffDelayTimer()
    {
        var model = BuildModel(Bay + "require R: HELD(CLOSE, T#20ms) -> WITHIN(CMD, T#5ms);\n");

        var held = Assert.IsType<TimerStep>(model.WriterOf("R.HELD#1"));
        Assert.Equal((TimerKind.OnDelay, 10), (held.Kind, held.PresetScans));
        var within = Assert.IsType<TimerStep>(model.WriterOf("R.WITHIN#2"));
        Assert.Equal((TimerKind.OffDelay, 3), (within.Kind, within.PresetScans));

        // 5 ms at 2 ms scans is 2.5 scans: rounded up and recorded.
        var rounding = Assert.Single(model.Roundings);
        Assert.Equal(("T#5ms", 3), (rounding.Text, rounding.Scans));
    }

    [Fact]
    public void Build_WhenOperatorsNest_NumbersInnerFirst()
    {
        var model = BuildModel(Bay + "require R: ONCE(ROSE(CLOSE)) -> PREV(CMD SINCE CLOSE);\n");

        Assert.Equal(
            ["R", "R.ROSE#1", "R.ONCE#2", "R.SINCE#3", "R.PREV#4"],
            model.Cells.Where(c => c.Kind == CellKind.Hidden).Select(c => c.Name));
    }

    [Fact]
    public void Build_WhenAssumptions_MakesAssumptionCellsNamedOrNumbered()
    {
        var model = BuildModel(Bay + "assume NOT (CMD AND CLOSED);\nassume HEALTHY: LEVEL >= 0;\n");

        Assert.Equal([null, "HEALTHY"], model.Assumptions.Select(a => a.Name));
        Assert.Equal(["assume#1", "HEALTHY"], model.Assumptions.Select(a => model.Cells[a.Cell].Name));
        Assert.Empty(model.Properties);
    }

    [Fact]
    public void Build_WhenExtraPropertyGiven_LowersItLikeARequirementWithItsOrigin()
    {
        var scheme = BindScheme(Bay);
        var close = scheme.Symbols["CLOSE"];
        var closed = scheme.Symbols["CLOSED"];
        var span = new SourceSpan("rules", 0, 0, 0, 0);
        var formula = new BoundBinary(
            Language.Syntax.BinaryOperator.Implies,
            new BoundSymbolReference(closed, span),
            new BoundUnary(Language.Syntax.UnaryOperator.Not, new BoundSymbolReference(close, span), Language.Syntax.ValueType.Bool, span),
            Language.Syntax.ValueType.Bool,
            span);

        var model = ModelBuilder.Build(scheme, [new ExtraProperty("close_only_when_open", formula, PropertyOrigin.Rule, span, "A close starts only with the breaker open.")]).Model!;

        var property = Assert.Single(model.Properties);
        Assert.Equal(PropertyOrigin.Rule, property.Origin);
        Assert.Equal("A close starts only with the breaker open.", property.Statement);
        Assert.Equal("close_only_when_open", model.Cells[property.Cell].Name);
    }

    [Fact]
    public void Build_WhenRequirementIsNamedLikeAVariable_GivesItsCellAUniqueName()
    {
        var model = BuildModel(Bay + "require CLOSE: ONCE(CMD);\n");

        var property = Assert.Single(model.Properties);
        Assert.Equal("CLOSE", property.Name);
        Assert.Equal("CLOSE~2", model.Cells[property.Cell].Name);
        Assert.NotNull(model.CellNamed("CLOSE~2.ONCE#1"));
    }

    private static (int Cell, ReadTiming Timing) Read(ScanExpression expression)
    {
        var read = Assert.IsType<CellReadExpression>(expression);
        return (read.Cell, read.Timing);
    }
}
