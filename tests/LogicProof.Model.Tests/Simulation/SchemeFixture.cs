using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>Builds the scan model of <c>.lpl</c> source text through the real front end and lowering.</summary>
internal static class SchemeFixture
{
    public static ScanModel Model(string text)
    {
        var front = FrontEnd.LoadText("test.lpl", text);
        Assert.False(front.HasErrors, string.Join(Environment.NewLine, front.Diagnostics));
        var built = ModelBuilder.Build(front.Scheme!);
        Assert.False(built.HasErrors, string.Join(Environment.NewLine, built.Diagnostics));
        return built.Model!;
    }

    public static ScanSimulator Simulator(string text) => ScanSimulator.Compile(Model(text));

    public static int Cell(this ScanModel model, string name) =>
        model.Cells.Single(cell => cell.Name.Equals(name, StringComparison.OrdinalIgnoreCase)).Index;

    /// <summary>
    /// Runs bool waveforms (one character per scan) given by input name, and returns the watched cell's waveform.
    /// Unknown latches start from <paramref name="unknownStart"/>.
    /// </summary>
    public static string Run(string text, string watched, IReadOnlyDictionary<string, string> waveforms, bool unknownStart = false)
    {
        var simulator = Simulator(text);
        var model = simulator.Model;
        var state = simulator.PowerUpState(simulator.UnknownPowerUpSlots.ToDictionary(slot => slot.Index, _ => unknownStart));
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        var length = waveforms.Values.First().Length;
        var output = new char[length];
        for (var scan = 0; scan < length; scan++)
        {
            foreach (var (name, wave) in waveforms)
            {
                inputs.SetBool(model.Cell(name), wave[scan] == '1');
            }

            simulator.Step(state, inputs, values);
            output[scan] = values.GetBool(model.Cell(watched)) ? '1' : '0';
        }

        return new string(output);
    }
}
