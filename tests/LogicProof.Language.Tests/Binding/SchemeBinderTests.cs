using Fractions;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using LogicProof.Language.Tests.Support;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Tests.Binding;

public class SchemeBinderTests
{
    private const string Declarations = Scheme.Header
        + "inputs\n  A : bool;\n  B : bool;\n  R : real range 0 .. 1.5 \"volts\";\nend\n"
        + "settings\n  DELAY : time = 30 cyc;\n  GAIN : real = 2.5;\n  ENABLED : bool = TRUE;\nend\n"
        + "locals\n  X : bool init TRUE;\n  Y : real;\nend\n"
        + "outputs\n  Q : bool;\nend\n";

    [Fact]
    public void Bind_WhenSchemeIsValid_DeclaresEverySymbolWithKindTypeAndDetails()
    {
        var scheme = Scheme.LoadValid(Declarations).Scheme!;

        Assert.Equal(9, scheme.Symbols.Count);
        Assert.Equal((SymbolKind.Input, ValueType.Real), (scheme.Symbols["r"].Kind, scheme.Symbols["r"].Type));
        Assert.Equal(new Fraction(3, 2), scheme.Symbols["R"].Range!.High);
        Assert.Equal("volts", scheme.Symbols["R"].Description);
        Assert.True(Assert.IsType<BoundBoolConstant>(scheme.Symbols["x"].PowerUp).Value);
        Assert.Null(scheme.Symbols["Y"].PowerUp);
        Assert.Equal(SymbolKind.Output, scheme.Symbols["q"].Kind);
        var gain = Assert.IsType<BoundRealConstant>(scheme.Symbols["Gain"].SettingValue);
        Assert.Equal((new Fraction(5, 2), "GAIN"), (gain.Value, gain.SettingName));
    }

    [Fact]
    public void Bind_WhenNamesDifferOnlyInLetterCase_FindsTheDeclaredSymbol()
    {
        var scheme = Scheme.LoadValid(Declarations + "logic\n  q := a AND Enabled;\nend\n").Scheme!;

        var equation = Assert.Single(scheme.Equations);
        Assert.Equal("Q", equation.Target.Name);
        var and = Assert.IsType<BoundBinary>(equation.Expression);
        Assert.Equal("A", Assert.IsType<BoundSymbolReference>(and.Left).Symbol.Name);
        Assert.Equal("ENABLED", Assert.IsType<BoundBoolConstant>(and.Right).SettingName);
    }

    [Fact]
    public void Bind_WhenSettingIsReferenced_ReplacesItByItsValueAtTheReference()
    {
        var scheme = Scheme.LoadValid(Declarations + "logic\n  Y := R * GAIN;\nend\n").Scheme!;

        var product = Assert.IsType<BoundBinary>(scheme.Equations[0].Expression);
        var constant = Assert.IsType<BoundRealConstant>(product.Right);
        Assert.Equal(new Fraction(5, 2), constant.Value);
        Assert.Equal("GAIN", constant.SettingName);
        Assert.Equal((22, 12), (constant.Span.Line, constant.Span.Column));
    }

    [Fact]
    public void Bind_WhenEquationsAreWritten_KeepsTheirScanOrder()
    {
        var scheme = Scheme.LoadValid(Declarations + "logic\n  Q := X;\n  X := A;\n  Y := R;\nend\n").Scheme!;

        Assert.Equal([0, 1, 2], scheme.Equations.Select(e => e.Index));
        Assert.Equal(["Q", "X", "Y"], scheme.Equations.Select(e => e.Target.Name));
    }

    [Theory]
    [InlineData("SR(S1 := A, R := B)")]
    [InlineData("SR(R := B, S1 := A)")]
    [InlineData("SR(A, B)")]
    [InlineData("sr(A, r := B)")]
    public void Bind_WhenFunctionBlockArgumentsAreNamedOrPositional_OrdersInputsAsTheStandard(string call)
    {
        var scheme = Scheme.LoadValid(Declarations + $"logic\n  Q := {call};\nend\n").Scheme!;

        var block = Assert.IsType<BoundFunctionBlockCall>(scheme.Equations[0].Expression);
        Assert.Equal(FunctionBlockKind.Sr, block.Kind);
        Assert.Equal(["A", "B"], block.Inputs.Cast<BoundSymbolReference>().Select(i => i.Symbol.Name));
        Assert.Null(block.Preset);
    }

