using System.Globalization;
using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Model.Traces;

namespace LogicProof.Bench;

/// <summary>
/// Simulates a generated scheme over a long input trace: the inputs change at random (fixed seed) every few tens
/// of milliseconds, as in an in-memory trace read from CSV, and every scan is stepped with every cell computed.
/// The timed part is the scan loop (trace lookup plus <see cref="ScanSimulator.Step"/>); compilation is reported
/// on its own line.
/// </summary>
internal static class SimulateBenchmark
{
    private const double TargetSeconds = 30;

    public static int Run(int equations, long seconds, int seed, TextWriter output)
    {
        var front = FrontEnd.LoadText("bench.lpl", SchemeGenerator.Generate(equations, seed));
        var built = front.Scheme is null ? null : ModelBuilder.Build(front.Scheme);
        if (built?.Model is not { } model)
        {
            output.WriteLine("benchmark failed: the generated scheme does not load");
            foreach (var diagnostic in front.Diagnostics.Concat(built?.Diagnostics ?? []).Where(d => d.IsError).Take(10))
            {
                output.WriteLine(DiagnosticFormatter.Format(diagnostic, front.Source));
            }

            return 1;
        }

        var (simulator, compile) = BenchReport.Measure(() => ScanSimulator.Compile(model));

        var durationMs = new Fraction(seconds * 1000);
        var trace = RandomTrace(model, durationMs, seed);
        var scans = trace.ScanCount(durationMs);
        var state = simulator.PowerUpStateDefaultingUnknownToFalse(null).State;
        var values = simulator.CreateValues();
        var closeCount = 0L;
        var watched = model.Cells.Last(cell => cell.IsOutput).Index;

        var (_, run) = BenchReport.Measure(() =>
        {
            foreach (var inputs in trace.InputsPerScan(scans))
            {
                simulator.Step(state, inputs, values);
                closeCount += values.GetBool(watched) ? 1 : 0;
            }

            return scans;
        });
        var counts = model.Steps.GroupBy(step => step.GetType().Name).OrderBy(group => group.Key, StringComparer.Ordinal)
            .Select(group => $"{group.Count().ToString(CultureInfo.InvariantCulture)} {group.Key}");
        var report = new BenchReport($"LogicProof benchmark: simulate {equations.ToString("N0", CultureInfo.InvariantCulture)} equations for {seconds.ToString("N0", CultureInfo.InvariantCulture)} s of relay time");
        report.Add("model", $"{model.Cells.Count.ToString("N0", CultureInfo.InvariantCulture)} cells, {model.StateSlots.Count.ToString("N0", CultureInfo.InvariantCulture)} state slots, {simulator.UnknownPowerUpSlots.Count.ToString(CultureInfo.InvariantCulture)} unknown power-ups (started FALSE)");
        report.Add("steps", string.Join(", ", counts));
        report.Add("scan interval", ExactNumberText.FormatExact(model.Timing.ScanMilliseconds) + " ms");
        report.Add("trace rows", trace.Rows.Count.ToString("N0", CultureInfo.InvariantCulture));
        report.AddTimed("compile", compile);
        report.Add("scans", scans.ToString("N0", CultureInfo.InvariantCulture));
        report.AddTimed("simulate", run);
        report.Add("scans per second", $"{BenchReport.Format(scans / run.Wall.TotalSeconds, "N0")} by the wall clock, {BenchReport.Format(scans / run.Processor.TotalSeconds, "N0")} per processor second");
        report.Add("scans with the last output on", closeCount.ToString("N0", CultureInfo.InvariantCulture));
        report.Add("target", $"< {BenchReport.Format(TargetSeconds, "N0")} s: {Verdict(run.Wall)} by the wall clock, {Verdict(run.Processor)} by processor time");
        report.Print(output);
        return 0;
    }

    private static string Verdict(TimeSpan time) => time.TotalSeconds < TargetSeconds ? "met" : "NOT met";

    private static InputTrace RandomTrace(ScanModel model, Fraction durationMs, int seed)
    {
        var random = new Random(seed + 1);
        var rows = new List<InputTraceRow>();
        var current = InputTrace.DefaultInputs(model);
        var realSteps = new[] { "-1", "-0.3", "0", "0.2", "0.45", "0.6", "3.5" }
            .Select(text => ExactNumberText.TryParse(text, out var value) ? value : Fraction.Zero).ToArray();
        for (var time = Fraction.Zero; time.CompareTo(durationMs) < 0; time += new Fraction(random.Next(10, 60)))
        {
            current = current.Clone();
            for (var changes = random.Next(1, 4); changes > 0; changes--)
            {
                var input = model.Inputs[random.Next(model.Inputs.Count)];
                if (model.Cells[input].Type == SignalType.Bool)
                {
                    current.SetBool(input, !current.GetBool(input));
                }
                else
                {
                    current.SetReal(input, realSteps[random.Next(realSteps.Length)]);
                }
            }

            rows.Add(new InputTraceRow(time, current));
        }

        return new InputTrace(model, InputTrace.DefaultInputs(model), rows, durationMs);
    }
}
