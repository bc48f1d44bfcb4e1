using Fractions;
using LogicProof.Language.Syntax;
using LogicProof.Language.Tests.Support;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Tests.Parsing;

public class SyntaxTreeBuilderTests
{
    [Fact]
    public void Build_WhenHeaderIsGiven_ReadsNameDescriptionFrequencyAndScan()
    {
        var syntax = Scheme.LoadValid("scheme QM7 \"Breaker \"\"QM-7\"\" close\";\nFREQUENCY 50 hz;\nScan 2 ms;\n").Syntax!;

        Assert.Equal("QM7", syntax.Name);
        Assert.Equal("Breaker \"QM-7\" close", syntax.Description);
        Assert.Equal(new Fraction(50), syntax.FrequencyHz);
        Assert.Equal(new Fraction(2), syntax.ScanInterval.Milliseconds);
    }

    [Fact]
    public void Build_WhenNumbersHaveDecimals_ReadsThemExactlyNotAsBinaryFloatingPoint()
    {
        var syntax = Scheme.LoadValid(Scheme.Header + "inputs\n  V : real range -0.1 .. 0.3;\nend\nsettings\n  K : real = 0.1;\nend\n").Syntax!;

        var range = syntax.Inputs[0].Range!;
        Assert.Equal(new Fraction(-1, 10), range.Low);
        Assert.Equal(new Fraction(3, 10), range.High);
        var value = Assert.IsType<NumberLiteralSyntax>(syntax.Settings[0].Value);
        Assert.Equal(new Fraction(1, 10), value.Value);
        Assert.Equal("0.1", value.Text);
        Assert.Equal(new Fraction(1, 5), range.High - range.Low - value.Value - value.Value);
    }

    [Fact]
    public void Build_WhenNumberIsHuge_KeepsEveryDigit()
    {
        var syntax = Scheme.LoadValid(Scheme.Header + "settings\n  K : real = 123456789012345678901234567890.000000000000000000001;\nend\n").Syntax!;

        var value = Assert.IsType<NumberLiteralSyntax>(syntax.Settings[0].Value).Value;
        Assert.Equal(Fraction.FromString("123456789012345678901234567890000000000000000000001/1000000000000000000000"), value);
    }

    [Fact]
    public void Build_WhenSectionsRepeat_ConcatenatesThemInFileOrder()
    {
        var syntax = Scheme.LoadValid(Scheme.Header
            + "outputs\n  O1 : bool;\nend\nlocals\n  L1 : bool;\nend\noutputs\n  O2 : bool;\nend\n"
            + "logic\n  O1 := TRUE;\nend\nlogic\n  O2 := FALSE;\n  L1 := O1;\nend\n"
            + "require R1: O1;\nassume O2 OR TRUE;\nrequire R2: L1 OR TRUE;\n").Syntax!;

        Assert.Equal(["O1", "L1", "O2"], syntax.Variables.Select(v => v.Name));
        Assert.Equal([VariableKind.Output, VariableKind.Local, VariableKind.Output], syntax.Variables.Select(v => v.Kind));
        Assert.Equal(["O1", "O2", "L1"], syntax.Equations.Select(e => e.Target));
        Assert.Equal(["R1", "R2"], syntax.Requirements.Select(r => r.Name));
        Assert.Null(Assert.Single(syntax.Assumptions).Name);
    }

    [Fact]
    public void Build_WhenDeclarationsHaveOptions_KeepsTypesInitValuesAndDescriptions()
    {
        var syntax = Scheme.LoadValid(Scheme.Header
            + "inputs\n  A : bool \"first \"\"input\"\"\";\nend\n"
            + "settings\n  P : time = TIME#1.5s \"preset\";\n  N : real = -2.5;\nend\n"
            + "locals\n  L : bool init TRUE;\n  M : real init -1;\nend\n").Syntax!;

        Assert.Equal("first \"input\"", syntax.Inputs[0].Description);
        Assert.Equal(ValueType.Time, syntax.Settings[0].Type);
        Assert.Equal("preset", syntax.Settings[0].Description);
        Assert.Equal(new Fraction(-5, 2), Assert.IsType<NumberLiteralSyntax>(syntax.Settings[1].Value).Value);
        Assert.True(Assert.IsType<BoolLiteralSyntax>(syntax.Variables[0].Initial).Value);
        Assert.Equal(new Fraction(-1), Assert.IsType<NumberLiteralSyntax>(syntax.Variables[1].Initial).Value);
    }

