using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Language.Binding;
using LogicProof.Model.Lowering;

namespace LogicProof.Bench;

/// <summary>
/// Times the front end and the lowering on a generated scheme: parse, bind and model build, each on its own.
/// The public front end parses and binds in one call, so parsing is timed as that call minus a second, separate
/// bind of the same syntax tree. A small scheme runs first so the figures do not include JIT compilation.
/// </summary>
internal static class FrontEndBenchmark
{
    private const double TargetMilliseconds = 2000;

    public static int Run(int equations, int seed, TextWriter output)
    {
        Measure(SchemeGenerator.Generate(1000, seed), quiet: true, output);
        var text = SchemeGenerator.Generate(equations, seed);
        return Measure(text, quiet: false, output, equations);
    }

    private static int Measure(string text, bool quiet, TextWriter output, int equations = 0)
    {
        var (front, load) = BenchReport.Measure(() => FrontEnd.LoadText("bench.lpl", text));
        if (front.Syntax is null || front.Scheme is null)
        {
            return Fail(output, "the generated scheme does not load", front.Diagnostics);
        }

        var (rebound, bind) = BenchReport.Measure(() => SchemeBinder.Bind(front.Syntax, new DiagnosticBag()));
        if (rebound is null)
        {
            return Fail(output, "the generated scheme does not bind", []);
        }

        var (built, build) = BenchReport.Measure(() => ModelBuilder.Build(front.Scheme));
        if (built.Model is null)
        {
            return Fail(output, "the generated scheme does not lower", built.Diagnostics);
        }

        if (quiet)
        {
            return 0;
        }

        var total = load + build;
        var report = new BenchReport($"LogicProof benchmark: front end and lowering, {equations.ToString("N0", CultureInfo.InvariantCulture)} equations");
        report.Add("scheme text", BenchReport.Format(text.Length / (1024.0 * 1024.0), "N2") + " MB");
        report.Add("model", $"{built.Model.Cells.Count.ToString("N0", CultureInfo.InvariantCulture)} cells, {built.Model.Steps.Count.ToString("N0", CultureInfo.InvariantCulture)} steps, {built.Model.StateSlots.Count.ToString("N0", CultureInfo.InvariantCulture)} state slots");
        report.AddTimed("parse (load minus bind)", load - bind);
        report.AddTimed("bind", bind);
        report.AddTimed("model build", build);
        report.AddTimed("total", total);
        report.Add("target", $"< {BenchReport.Format(TargetMilliseconds, "N0")} ms: {Verdict(total.Wall)} by the wall clock, {Verdict(total.Processor)} by processor time");
        report.Print(output);
        return 0;
    }

    private static string Verdict(TimeSpan time) => time.TotalMilliseconds < TargetMilliseconds ? "met" : "NOT met";

    private static int Fail(TextWriter output, string what, IEnumerable<Diagnostic> diagnostics)
    {
        output.WriteLine($"benchmark failed: {what}");
        foreach (var diagnostic in diagnostics.Where(d => d.IsError).Take(10))
        {
            output.WriteLine(DiagnosticFormatter.Format(diagnostic, null));
        }

        return 1;
    }
}
