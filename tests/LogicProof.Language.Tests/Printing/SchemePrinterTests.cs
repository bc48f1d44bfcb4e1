using LogicProof.Language.Printing;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Printing;

public class SchemePrinterTests
{
    [Fact]
    public void Print_WhenSchemeIsWrittenFreely_GivesTheCanonicalLayout()
    {
        var syntax = Scheme.Load(
            "// comments go\nSCHEME Qm7 \"Bay \"\"7\"\"\";FREQUENCY 60.0 HZ;SCAN 0.25 CYC;\n"
            + "REQUIRE R1: (A) -> NOT(B);ASSUME NOT A OR B;\n"
            + "OUTPUTS O : BOOL INIT FALSE; END\nLOGIC O := (A AND (B)); END\nINPUTS A : BOOL; B : REAL RANGE -1.50 .. 2; END\n"
            + "ROLES close_output = O, A; END BREAKER_MODEL t = 3 cyc .. 5 CYC; END\nSETTINGS P : TIME = t#1S; END LOCALS L : REAL; END\n").Syntax!;

        var printed = SchemePrinter.Print(syntax);

        Assert.Equal(
            "scheme Qm7 \"Bay \"\"7\"\"\";\nfrequency 60 Hz;\nscan 0.25 CYC;\n"
            + "\ninputs\n    A : bool;\n    B : real range -1.5 .. 2;\nend\n"
            + "\nsettings\n    P : time = t#1S;\nend\n"
            + "\nlocals\n    L : real;\nend\n"
            + "\noutputs\n    O : bool init FALSE;\nend\n"
            + "\nlogic\n    O := A AND B;\nend\n"
            + "\nroles\n    close_output = O, A;\nend\n"
            + "\nbreaker_model\n    t = 3 cyc .. 5 CYC;\nend\n"
            + "\nassume NOT A OR B;\n"
            + "\nrequire R1: A -> NOT B;\n",
            printed);
    }

    [Theory]
    [InlineData("A and B or C", "A AND B OR C")]
    [InlineData("(A or B) and C", "(A OR B) AND C")]
    [InlineData("not (A and B)", "NOT (A AND B)")]
    [InlineData("((A))", "A")]
    [InlineData("A -> (B -> C)", "A -> B -> C")]
    [InlineData("(A -> B) -> C", "(A -> B) -> C")]
    [InlineData("(A since B) since C", "A SINCE B SINCE C")]
    [InlineData("A since (B since C)", "A SINCE (B SINCE C)")]
    [InlineData("X - (Y - Z) = X - Y - Z", "X - (Y - Z) = X - Y - Z")]
    [InlineData("X / (Y * Z) < (X / Y) * Z", "X / (Y * Z) < X / Y * Z")]
    [InlineData("-(X + 1) >= - -X", "-(X + 1) >= --X")]
    [InlineData("(A = B) = (C = D)", "A = B = (C = D)")]
    [InlineData("not not A xor (B xor C)", "NOT NOT A XOR (B XOR C)")]
    [InlineData("X = 1.50 or X = 007 or X = 0.000", "X = 1.5 OR X = 7 OR X = 0")]
    [InlineData("ton(in := A, pt := T#1S) and prev(B) and foo()", "ton(in := A, pt := T#1S) AND prev(B) AND foo()")]
    [InlineData("held(A, 30 Cyc) or true and false", "held(A, 30 Cyc) OR TRUE AND FALSE")]
    public void Print_WhenExpressionHasRedundantParentheses_KeepsOnlyTheNeededOnes(string written, string expected)
    {
        var syntax = Scheme.LoadBody($"require P: {written};\n").Syntax!;

        Assert.Equal(expected, SchemePrinter.Print(syntax.Requirements[0].Formula));
    }

    [Fact]
    public void Print_WhenEquationIsAMillionCharactersLong_PrintsItFlat()
    {
        var chain = string.Join(" AND ", Enumerable.Repeat("A", 150_000));
        var syntax = Scheme.LoadBody($"require P: {chain};\n").Syntax!;

        Assert.Equal(chain, SchemePrinter.Print(syntax.Requirements[0].Formula));
    }
}
