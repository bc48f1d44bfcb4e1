namespace LogicProof.Core.Text;

/// <summary>The text of one source file with a line index, so offsets map to 1-based lines and columns.</summary>
public sealed class SourceText
{
    private readonly int[] _lineStarts;

    public SourceText(string path, string content)
    {
        Path = path;
        Content = content;
        _lineStarts = IndexLines(content);
    }

    public string Path { get; }

    public string Content { get; }

    public int LineCount => _lineStarts.Length;

    public SourceSpan Span(int startOffset, int length)
    {
        var (line, column) = Position(startOffset);
        return new SourceSpan(Path, startOffset, length, line, column);
    }

    public (int Line, int Column) Position(int offset)
    {
        offset = Math.Clamp(offset, 0, Content.Length);
        var index = Array.BinarySearch(_lineStarts, offset);
        var lineIndex = index >= 0 ? index : ~index - 1;
        return (lineIndex + 1, offset - _lineStarts[lineIndex] + 1);
    }

    /// <summary>The text of a 1-based line without its line break.</summary>
    public string Line(int line)
    {
        if (line < 1 || line > _lineStarts.Length)
        {
            return string.Empty;
        }

        var start = _lineStarts[line - 1];
        var end = line < _lineStarts.Length ? _lineStarts[line] : Content.Length;
        return Content[start..end].TrimEnd('\r', '\n');
    }

    private static int[] IndexLines(string content)
    {
        var starts = new List<int> { 0 };
        for (var i = 0; i < content.Length; i++)
        {
            if (content[i] == '\n')
            {
                starts.Add(i + 1);
            }
        }

        return [.. starts];
    }
}
