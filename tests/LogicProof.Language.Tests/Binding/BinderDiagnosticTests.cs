using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Binding;

public class BinderDiagnosticTests
{
    private const string Declarations = Scheme.Header
        + "inputs\n  A : bool;\n  B : bool;\n  R : real;\nend\n"
        + "settings\n  S_TIME : time = T#1s;\n  S_REAL : real = 2;\n  S_ZERO : real = 0;\n  S_BOOL : bool = TRUE;\nend\n"
        + "locals\n  X : bool;\n  Y : real;\nend\n";

    [Theory]
    [InlineData(LanguageCodes.DuplicateName, Scheme.Header + "inputs\n  A : bool;\n  @a : bool;\nend\n")]
    [InlineData(LanguageCodes.DuplicateName, Declarations + "outputs\n  @S_REAL : real;\nend\n")]
    [InlineData(LanguageCodes.UndefinedName, Declarations + "logic\n  X := A AND @C;\nend\n")]
    [InlineData(LanguageCodes.UndefinedName, Declarations + "logic\n  @Z := A;\nend\n")]
    [InlineData(LanguageCodes.UndefinedName, Declarations + "logic\n  X := @TON;\nend\n")]
    [InlineData(LanguageCodes.UndefinedName, Declarations + "require R1: A -> @NOPE;\n")]
    [InlineData(LanguageCodes.TargetNotAssignable, Declarations + "logic\n  @A := B;\nend\n")]
    [InlineData(LanguageCodes.TargetNotAssignable, Declarations + "logic\n  @s_bool := B;\nend\n")]
    [InlineData(LanguageCodes.AssignedTwice, Declarations + "logic\n  X := A;\n  @x := B;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := @R;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := A AND @R;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  Y := R + @A;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := @A = R;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := @A < B;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := NOT @R;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  Y := -@A;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := A OR @S_TIME;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := A OR @T#5ms;\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  X := TON(IN := @R, PT := T#1s);\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  Y := @TON(A, T#1s);\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  Y := ABS(@A);\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "logic\n  Y := MAX(R, @TRUE);\nend\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "require R1: ROSE(@R);\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "require R1: HELD(@R, T#1s);\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "require R1: A SINCE @R;\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "require R1: @PREV(R);\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "require R1: PREV(@S_TIME) -> A;\n")]
    [InlineData(LanguageCodes.TypeMismatch, Declarations + "assume @R + 1;\n")]
    [InlineData(LanguageCodes.UnknownFunction, Declarations + "logic\n  X := @FOO(A);\nend\n")]
    [InlineData(LanguageCodes.UnknownFunction, Declarations + "logic\n  X := @B(A);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "logic\n  X := @TON(A);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "logic\n  X := @TOF(IN := A);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "logic\n  X := R_TRIG(A, @B);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "logic\n  Y := @ABS(R, R);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "logic\n  Y := @MIN(R);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "logic\n  Y := @MAX(R, 1, 2);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "require R1: @HELD(A);\n")]
    [InlineData(LanguageCodes.WrongArgumentCount, Declarations + "require R1: @PREV(A, B);\n")]
    [InlineData(LanguageCodes.WrongArgumentName, Declarations + "logic\n  X := TON(IN := A, @TIME_PT := T#1s);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentName, Declarations + "logic\n  X := SR(S1 := A, @s1 := B);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentName, Declarations + "logic\n  X := RS(S := A, @R := B);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentName, Declarations + "logic\n  Y := ABS(@IN := R);\nend\n")]
    [InlineData(LanguageCodes.WrongArgumentName, Declarations + "require R1: HELD(A, @PT := T#1s);\n")]
    [InlineData(LanguageCodes.PositionalAfterNamed, Declarations + "logic\n  X := TON(IN := A, @T#1s);\nend\n")]
    [InlineData(LanguageCodes.DurationExpected, Declarations + "logic\n  X := TON(A, @5);\nend\n")]
    [InlineData(LanguageCodes.DurationExpected, Declarations + "logic\n  X := TP(A, @S_REAL);\nend\n")]
    [InlineData(LanguageCodes.DurationExpected, Declarations + "logic\n  X := TOF(IN := A, PT := @B);\nend\n")]
    [InlineData(LanguageCodes.DurationExpected, Declarations + "require R1: WITHIN(A, @R) -> B;\n")]
    [InlineData(LanguageCodes.TemporalInEquation, Declarations + "logic\n  X := A AND @PREV(B);\nend\n")]
    [InlineData(LanguageCodes.TemporalInEquation, Declarations + "logic\n  X := @held(A, T#1s);\nend\n")]
    [InlineData(LanguageCodes.TemporalInEquation, Declarations + "logic\n  X := @A SINCE B;\nend\n")]
    [InlineData(LanguageCodes.ImpliesInEquation, Declarations + "logic\n  X := @A -> B;\nend\n")]
    [InlineData(LanguageCodes.NonLinearArithmetic, Declarations + "logic\n  Y := @R * R;\nend\n")]
    [InlineData(LanguageCodes.NonLinearArithmetic, Declarations + "logic\n  Y := @2 / R;\nend\n")]
    [InlineData(LanguageCodes.NonLinearArithmetic, Declarations + "logic\n  Y := @(R + 1) * ABS(R);\nend\n")]
    [InlineData(LanguageCodes.DivisionByZero, Declarations + "logic\n  Y := R / @0;\nend\n")]
    [InlineData(LanguageCodes.DivisionByZero, Declarations + "logic\n  Y := R / @S_ZERO;\nend\n")]
    [InlineData(LanguageCodes.DivisionByZero, Declarations + "logic\n  Y := R / (@S_REAL - 2);\nend\n")]
    [InlineData(LanguageCodes.SettingValueType, Scheme.Header + "settings\n  S : real = @TRUE;\nend\n")]
    [InlineData(LanguageCodes.SettingValueType, Scheme.Header + "settings\n  S : time = @500;\nend\n")]
    [InlineData(LanguageCodes.SettingValueType, Scheme.Header + "settings\n  S : bool = @T#5ms;\nend\n")]
    [InlineData(LanguageCodes.InitValueType, Scheme.Header + "locals\n  L : bool init @1.5;\nend\n")]
    [InlineData(LanguageCodes.InitValueType, Scheme.Header + "outputs\n  L : real init @FALSE;\nend\n")]
    [InlineData(LanguageCodes.RetainedNeedsBool, Scheme.Header + "locals\n  @L : real init retained;\nend\n")]
    [InlineData(LanguageCodes.RangeNotAllowed, Scheme.Header + "inputs\n  A : bool @range 0 .. 1;\nend\n")]
    [InlineData(LanguageCodes.RangeEmpty, Scheme.Header + "inputs\n  R : real @range 2 .. -1;\nend\n")]
    [InlineData(LanguageCodes.TimeTypeNotAllowed, Scheme.Header + "inputs\n  @T1 : time;\nend\n")]
    [InlineData(LanguageCodes.TimeTypeNotAllowed, Scheme.Header + "locals\n  @T1 : time;\nend\n")]
    [InlineData(LanguageCodes.TimeTypeNotAllowed, Scheme.Header + "outputs\n  @T1 : time init T#1s;\nend\n")]
    [InlineData(LanguageCodes.ReservedName, Scheme.Header + "locals\n  @ton : bool;\nend\n")]
    [InlineData(LanguageCodes.ReservedName, Scheme.Header + "inputs\n  @Prev : bool;\nend\n")]
    [InlineData(LanguageCodes.DuplicatePropertyName, Declarations + "require R1: A;\nrequire @r1: B;\n")]
    [InlineData(LanguageCodes.DuplicatePropertyName, Declarations + "assume A1: A;\n@assume A1: B;\n")]
    public void Load_WhenNamesOrTypesAreWrong_ReportsTheCodeAtThePlace(string code, string markedText)
    {
        DiagnosticAssert.ErrorAtMarker(code, markedText);
    }

    [Theory]
    [InlineData(LanguageCodes.DuplicateName, "inputs\n  Lo86 : bool;\nend\nlocals\n  LO86 : bool;\nend\n", 8, 3, 5, 3)]
    [InlineData(LanguageCodes.AssignedTwice, "locals\n  X : bool;\nend\nlogic\n  X := TRUE;\n  X := FALSE;\nend\n", 9, 3, 8, 3)]
    [InlineData(LanguageCodes.TargetNotAssignable, "inputs\n  A : bool;\nend\nlogic\n  A := TRUE;\nend\n", 8, 3, 5, 3)]
    [InlineData(LanguageCodes.DuplicatePropertyName, "require R1: TRUE;\nrequire r1: FALSE;\n", 5, 9, 4, 9)]
    [InlineData(LanguageCodes.DuplicatePropertyName, "assume A1: TRUE;\nassume A1: FALSE;\n", 5, 1, 4, 1)]
    public void Load_WhenAnErrorInvolvesAnEarlierPlace_PointsBackAtIt(string code, string body, int line, int column, int relatedLine, int relatedColumn)
    {
        var result = Scheme.LoadBody(body);

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(code, error.Code);
        Assert.Equal((line, column), (error.Span.Line, error.Span.Column));
        var related = Assert.Single(error.Related);
        Assert.Equal((relatedLine, relatedColumn), (related.Span.Line, related.Span.Column));
    }

    [Fact]
    public void Load_WhenTypesMismatch_NamesTheExpectedAndTheFoundType()
    {
        var result = Scheme.LoadBody("inputs\n  R : real;\nend\nlocals\n  X : bool;\nend\nlogic\n  X := R;\nend\n");

        var error = Assert.Single(result.Diagnostics);
        Assert.Contains("must be bool", error.Message, StringComparison.Ordinal);
        Assert.Contains("this is real", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Load_WhenFileHasManyNameErrors_ReportsAllOfThem()
    {
        var result = Scheme.LoadBody("locals\n  X : bool;\nend\nlogic\n  X := P AND Q;\n  Y := R;\nend\nrequire Z: W;\n");

        var undefined = result.Diagnostics.Where(d => d.Code == LanguageCodes.UndefinedName).Select(d => d.Span.ToString()).ToList();
        Assert.Equal(["test.lpl:8:8", "test.lpl:8:14", "test.lpl:9:3", "test.lpl:9:8", "test.lpl:11:12"], undefined);
    }

    [Fact]
    public void Load_WhenAnOperandIsWrong_ReportsOnlyThatAndNotItsParents()
    {
        var result = Scheme.LoadBody("locals\n  X : bool;\nend\nlogic\n  X := NOT (UNKNOWN AND TRUE) OR FALSE;\nend\n");

        Assert.Equal(LanguageCodes.UndefinedName, Assert.Single(result.Diagnostics).Code);
    }
}
