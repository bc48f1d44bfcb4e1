using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Traces;

/// <summary>
/// Reads an input trace: a CSV file (our own format) giving a scheme's inputs over time.
/// <code>
/// # Quillmere 115 kV substation, breaker QM-7: a close during a sync window
/// time_ms, CLOSE_CMD, LOCKOUT_86, SLIP_HZ
/// 0,       0,         0,          0.25
/// 100,     1,          ,          0.05
/// 140,     0
/// 500,     END
/// </code>
/// <list type="bullet">
/// <item>Comma-separated; cells may be quoted (RFC 4180) and are trimmed. A line whose first non-blank character
/// is <c>#</c> is a comment; blank lines are skipped.</item>
/// <item>The first record is the header: <c>time_ms</c>, then one column per input, by name (case-insensitive), in
/// any order. An input without a column stays FALSE (a real 0, or its range end nearest 0) with a warning.</item>
/// <item><c>time_ms</c>: milliseconds from power-up as an exact decimal (or a fraction such as <c>25/6</c>), never
/// decreasing. A row holds from its time until the next row; scan k (starting at k·Δ ms) sees the last row
/// whose time is at most k·Δ.</item>
/// <item>Bool cells: <c>1</c>, <c>0</c>, <c>TRUE</c>, <c>FALSE</c> (case-insensitive). Real cells: an exact decimal or
/// fraction, within the input's declared range. An empty cell keeps the previous row's value (at the first row:
/// the default above). Rows may be shorter than the header.</item>
/// <item>A row whose first input cell is <c>END</c> ends the run: only scans starting before its time run.
/// Without it the run ends after the scan in which the last row takes effect. <see cref="InputTrace.ScanCount"/>
/// applies these rules; a run length given by the caller overrides them.</item>
/// </list>
/// Every problem is reported with file, line and column (codes in <see cref="TraceCodes"/>); reading never throws
/// on bad content.
/// </summary>
public static class InputTraceReader
{
    public const string TimeColumnName = "time_ms";

    public const string EndMarker = "END";

    public static InputTraceResult Read(SourceText source, ScanModel model)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(model);
        return new TraceReading(source, model).Read();
    }

    /// <summary>Reads the trace file at <paramref name="path"/>; an unreadable file is a diagnostic, not an exception.</summary>
    public static (InputTraceResult Result, SourceText? Source) ReadFile(string path, ScanModel model)
    {
        string content;
        try
        {
            content = File.ReadAllText(path);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            var diagnostic = new Diagnostic(
                TraceCodes.FileUnreadable,
                Severity.Error,
                $"cannot read the input trace: {exception.Message}",
                new SourceSpan(path, 0, 0, 0, 0));
            return (new InputTraceResult(null, [diagnostic]), null);
        }

        var source = new SourceText(path, content);
        return (Read(source, model), source);
    }

    /// <summary>The exact value of a bool cell, or null if the text is not one of 1, 0, TRUE, FALSE.</summary>
    internal static bool? ParseBool(string text) =>
        text switch
        {
            "1" => true,
            "0" => false,
            _ when text.Equals("TRUE", StringComparison.OrdinalIgnoreCase) => true,
            _ when text.Equals("FALSE", StringComparison.OrdinalIgnoreCase) => false,
            _ => null,
        };
}
