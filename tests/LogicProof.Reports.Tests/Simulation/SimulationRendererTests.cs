using LogicProof.Model.Simulation;
using LogicProof.Reports.Simulation;

namespace LogicProof.Reports.Tests.Simulation;

public sealed class SimulationRendererTests
{
    [Fact]
    public void TextRenderer_WhenRun_PrintsAlignedTableWithChangeAndRoundingMarks()
    {
        var text = Render(SimulationTextRenderer.Render, SimulationRunSamples.QuarterCycleRun());
        Assert.Equal(
            "QM7_CLOSE: 3 scans of 4.1667~ ms (exactly 25/6 ms); * marks a change since the previous scan, ~ a rounded value\n" +
            "scan  time_ms  CS_CLOSE  SLIP_HZ   |  CLOSE_OUT  DV_PU\n" +
            "0     0        0         0.1       |  0          0.3333~\n" +
            "1     4.1667~  1*        0.1       |  1*         0.3333~\n" +
            "2     8.3333~  1         -0.05*    |  1          0.3*\n",
            text);
    }

    [Fact]
    public void TextRenderer_WhenChangesOnly_SaysSoInTitle()
    {
        var text = Render(SimulationTextRenderer.Render, SimulationRunSamples.QuarterCycleRun(changesOnly: true));
        Assert.Contains("scans without a change are left out", text.Split('\n')[0], StringComparison.Ordinal);
    }

    [Fact]
    public void CsvRenderer_WhenRun_WritesExactValues()
    {
        var text = Render(SimulationCsvRenderer.Render, SimulationRunSamples.QuarterCycleRun());
        Assert.Equal(
            "scan,time_ms,CS_CLOSE,SLIP_HZ,CLOSE_OUT,DV_PU\n" +
            "0,0,0,0.1,0,1/3\n" +
            "1,25/6,1,0.1,1,1/3\n" +
            "2,25/3,1,-0.05,1,0.3\n",
            text);
    }

    [Fact]
    public void JsonRenderer_WhenRun_WritesExactStringsAndChangedNames()
    {
        var text = Render(SimulationJsonRenderer.Render, SimulationRunSamples.QuarterCycleRun());
        Assert.Equal(
            "{\"scheme\": \"QM7_CLOSE\", \"scanMs\": \"25/6\", \"scans\": 3, \"changesOnly\": false,\n" +
            " \"columns\": [{\"name\": \"CS_CLOSE\", \"kind\": \"input\", \"type\": \"bool\"}, {\"name\": \"SLIP_HZ\", \"kind\": \"input\", \"type\": \"real\"}, " +
            "{\"name\": \"CLOSE_OUT\", \"kind\": \"output\", \"type\": \"bool\"}, {\"name\": \"DV_PU\", \"kind\": \"shown\", \"type\": \"real\"}],\n" +
            " \"rows\": [\n" +
            "  {\"scan\": 0, \"timeMs\": \"0\", \"values\": [false, \"0.1\", false, \"1/3\"], \"changed\": []},\n" +
            "  {\"scan\": 1, \"timeMs\": \"25/6\", \"values\": [true, \"0.1\", true, \"1/3\"], \"changed\": [\"CS_CLOSE\", \"CLOSE_OUT\"]},\n" +
            "  {\"scan\": 2, \"timeMs\": \"25/3\", \"values\": [true, \"-0.05\", true, \"0.3\"], \"changed\": [\"SLIP_HZ\", \"DV_PU\"]}]}\n",
            text);
        using var parsed = System.Text.Json.JsonDocument.Parse(text);
        Assert.Equal(3, parsed.RootElement.GetProperty("rows").GetArrayLength());
    }

    [Fact]
    public void JsonRenderer_WhenNoRows_IsStillValidJson()
    {
        var sample = SimulationRunSamples.QuarterCycleRun();
        var empty = sample with { ScanCount = 0, Rows = [] };
        using var parsed = System.Text.Json.JsonDocument.Parse(Render(SimulationJsonRenderer.Render, empty));
        Assert.Equal(0, parsed.RootElement.GetProperty("rows").GetArrayLength());
    }

    private static string Render(Action<SimulationRun, TextWriter> render, SimulationRun run)
    {
        var writer = new StringWriter();
        render(run, writer);
        return writer.ToString();
    }
}
