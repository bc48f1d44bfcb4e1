using System.Globalization;
using LogicProof.Model.StaticChecks;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.StaticChecks;

public sealed class StaticCheckerCultureTests
{
    // Lower-case 'i' in names and decimals in messages are where Turkish and French cultures would differ.
    private const string Scheme = Header + """
        inputs in_cmd : bool; spare_input : bool; end
        locals late_i : bool; end
        outputs X : bool; end
        logic
          X := LATE_I AND TON(IN_CMD, T#25ms) AND F_TRIG(In_Cmd);
          late_i := IN_CMD;
        end
        """;

    [Theory]
    [InlineData("tr-TR")]
    [InlineData("fr-FR")]
    public void Check_UnderAnyCulture_GivesTheSameDiagnostics(string culture)
    {
        var invariant = Render(CultureInfo.InvariantCulture);

        var other = Render(CultureInfo.GetCultureInfo(culture));

        Assert.Equal(invariant, other);
        Assert.Contains("12.5 scan intervals of 2 ms", invariant, StringComparison.Ordinal);
        Assert.Contains("LP3010", invariant, StringComparison.Ordinal);
        Assert.Contains("LP3013", invariant, StringComparison.Ordinal);
    }

    private static string Render(CultureInfo culture)
    {
        var previous = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = culture;
            return Describe(StaticChecker.Check(BindScheme(Scheme)));
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
        }
    }
}
