using System.Globalization;
using System.Numerics;
using System.Text;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Exports;

/// <summary>
/// A counterexample as an IEEE 1364 value change dump for waveform viewers. The header has no <c>$date</c> (the
/// same trace gives the same bytes), a <c>$comment</c> naming the property, the failing scan and any power-up
/// choice, the <see cref="VcdTimescale"/> in which every row start is a whole number (else 1 ns, rounded, and
/// the comment says so), and one <c>$scope module</c> named after the scheme with a <c>wire 1</c> per bool signal
/// and a <c>real 64</c> per real one (inputs, outputs, cone cells and the property; timer counters are left out,
/// since they change inside accelerated rows). Values are dumped at time 0 and then at the start of each row where
/// they change; a last timestamp marks the end of the failing scan. Reals are written as decimals of at most 12
/// places (viewers read them as binary floating point anyway; the exact values are in the JSON export).
/// </summary>
public static class VcdExporter
{
    private const int RealDecimals = 12;

    public static void Export(CounterexampleView view, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(view);
        ArgumentNullException.ThrowIfNull(writer);
        var grid = new TraceGrid(view);
        var shown = Enumerable.Range(0, grid.Signals.Count).Where(s => grid.Signals[s].Role != TraceSignalRole.Timer).ToList();
        var times = grid.Rows.Select(row => row.StartMilliseconds).Append(view.EndMilliseconds).ToList();
        var timescale = VcdTimescale.Choose(times);

        WriteHeader(view, grid, shown, timescale, writer);
        BigInteger? previous = null;
        for (var row = 0; row < grid.Rows.Count; row++)
        {
            var changed = row == 0 ? shown : shown.Where(s => grid.Changed(row, s)).ToList();
            if (changed.Count == 0)
            {
                continue;
            }

            previous = Timestamp(writer, timescale.Ticks(grid.Rows[row].StartMilliseconds), previous);
            if (row == 0)
            {
                Line(writer, "$dumpvars");
            }

            foreach (var signal in changed)
            {
                if (ValueChange(grid.Value(row, signal), grid.Signals[signal], Code(shown.IndexOf(signal))) is { } change)
                {
                    Line(writer, change);
                }
            }

            if (row == 0)
            {
                Line(writer, "$end");
            }
        }

        Timestamp(writer, timescale.Ticks(view.EndMilliseconds), previous);
    }

    /// <summary>The short identifier of the n-th variable: printable ASCII from <c>!</c> to <c>~</c>, base 94.</summary>
    public static string Code(int index)
    {
        var code = new StringBuilder();
        do
        {
            code.Append((char)('!' + (index % 94)));
            index = (index / 94) - 1;
        }
        while (index >= 0);
        return code.ToString();
    }

    private static void WriteHeader(CounterexampleView view, TraceGrid grid, List<int> shown, VcdTimescale timescale, TextWriter writer)
    {
        Line(writer, "$comment");
        Line(writer, $"  LogicProof counterexample: {OneLine(view.PropertyName)} of scheme {OneLine(view.SchemeName)}, found by {OneLine(view.Engine)}.");
        Line(writer, $"  It fails at scan {ReportSentences.Count(view.Trace.FailingScan)}, {ExactNumberText.FormatExact(view.FailingMilliseconds)} ms after power-up; "
            + $"the dump ends when that scan ends. Scan interval {ExactNumberText.FormatExact(view.Timing.ScanMilliseconds)} ms.");
        foreach (var note in view.PowerUp)
        {
            Line(writer, $"  Power-up: latch {OneLine(note.Latch)} starts {ReportSentences.Logical(note.BreakingValue)}.");
        }

        if (timescale.Rounded)
        {
            Line(writer, "  Times are rounded to the nearest nanosecond: the scan interval is not a whole number of nanoseconds.");
        }

        Line(writer, "$end");
        Line(writer, "$version LogicProof $end");
        Line(writer, $"$timescale {timescale.Text} $end");
        Line(writer, $"$scope module {Identifier(view.SchemeName)} $end");
        for (var i = 0; i < shown.Count; i++)
        {
            var signal = grid.Signals[shown[i]];
            var kind = signal.Type == TraceSignalType.Bool ? "wire 1" : "real 64";
            Line(writer, $"$var {kind} {Code(i)} {Identifier(signal.Name)} $end");
        }

        Line(writer, "$upscope $end");
        Line(writer, "$enddefinitions $end");
    }

    private static BigInteger Timestamp(TextWriter writer, BigInteger ticks, BigInteger? previous)
    {
        // Rounding to 1 ns could only merge two row starts under a sub-nanosecond scan; keep the dump increasing anyway.
        var time = previous is { } before && ticks <= before ? before + 1 : ticks;
        Line(writer, "#" + time.ToString(CultureInfo.InvariantCulture));
        return time;
    }

    /// <summary>The change line of a value; a value the trace lacks is <c>x</c> for a wire and not written for a real.</summary>
    private static string? ValueChange(TraceValue? value, TraceSignal signal, string code) => value switch
    {
        BoolTraceValue b => (b.Value ? "1" : "0") + code,
        RealTraceValue r => "r" + ExactNumberText.FormatForDisplay(r.Value, RealDecimals).TrimEnd(ExactNumberText.RoundedMarker) + " " + code,
        CounterTraceValue c => "r" + ReportSentences.Count(c.Scans) + " " + code,
        _ => signal.Type == TraceSignalType.Bool ? "x" + code : null,
    };

    private static string Identifier(string name)
    {
        var text = new string([.. name.Select(c => char.IsWhiteSpace(c) || char.IsControl(c) ? '_' : c)]);
        return text.Length == 0 ? "_" : text;
    }

    /// <summary>Text for the comment: one line, and never the keyword that would end the comment early.</summary>
    private static string OneLine(string text) =>
        new string([.. text.Select(c => char.IsControl(c) ? ' ' : c)]).Replace("$end", "$ end", StringComparison.Ordinal);

    private static void Line(TextWriter writer, string text)
    {
        writer.Write(text);
        writer.Write('\n');
    }
}
