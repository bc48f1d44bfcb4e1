namespace LogicProof.Reports.Check;

/// <summary>
/// Text made safe for XML 1.0 (and so for XHTML-style HTML): characters XML cannot hold (most control characters,
/// lone surrogates, U+FFFE and U+FFFF) become <c>?</c>; markup characters are escaped by the writer that uses it.
/// </summary>
internal static class XmlText
{
    public static string Clean(string text) =>
        CharacterReplacement.Replace(text, static c => c is '\t' or '\n' or '\r' || (c >= ' ' && c < '\uFFFE'), '?');
}
