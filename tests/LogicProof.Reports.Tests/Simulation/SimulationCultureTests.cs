using System.Globalization;
using LogicProof.Model.Simulation;
using LogicProof.Reports.Simulation;

namespace LogicProof.Reports.Tests.Simulation;

/// <summary>Rendered simulations are byte-identical whatever the current culture (decimal comma, Turkish casing).</summary>
public sealed class SimulationCultureTests
{
    public static TheoryData<string> Formats => ["text", "csv", "json"];

    [Theory]
    [MemberData(nameof(Formats))]
    public void Render_UnderTurkishFrenchAndInvariantCultures_IsByteIdentical(string format)
    {
        var outputs = new[] { "tr-TR", "fr-FR", string.Empty }
            .Select(culture => RenderUnder(culture, format))
            .ToList();
        Assert.Equal(outputs[0], outputs[1]);
        Assert.Equal(outputs[0], outputs[2]);
        Assert.Contains(format == "text" ? "-0.05*" : "-0.05", outputs[0], StringComparison.Ordinal);
    }

    private static string RenderUnder(string culture, string format)
    {
        var previous = CultureInfo.CurrentCulture;
        var previousUi = CultureInfo.CurrentUICulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(culture);
            CultureInfo.CurrentUICulture = CultureInfo.GetCultureInfo(culture);
            var writer = new StringWriter(CultureInfo.CurrentCulture);
            Action<SimulationRun, TextWriter> render = format switch
            {
                "csv" => SimulationCsvRenderer.Render,
                "json" => SimulationJsonRenderer.Render,
                _ => SimulationTextRenderer.Render,
            };
            render(SimulationRunSamples.QuarterCycleRun(), writer);
            return writer.ToString();
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
            CultureInfo.CurrentUICulture = previousUi;
        }
    }
}
