using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Model.Tests.Lowering;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>Simulates <c>.lpl</c> source text through the real front end and lowering.</summary>
internal static class SchemeFixture
{
    public static ScanSimulator Simulator(string text) => ScanSimulator.Compile(LoweringFixture.BuildModel(text));

    public static int Cell(this ScanModel model, string name) => model.CellNamed(name).Index;

    /// <summary>
    /// Runs bool waveforms (one character per scan) given by input name, and returns the watched cell's waveform.
    /// Unknown latches start from <paramref name="unknownStart"/>.
    /// </summary>
    public static string Run(string text, string watched, IReadOnlyDictionary<string, string> waveforms, bool unknownStart = false) =>
        SimulationHarness.Run(LoweringFixture.BuildModel(text), waveforms, unknownStart, watched)[watched];
}
