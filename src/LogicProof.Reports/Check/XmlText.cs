using System.Text;

namespace LogicProof.Reports.Check;

/// <summary>
/// Text made safe for XML 1.0 (and so for XHTML-style HTML): characters XML cannot hold (most control characters,
/// lone surrogates, U+FFFE and U+FFFF) become <c>?</c>; markup characters are escaped by the writer that uses it.
/// </summary>
internal static class XmlText
{
    public static string Clean(string text)
    {
        StringBuilder? cleaned = null;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            var valid = c is '\t' or '\n' or '\r'
                || (c >= ' ' && c < '\uD800')
                || (c > '\uDFFF' && c < '\uFFFE')
                || (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
                || (char.IsLowSurrogate(c) && i > 0 && char.IsHighSurrogate(text[i - 1]));
            if (!valid)
            {
                cleaned ??= new StringBuilder(text, 0, i, text.Length);
                cleaned.Append('?');
            }
            else
            {
                cleaned?.Append(c);
            }
        }

        return cleaned?.ToString() ?? text;
    }
}
