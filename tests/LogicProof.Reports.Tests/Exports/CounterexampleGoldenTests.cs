using LogicProof.Reports.Tests.Check;

namespace LogicProof.Reports.Tests.Exports;

/// <summary>The sample counterexample in each export format, byte for byte against the golden files.</summary>
public sealed class CounterexampleGoldenTests
{
    [Theory]
    [InlineData("counterexample-text", "counterexample.txt")]
    [InlineData("counterexample-json", "counterexample.json")]
    [InlineData("csv", "counterexample.csv")]
    [InlineData("vcd", "counterexample.vcd")]
    public void Export_SampleCounterexample_MatchesGolden(string format, string golden) =>
        GoldenFile.AssertMatches(golden, Rendering.Render(format));
}
