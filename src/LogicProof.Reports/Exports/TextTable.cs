using System.Text;

namespace LogicProof.Reports.Exports;

/// <summary>
/// An aligned plain-text table: columns padded to their widest cell, two spaces apart, <c>|</c> before the first
/// column of each new group, trailing blanks trimmed. Lines end with <c>\n</c>.
/// </summary>
internal sealed class TextTable(IReadOnlyList<string> headers, IReadOnlyList<int> groups)
{
    private readonly List<string[]> _rows = [];

    public void Add(IReadOnlyList<string> cells) => _rows.Add([.. cells]);

    public void Write(TextWriter writer, string indent)
    {
        var widths = headers.Select((header, column) => _rows.Aggregate(header.Length, (width, row) => Math.Max(width, row[column].Length))).ToArray();
        WriteLine(writer, indent, headers, widths);
        foreach (var row in _rows)
        {
            WriteLine(writer, indent, row, widths);
        }
    }

    private void WriteLine(TextWriter writer, string indent, IReadOnlyList<string> cells, int[] widths)
    {
        var line = new StringBuilder(indent);
        for (var column = 0; column < cells.Count; column++)
        {
            if (column > 0)
            {
                line.Append(groups[column] != groups[column - 1] ? "  |  " : "  ");
            }

            line.Append(cells[column].PadRight(widths[column]));
        }

        writer.Write(line.ToString().TrimEnd());
        writer.Write('\n');
    }
}
