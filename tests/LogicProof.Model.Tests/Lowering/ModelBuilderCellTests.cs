using LogicProof.Model.Scan;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Lowering;

public sealed class ModelBuilderCellTests
{
    private const string Bay = Header + """
        outputs
          CLOSE_OUT : bool "close coil";
        end
        inputs
          CS_CLOSE : bool "control switch close";
          LINE_V   : real range 0 .. 1.5;
        end
        locals
          FAIL_TMR : bool;
          PULSE    : bool;
        end
        logic
          FAIL_TMR := TON(IN := CLOSE_OUT, PT := T#500ms);
          PULSE := TP(R_TRIG(CS_CLOSE), T#100ms) AND LINE_V > 0.8;
          CLOSE_OUT := PULSE AND NOT FAIL_TMR;
        end
        """;

    [Fact]
    public void Build_WhenSectionsInAnyOrder_PutsInputsFirstThenVariablesInDeclarationOrderThenHiddenCells()
    {
        var model = BuildModel(Bay);

        Assert.Equal(
            ["CS_CLOSE", "LINE_V", "CLOSE_OUT", "FAIL_TMR", "PULSE", "PULSE.R_TRIG#1", "PULSE.TP#2"],
            model.Cells.Select(c => c.Name));
        Assert.Equal(
            [CellKind.Input, CellKind.Input, CellKind.Variable, CellKind.Variable, CellKind.Variable, CellKind.Hidden, CellKind.Hidden],
            model.Cells.Select(c => c.Kind));
        Assert.Equal([0, 1], model.Inputs);
        Assert.Equal(Enumerable.Range(0, model.Cells.Count), model.Cells.Select(c => c.Index));
    }

    [Fact]
    public void Build_WhenDeclared_CopiesTypesDescriptionsRangesAndOutputFlag()
    {
        var model = BuildModel(Bay);

        Assert.Equal(SignalType.Real, model.CellNamed("LINE_V").Type);
        Assert.Equal((Fractions.Fraction.Zero, new Fractions.Fraction(3, 2)), model.CellNamed("LINE_V").Range);
        Assert.Equal("control switch close", model.CellNamed("CS_CLOSE").Description);
        Assert.True(model.CellNamed("CLOSE_OUT").IsOutput);
        Assert.False(model.CellNamed("FAIL_TMR").IsOutput);
        Assert.Equal((12, 3), (model.CellNamed("FAIL_TMR").Span.Line, model.CellNamed("FAIL_TMR").Span.Column));
    }

    [Fact]
    public void Build_WhenWholeRightSideIsOneBlock_TheBlockWritesTheVariableCell()
    {
        var model = BuildModel(Bay);

        var timer = Assert.IsType<TimerStep>(model.WriterOf("FAIL_TMR"));
        Assert.Equal(TimerKind.OnDelay, timer.Kind);
        Assert.Equal(250, timer.PresetScans);
        Assert.DoesNotContain(model.Cells, c => c.Name.StartsWith("FAIL_TMR.", StringComparison.Ordinal));
    }

    [Fact]
    public void Build_WhenBlocksAreNested_RunsThemInnerFirstJustBeforeTheEquation()
    {
        var model = BuildModel(Bay);

        var pulse = model.WriterOfCell[model.CellNamed("PULSE").Index];
        var edge = Assert.IsType<EdgeStep>(model.Steps[pulse - 2]);
        var timer = Assert.IsType<TimerStep>(model.Steps[pulse - 1]);
        Assert.IsType<AssignStep>(model.Steps[pulse]);
        Assert.Equal("PULSE.R_TRIG#1", model.Cells[edge.Target].Name);
        Assert.Equal("PULSE.TP#2", model.Cells[timer.Target].Name);
        Assert.Equal(TimerKind.Pulse, timer.Kind);
        var timerInput = Assert.IsType<CellReadExpression>(timer.Input);
        Assert.Equal((edge.Target, ReadTiming.Current), (timerInput.Cell, timerInput.Timing));
    }

    [Fact]
    public void Build_Always_FillsWriterOfCellAndEquationStepCount()
    {
        var model = BuildModel(Bay + "\nrequire R: ONCE(CLOSE_OUT) -> TRUE;\n");

        Assert.Equal([-1, -1], model.WriterOfCell.Take(2));
        for (var cell = 2; cell < model.Cells.Count; cell++)
        {
            Assert.Equal(cell, model.Steps[model.WriterOfCell[cell]].Target);
        }

        // Steps: FAIL_TMR timer; PULSE's R_TRIG, TP and assignment; CLOSE_OUT; then the monitor and the requirement.
        Assert.Equal(5, model.EquationStepCount);
        Assert.Equal(7, model.Steps.Count);
        Assert.Equal("QM7_TEST", model.Name);
    }

    [Fact]
    public void Build_WhenTwoBlocksSitSideBySide_NumbersThemLeftToRight()
    {
        var model = BuildModel(Header + """
            inputs A : bool; B : bool; end
            outputs X : bool; end
            logic X := TON(A, T#10ms) OR F_TRIG(B) OR TOF(B, T#4ms); end
            """);

        Assert.Equal(["X.TON#1", "X.F_TRIG#2", "X.TOF#3"], model.Cells.Skip(3).Select(c => c.Name));
    }

    [Fact]
    public void Build_WhenAndChainIsLong_FlattensItIntoOneNode()
    {
        var model = BuildModel(Header + """
            inputs A : bool; B : bool; C : bool; D : bool; end
            outputs X : bool; end
            logic X := A AND B AND (C AND D); end
            """);

        var and = Assert.IsType<AndExpression>(Assert.IsType<AssignStep>(model.WriterOf("X")).Value);
        Assert.Equal([0, 1, 2, 3], and.Operands.Cast<CellReadExpression>().Select(r => r.Cell));
    }

    [Fact]
    public void Build_WhenArithmeticHasConstants_FoldsThemAndScales()
    {
        var model = BuildModel(Header + """
            inputs V : real; W : real; end
            settings GAIN : real = 0.5; end
            outputs HIGH : bool; end
            logic HIGH := V * (2 * GAIN + 1) - W / 4 > 1 + 2; end
            """);

        var compare = Assert.IsType<CompareExpression>(Assert.IsType<AssignStep>(model.WriterOf("HIGH")).Value);
        Assert.Equal(CompareOperator.Greater, compare.Operator);
        Assert.Equal(new Fractions.Fraction(3), Assert.IsType<RealConstantExpression>(compare.Right).Value);
        var difference = Assert.IsType<SubtractExpression>(compare.Left);
        Assert.Equal(new Fractions.Fraction(2), Assert.IsType<ScaleExpression>(difference.Left).Factor);
        Assert.Equal(new Fractions.Fraction(1, 4), Assert.IsType<ScaleExpression>(difference.Right).Factor);
    }
}