    [Fact]
    public void Bind_WhenTimerPresetIsASettingOrALiteral_KeepsTheDurationAndItsSource()
    {
        var scheme = Scheme.LoadValid(Declarations + "logic\n  X := TON(IN := A, PT := DELAY);\n  Q := TOF(B, T#1s200ms) OR TP(PT := 2 ms, IN := A);\nend\n").Scheme!;

        var ton = Assert.IsType<BoundFunctionBlockCall>(scheme.Equations[0].Expression);
        Assert.Equal(FunctionBlockKind.Ton, ton.Kind);
        Assert.Equal(("DELAY", new Fraction(30)), (ton.Preset!.SettingName, ton.Preset.Value.Cycles!.Value));
        var or = Assert.IsType<BoundBinary>(scheme.Equations[1].Expression);
        var tof = Assert.IsType<BoundFunctionBlockCall>(or.Left);
        Assert.Equal((null, new Fraction(1200)), (tof.Preset!.SettingName, tof.Preset.Value.Milliseconds!.Value));
        var tp = Assert.IsType<BoundFunctionBlockCall>(or.Right);
        Assert.Equal(FunctionBlockKind.Tp, tp.Kind);
        Assert.Equal("A", Assert.IsType<BoundSymbolReference>(Assert.Single(tp.Inputs)).Symbol.Name);
    }

    [Fact]
    public void Bind_WhenEdgeDetectorsAndResetLatchAreCalled_BindsTheirSingleAndDoubleInputs()
    {
        var scheme = Scheme.LoadValid(Declarations + "logic\n  X := R_TRIG(CLK := A) AND F_TRIG(B);\n  Q := RS(S := A, R1 := B);\nend\n").Scheme!;

        var and = Assert.IsType<BoundBinary>(scheme.Equations[0].Expression);
        Assert.Equal(FunctionBlockKind.RTrig, Assert.IsType<BoundFunctionBlockCall>(and.Left).Kind);
        Assert.Equal(FunctionBlockKind.FTrig, Assert.IsType<BoundFunctionBlockCall>(and.Right).Kind);
        Assert.Equal(2, Assert.IsType<BoundFunctionBlockCall>(scheme.Equations[1].Expression).Inputs.Count);
    }

    [Fact]
    public void Bind_WhenPastTimeOperatorsAreUsedInFormulas_TypesThem()
    {
        var scheme = Scheme.LoadValid(Declarations
            + "require P1: PREV(R) <= R + 1;\n"
            + "require P2: HELD(A, DELAY) -> WITHIN(B, T#1s);\n"
            + "require P3: ROSE(A) OR FELL(B) OR ONCE(A) OR HISTORICALLY(B) OR A SINCE B;\n"
            + "assume PREV(A) -> TON(A, T#5ms) OR TRUE;\n").Scheme!;

        var comparison = Assert.IsType<BoundBinary>(scheme.Requirements[0].Formula);
        var previous = Assert.IsType<BoundTemporal>(comparison.Left);
        Assert.Equal((TemporalOperator.Prev, ValueType.Real), (previous.Operator, previous.Type));
        var implies = Assert.IsType<BoundBinary>(scheme.Requirements[1].Formula);
        var held = Assert.IsType<BoundTemporal>(implies.Left);
        Assert.Equal((TemporalOperator.Held, "DELAY"), (held.Operator, held.Window!.SettingName));
        Assert.Equal(TemporalOperator.Within, Assert.IsType<BoundTemporal>(implies.Right).Operator);
        Assert.Equal(BinaryOperator.Since, Assert.IsType<BoundBinary>(scheme.Requirements[2].Formula).Operator);
        Assert.Single(scheme.Assumptions);
    }

    [Theory]
    [InlineData("Y := (GAIN + 1) * R;")]
    [InlineData("Y := R * -GAIN;")]
    [InlineData("Y := R / (GAIN * 2);")]
    [InlineData("Y := MAX(GAIN, 1) * R - ABS(R) / 4;")]
    [InlineData("Y := 3 * 2 * R * 0.5;")]
    [InlineData("Y := MIN(R, MIN(1, GAIN)) + MAX(R, 0);")]
    [InlineData("X := A = B AND R <> 1 AND R >= 0 AND NOT (R > GAIN) AND A XOR B;")]
    public void Bind_WhenArithmeticIsLinear_AcceptsIt(string equation)
    {
        Scheme.LoadValid(Declarations + $"logic\n  {equation}\nend\n");
    }

    [Fact]
    public void Bind_WhenSchemeHasErrors_ProducesNoBoundScheme()
    {
        var result = Scheme.Load(Declarations + "logic\n  X := NOPE;\nend\n");

        Assert.NotNull(result.Syntax);
        Assert.Null(result.Scheme);
    }
}
