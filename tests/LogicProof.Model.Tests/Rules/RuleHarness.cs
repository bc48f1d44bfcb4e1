using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Tests.Rules;

/// <summary>Loads invented test schemes, applies the rules (and the breaker model) and simulates the result.</summary>
internal static class RuleHarness
{
    public const string Header = """
        // Quillmere 115 kV substation (fictional)
        scheme QM5_TEST;
        frequency 60 Hz;
        scan 2 ms;

        """;

    public static BoundScheme Bind(string text)
    {
        var front = FrontEnd.LoadText("test.lpl", text);
        return front.Scheme ?? throw new InvalidOperationException(Describe(front.Diagnostics));
    }

    public static RuleSetupResult Setup(string text, RuleSelection? selection = null) => RuleSetup.Prepare(Bind(text), selection);

    /// <summary>The model of the scheme with the selected rules as properties; any error fails the test.</summary>
    public static ScanModel Model(string text, RuleSelection? selection = null)
    {
        var setup = Setup(text, selection);
        if (setup.ModelScheme is null)
        {
            throw new InvalidOperationException(Describe(setup.Diagnostics));
        }

        var built = ModelBuilder.Build(setup.ModelScheme, setup.ExtraProperties);
        return built.Model ?? throw new InvalidOperationException(Describe(built.Diagnostics));
    }

    /// <summary>
    /// Runs the model with one waveform per input ("0110": one character per scan; inputs not given stay FALSE) and
    /// returns the waveform of each named cell. Latches of unknown power-up start FALSE.
    /// </summary>
    public static Dictionary<string, string> Run(ScanModel model, IReadOnlyDictionary<string, string> inputs, params string[] cells)
    {
        var simulator = ScanSimulator.Compile(model);
        var state = simulator.PowerUpStateDefaultingUnknownToFalse(null).State;
        var scans = inputs.Values.Max(w => w.Length);
        var values = simulator.CreateValues();
        var scanInputs = simulator.CreateInputs();
        var result = cells.ToDictionary(c => c, _ => new System.Text.StringBuilder(), StringComparer.OrdinalIgnoreCase);
        for (var scan = 0; scan < scans; scan++)
        {
            foreach (var (name, wave) in inputs)
            {
                scanInputs.SetBool(Cell(model, name), scan < wave.Length && wave[scan] == '1');
            }

            simulator.Step(state, scanInputs, values);
            foreach (var cell in cells)
            {
                result[cell].Append(values.GetBool(Cell(model, cell)) ? '1' : '0');
            }
        }

        return result.ToDictionary(r => r.Key, r => r.Value.ToString(), StringComparer.OrdinalIgnoreCase);
    }

    public static int Cell(ScanModel model, string name) =>
        model.Cells.Single(c => string.Equals(c.Name, name, StringComparison.OrdinalIgnoreCase)).Index;

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join(Environment.NewLine, diagnostics.Select(d => DiagnosticFormatter.Format(d, null)));
}
