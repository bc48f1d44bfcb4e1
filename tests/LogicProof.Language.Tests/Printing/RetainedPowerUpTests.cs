using LogicProof.Language.Printing;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Printing;

/// <summary>
/// <c>init retained</c>: a non-volatile memory (IEC 61131-3 RETAIN: a retentive variable keeps its value across a
/// restart) read, bound, printed and read again.
/// </summary>
public class RetainedPowerUpTests
{
    private const string Text = Scheme.Header
        + "inputs\n  TRIP_86 : bool;\n  RESET_86 : bool;\nend\n"
        + "outputs\n  LOCKOUT_86 : bool INIT Retained \"non-volatile 86\";\n  SEEN : bool init FALSE;\nend\n"
        + "logic\n  LOCKOUT_86 := SR(S1 := TRIP_86, R := RESET_86);\n  SEEN := LOCKOUT_86;\nend\n";

    [Fact]
    public void Load_WhenALatchIsDeclaredInitRetained_MarksItRetainedWithoutAnInitValue()
    {
        var result = Scheme.LoadValid(Text);

        var lockout = result.Syntax!.Variables[0];
        Assert.True(lockout.Retained);
        Assert.Null(lockout.Initial);
        Assert.Equal("non-volatile 86", lockout.Description);
        Assert.False(result.Syntax.Variables[1].Retained);
        Assert.True(result.Scheme!.Symbols["LOCKOUT_86"].Retained);
        Assert.Null(result.Scheme.Symbols["LOCKOUT_86"].PowerUp);
        Assert.False(result.Scheme.Symbols["SEEN"].Retained);
    }

    [Fact]
    public void PrintThenParse_WhenALatchIsRetained_KeepsItRetained()
    {
        var original = Scheme.LoadValid(Text).Syntax!;

        var printed = SchemePrinter.Print(original);
        var reparsed = Scheme.LoadValid(printed).Syntax!;

        Assert.Contains("    LOCKOUT_86 : bool init retained \"non-volatile 86\";\n", printed, StringComparison.Ordinal);
        Assert.Null(SyntaxComparer.FirstDifference(original, reparsed));
        Assert.Equal(printed, SchemePrinter.Print(reparsed));
    }

    [Fact]
    public void Load_WhenRetainedIsUsedAsAName_StillAcceptsIt()
    {
        // The word is not reserved: it only means something after init.
        var result = Scheme.LoadValid(Scheme.Header + "inputs\n  RETAINED : bool;\nend\noutputs\n  O : bool init retained;\nend\nlogic\n  O := RETAINED;\nend\n");

        Assert.True(result.Syntax!.Variables[0].Retained);
    }
}
