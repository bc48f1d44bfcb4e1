using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Simulation;

/// <summary>Runs a model over bool input sequences and returns one cell's value per scan, for compact assertions.</summary>
internal static class SimulationHarness
{
    /// <summary>
    /// Steps the model once per character of the waveforms ('1' TRUE, '0' FALSE; all the same length), one
    /// waveform per bool input in model order, and returns the watched cell as a string of '1' and '0'.
    /// </summary>
    public static string Run(ScanModel model, int watched, IReadOnlyDictionary<int, bool>? unknown, params string[] waveforms)
    {
        var simulator = ScanSimulator.Compile(model);
        var state = simulator.PowerUpState(unknown);
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        var length = waveforms.Length == 0 ? 0 : waveforms[0].Length;
        var output = new char[length];
        for (var scan = 0; scan < length; scan++)
        {
            for (var i = 0; i < waveforms.Length; i++)
            {
                inputs.SetBool(model.Inputs[i], waveforms[i][scan] == '1');
            }

            simulator.Step(state, inputs, values);
            output[scan] = values.GetBool(watched) ? '1' : '0';
        }

        return new string(output);
    }

    public static string Run(ScanModel model, int watched, params string[] waveforms) => Run(model, watched, null, waveforms);
}
