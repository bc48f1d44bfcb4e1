using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using nietras.SeparatedValues;

namespace LogicProof.Model.Traces;

/// <summary>
/// Splits the text of a trace file into records with Sep: comma-separated, RFC 4180 quoting (a quoted cell may
/// hold commas; <c>""</c> inside quotes is one quote), spaces around cells trimmed. Lines whose first non-blank
/// character is <c>#</c> are comments and blank lines are skipped; both are blanked before splitting, so a quote
/// inside a comment cannot swallow the lines after it and line numbers stay those of the file.
/// </summary>
internal static class TraceCsvScanner
{
    public static IReadOnlyList<TraceCsvRecord> Scan(string content)
    {
        var records = new List<TraceCsvRecord>();
        using var reader = Sep.New(',').Reader(options => options with
        {
            HasHeader = false,
            DisableColCountCheck = true,
            Unescape = true,
            Trim = SepTrim.All,
        }).FromText(BlankComments(content));
        foreach (var row in reader)
        {
            var rowSpan = row.Span;
            var cells = new TraceCsvCell[row.ColCount];
            var blank = true;
            for (var i = 0; i < row.ColCount; i++)
            {
                var cellSpan = row[i].Span;
                var offset = (int)(Unsafe.ByteOffset(ref MemoryMarshal.GetReference(rowSpan), ref MemoryMarshal.GetReference(cellSpan)) / sizeof(char));
                cells[i] = new TraceCsvCell(cellSpan.ToString(), Math.Max(offset, 0) + 1, cellSpan.Length);
                blank &= cellSpan.IsEmpty;
            }

            if (blank)
            {
                continue;
            }

            // Sep counts the lines a record spans; a record that spans several lines started that many lines earlier.
            var extraLines = rowSpan.Count('\n');
            records.Add(new TraceCsvRecord(row.LineNumberToExcl - 1 - extraLines, cells, extraLines > 0));
        }

        return records;
    }

    private static string BlankComments(string content)
    {
        var lines = content.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            if (lines[i].AsSpan().TrimStart().StartsWith("#"))
            {
                lines[i] = lines[i].EndsWith('\r') ? "\r" : string.Empty;
            }
        }

        return string.Join('\n', lines);
    }
}
