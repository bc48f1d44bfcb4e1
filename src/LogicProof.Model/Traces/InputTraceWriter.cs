using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Traces;

/// <summary>
/// Writes input traces in the format <see cref="InputTraceReader"/> reads (documented there): a header with every
/// input, a first row with every value, then a row only where some input changes, holding only the changed cells;
/// bools as 1 and 0, reals exact. Reading the text back gives the same inputs at every scan. Lines end with
/// <c>\n</c> on every platform and nothing depends on the culture, so the text is byte-identical everywhere.
/// </summary>
public static class InputTraceWriter
{
    /// <summary>
    /// Writes rows of (time, every input's value); <paramref name="endMs"/> adds the END row. Times are written
    /// exactly (a fraction such as <c>25/6</c> when they have no finite decimal form).
    /// </summary>
    public static void Write(TextWriter writer, ScanModel model, IEnumerable<InputTraceRow> rows, Fraction? endMs = null, IEnumerable<string>? comments = null)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(model);
        WriteComments(writer, comments);
        WriteHeader(writer, model);
        ScanInputs? previous = null;
        foreach (var row in rows)
        {
            WriteRow(writer, model, ExactNumberText.FormatExact(row.TimeMs), row.Inputs, previous);
            previous = row.Inputs;
        }

        if (endMs is { } end)
        {
            WriteEnd(writer, ExactNumberText.FormatExact(end));
        }
    }

    /// <summary>
    /// Writes one input vector per scan, scan k at the time it starts, and an END row after the last scan, so
    /// that reading the text back runs exactly these scans. A scan start without a finite decimal form (a scan of
    /// 25/6 ms, say) is written as a short decimal just before it, still after the previous scan's start.
    /// </summary>
    public static void WriteScans(TextWriter writer, ScanModel model, IReadOnlyList<ScanInputs> inputsPerScan, IEnumerable<string>? comments = null)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(model);
        WriteComments(writer, comments);
        WriteHeader(writer, model);
        ScanInputs? previous = null;
        for (var scan = 0; scan < inputsPerScan.Count; scan++)
        {
            WriteRow(writer, model, ScanStartText(model.Timing, scan), inputsPerScan[scan], previous);
            previous = inputsPerScan[scan];
        }

        WriteEnd(writer, ScanStartText(model.Timing, inputsPerScan.Count));
    }

    /// <summary>A decimal time t with (k-1)·Δ &lt; t &lt;= k·Δ: exactly k·Δ when that has a finite decimal form.</summary>
    public static string ScanStartText(ScanTiming timing, long scan)
    {
        var start = timing.TimeOfScan(scan);
        if (ExactNumberText.IsTerminating(start))
        {
            return ExactNumberText.FormatExact(start);
        }

        var previousStart = timing.TimeOfScan(scan - 1);
        for (var decimals = 4; ; decimals++)
        {
            var candidate = ExactNumberText.Floor(start, decimals);
            if (candidate.CompareTo(previousStart) > 0)
            {
                return ExactNumberText.FormatExact(candidate);
            }
        }
    }

    private static void WriteComments(TextWriter writer, IEnumerable<string>? comments)
    {
        foreach (var comment in comments ?? [])
        {
            foreach (var line in comment.Split('\n'))
            {
                writer.Write("# ");
                writer.Write(line.TrimEnd('\r'));
                writer.Write('\n');
            }
        }
    }

    private static void WriteHeader(TextWriter writer, ScanModel model)
    {
        writer.Write(InputTraceReader.TimeColumnName);
        foreach (var input in model.Inputs)
        {
            writer.Write(',');
            writer.Write(model.Cells[input].Name);
        }

        writer.Write('\n');
    }

    private static void WriteRow(TextWriter writer, ScanModel model, string time, ScanInputs inputs, ScanInputs? previous)
    {
        if (previous is not null && model.Inputs.All(input => inputs.SameValue(previous, input)))
        {
            return;
        }

        writer.Write(time);
        var pendingSeparators = 0;
        foreach (var input in model.Inputs)
        {
            pendingSeparators++;
            if (previous is not null && inputs.SameValue(previous, input))
            {
                continue;
            }

            writer.Write(new string(',', pendingSeparators));
            pendingSeparators = 0;
            writer.Write(model.Cells[input].Type == SignalType.Bool
                ? (inputs.GetBool(input) ? "1" : "0")
                : ExactNumberText.FormatExact(inputs.GetReal(input)));
        }

        writer.Write('\n');
    }

    private static void WriteEnd(TextWriter writer, string time)
    {
        writer.Write(time);
        writer.Write(',');
        writer.Write(InputTraceReader.EndMarker);
        writer.Write('\n');
    }
}
