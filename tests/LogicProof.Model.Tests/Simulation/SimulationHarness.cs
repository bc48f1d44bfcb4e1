using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Model.Tests.Lowering;

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

    /// <summary>As <see cref="Run(ScanModel, IReadOnlyDictionary{string, string}, bool, string[])"/>, every unknown latch starting FALSE.</summary>
    public static Dictionary<string, string> Run(ScanModel model, IReadOnlyDictionary<string, string> inputs, params string[] cells) =>
        Run(model, inputs, unknownStart: false, cells);

    /// <summary>
    /// Runs one waveform per input, by name ("0110": one character per scan; inputs not given stay FALSE, and so
    /// does an input after its waveform ends), every latch of unknown power-up starting at
    /// <paramref name="unknownStart"/>, and returns the waveform of each named cell.
    /// </summary>
    public static Dictionary<string, string> Run(ScanModel model, IReadOnlyDictionary<string, string> inputs, bool unknownStart, params string[] cells)
    {
        var simulator = ScanSimulator.Compile(model);
        var state = simulator.PowerUpState(simulator.UnknownPowerUpSlots.ToDictionary(slot => slot.Index, _ => unknownStart));
        var scans = inputs.Values.Max(wave => wave.Length);
        var values = simulator.CreateValues();
        var scanInputs = simulator.CreateInputs();
        var result = cells.ToDictionary(cell => cell, _ => new System.Text.StringBuilder(), StringComparer.OrdinalIgnoreCase);
        for (var scan = 0; scan < scans; scan++)
        {
            foreach (var (name, wave) in inputs)
            {
                scanInputs.SetBool(model.CellNamed(name).Index, scan < wave.Length && wave[scan] == '1');
            }

            simulator.Step(state, scanInputs, values);
            foreach (var cell in cells)
            {
                result[cell].Append(values.GetBool(model.CellNamed(cell).Index) ? '1' : '0');
            }
        }

        return result.ToDictionary(r => r.Key, r => r.Value.ToString(), StringComparer.OrdinalIgnoreCase);
    }}
