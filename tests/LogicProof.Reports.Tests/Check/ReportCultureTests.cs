namespace LogicProof.Reports.Tests.Check;

/// <summary>Every format gives byte-identical output under Turkish, French and the invariant culture.</summary>
public sealed class ReportCultureTests
{
    public static TheoryData<string> Formats => Rendering.Formats;

    [Theory]
    [MemberData(nameof(Formats))]
    public void Render_UnderTurkishFrenchAndInvariantCultures_IsByteIdentical(string format)
    {
        var invariant = Rendering.RenderUnder(string.Empty, format);
        Assert.Equal(invariant, Rendering.RenderUnder("tr-TR", format));
        Assert.Equal(invariant, Rendering.RenderUnder("fr-FR", format));

        // The sample has values a culture would change: a decimal point, a lower-case i, and an elapsed time.
        Assert.Contains(format == "vcd" ? "r0.25 " : "0.25", invariant, StringComparison.Ordinal);
    }
}