    [Fact]
    public void Build_WhenRolesAndBreakerModelAreGiven_KeepsThemUnchecked()
    {
        var syntax = Scheme.LoadValid(Scheme.Header
            + "roles\n  close_command = CS_CLOSE, REMOTE_CLOSE;\n  close_fail_time = T#500ms;\n  dead_line_enabled = TRUE;\nend\n"
            + "breaker_model\n  closing_time = 3 cyc .. 5 cyc;\n  opening_time = T#40ms;\n  trip_free = FALSE;\n  coil = CLOSE_OUT;\nend\n").Syntax!;

        Assert.Equal(["close_command", "close_fail_time", "dead_line_enabled"], syntax.Roles.Select(r => r.Role));
        Assert.Equal(["CS_CLOSE", "REMOTE_CLOSE"], syntax.Roles[0].Values.Cast<NameRoleValueSyntax>().Select(v => v.Name));
        Assert.Equal(new Fraction(500), Assert.IsType<DurationRoleValueSyntax>(syntax.Roles[1].Values[0]).Duration.Milliseconds);
        Assert.True(Assert.IsType<BoolRoleValueSyntax>(syntax.Roles[2].Values[0]).Value);
        var settings = syntax.BreakerModel!.Settings;
        var closing = Assert.IsType<DurationRangePlantValueSyntax>(settings[0].Value);
        Assert.Equal((new Fraction(3), new Fraction(5)), (closing.Low.Cycles!.Value, closing.High.Cycles!.Value));
        Assert.IsType<DurationPlantValueSyntax>(settings[1].Value);
        Assert.IsType<BoolPlantValueSyntax>(settings[2].Value);
        Assert.Equal("CLOSE_OUT", Assert.IsType<NamePlantValueSyntax>(settings[3].Value).Name);
    }

    [Fact]
    public void Build_WhenBreakerModelIsGivenTwice_KeepsTheFirstAndPointsBackAtIt()
    {
        var result = Scheme.LoadBody("breaker_model\n  a = TRUE;\nend\nbreaker_model\n  b = FALSE;\nend\n");

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.DuplicateBreakerModel, error.Code);
        Assert.Equal((7, 1), (error.Span.Line, error.Span.Column));
        var related = Assert.Single(error.Related);
        Assert.Equal((4, 1), (related.Span.Line, related.Span.Column));
        Assert.Equal("a", Assert.Single(result.Syntax!.BreakerModel!.Settings).Key);
    }

    [Fact]
    public void Build_WhenCallHasArguments_KeepsNamesAndOrder()
    {
        var syntax = Scheme.Load(Scheme.Header + "logic\n  X := SR(R := B, S1 := A) OR TON(A, T#1s);\nend\n").Syntax!;

        var or = Assert.IsType<BinarySyntax>(syntax.Equations[0].Expression);
        var sr = Assert.IsType<CallSyntax>(or.Left);
        Assert.Equal("SR", sr.Callee);
        Assert.Equal(["R", "S1"], sr.Arguments.Select(a => a.Name));
        var ton = Assert.IsType<CallSyntax>(or.Right);
        Assert.Equal([null, null], ton.Arguments.Select(a => a.Name));
        Assert.Equal((5, 31), (ton.Span.Line, ton.Span.Column));
        Assert.Equal("TON(A, T#1s)".Length, ton.Span.Length);
    }

    [Fact]
    public void Build_WhenCommentsAppearAnywhere_IgnoresThem()
    {
        var syntax = Scheme.LoadValid("(* block\n comment *) scheme // line\n T (* inline *) ;\nfrequency 60 Hz; scan 2 ms;\ninputs A : bool; // trailing\nend\n").Syntax!;

        Assert.Equal("T", syntax.Name);
        Assert.Equal("A", Assert.Single(syntax.Inputs).Name);
    }

    [Fact]
    public void Build_WhenDurationIsInvalid_StillBuildsTheTreeButGivesNoScheme()
    {
        var result = Scheme.Load(Scheme.Header + "settings\n  D : time = T#5x;\nend\nlocals\n  X : bool;\nend\nlogic\n  X := UNDECLARED;\nend\n");

        Assert.NotNull(result.Syntax);
        Assert.Null(result.Scheme);
        Assert.Equal([LanguageCodes.InvalidDuration, LanguageCodes.UndefinedName], result.Diagnostics.Select(d => d.Code));
    }
}
