namespace LogicProof.Language.Tests.Support;

/// <summary>
/// Test text with one '@' marking where a diagnostic is expected. The marker is removed; its 1-based line and
/// column are those of the character that followed it.
/// </summary>
internal static class MarkedText
{
    public const char Marker = '@';

    public static (string Text, int Line, int Column) Split(string marked)
    {
        var index = marked.IndexOf(Marker, StringComparison.Ordinal);
        if (index < 0)
        {
            throw new ArgumentException($"no '{Marker}' marker in test text", nameof(marked));
        }

        var before = marked[..index];
        var line = before.Count(c => c == '\n') + 1;
        var column = index - (before.LastIndexOf('\n') + 1) + 1;
        return (marked.Remove(index, 1), line, column);
    }
}
