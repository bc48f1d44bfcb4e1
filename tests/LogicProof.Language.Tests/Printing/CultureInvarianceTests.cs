using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Printing;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Printing;

/// <summary>
/// Parsing, binding, printing and messages must not depend on the current culture: Turkish has a dotted and a
/// dotless i (so "init".ToUpper() is not "INIT" there) and French writes decimals with a comma.
/// </summary>
[Collection(SequentialCollection.Name)]
public class CultureInvarianceTests
{
    private const string Text = Scheme.Header
        + "inputs\n  i : real range -1.5 .. 2.25 \"İı\";\n  FILL : bool;\nend\n"
        + "settings\n  LIMIT : real = 0.125;\n  DELAY : TIME = TIME#1.5s;\nend\n"
        + "locals\n  Fill_Level : real INIT -0.5;\n  init_done : bool Init TRUE;\nend\n"
        + "outputs\n  QI : bool;\nend\n"
        + "logic\n  fill_level := I * 1.5 - limit / 4;\n  INIT_DONE := fill AND fill_level > 0.75;\n  qi := TON(in := Init_Done, Pt := delay);\nend\n"
        + "require INITIAL: PREV(i) <= I + 0.5 OR NOT FILL;\n";

    private const string BadText = Scheme.Header + "inputs\n  i : real;\nend\nlocals\n  X : bool;\nend\nlogic\n  X := I * i + 1.5;\n  x := II;\nend\n";

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    [InlineData("de-CH")]
    public void LoadAndPrint_WhenCultureIsNotInvariant_GivesByteIdenticalOutput(string culture)
    {
        var expected = Run(CultureInfo.InvariantCulture);

        var actual = Run(CultureInfo.GetCultureInfo(culture));

        Assert.Equal(expected, actual);
    }

    [Fact]
    public void Load_WhenNamesDifferInLetterCaseUnderTurkishCulture_StillMatchesThem()
    {
        var before = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.CurrentUICulture = CultureInfo.GetCultureInfo("tr-TR");
            var result = Scheme.LoadValid(Text);
            Assert.Equal(3, result.Scheme!.Equations.Count);
            Assert.Equal("i", result.Scheme.Symbols["I"].Name);
        }
        finally
        {
            (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture) = before;
        }
    }

    private static string Run(CultureInfo culture)
    {
        var before = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.CurrentUICulture = culture;
            var good = Scheme.LoadValid(Text);
            var bad = Scheme.Load(BadText);
            return SchemePrinter.Print(good.Syntax!) + "\n---\n" + string.Join("\n", bad.Diagnostics.Select(d => DiagnosticFormatter.Format(d, bad.Source)));
        }
        finally
        {
            (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture) = before;
        }
    }
}
