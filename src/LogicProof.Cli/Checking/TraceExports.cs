using LogicProof.Reports.Exports;

namespace LogicProof.Cli.Checking;

/// <summary>
/// Writes the first violation of a run as a simulator input trace (<c>--trace-out</c>, so that
/// <c>logicproof simulate FILE --inputs TRACE.csv</c> reproduces it) and as a value change dump (<c>--vcd-out</c>).
/// </summary>
public static class TraceExports
{
    /// <summary>Returns a line for the user saying what was written, or why nothing was.</summary>
    public static IEnumerable<string> Write(IReadOnlyList<CheckedScheme> schemes, string? csvPath, string? vcdPath)
    {
        if (csvPath is null && vcdPath is null)
        {
            yield break;
        }

        var first = schemes
            .SelectMany(s => s.Report.Properties.Where(p => p.Counterexample is not null).Select(p => (Scheme: s, Property: p)))
            .FirstOrDefault();
        if (first.Property?.Counterexample is not { } view || first.Scheme.Model is not { } model)
        {
            yield return "no violation, so no trace was written.";
            yield break;
        }

        if (csvPath is not null)
        {
            using (var writer = new StreamWriter(csvPath))
            {
                CounterexampleCsvExporter.Export(model, view, writer);
            }

            yield return $"trace of '{first.Property.Name}' written to {csvPath} (replay: logicproof simulate {first.Scheme.Report.Path} --inputs {csvPath}).";
        }

        if (vcdPath is not null)
        {
            using (var writer = new StreamWriter(vcdPath))
            {
                VcdExporter.Export(view, writer);
            }

            yield return $"waveforms of '{first.Property.Name}' written to {vcdPath}.";
        }
    }
}
