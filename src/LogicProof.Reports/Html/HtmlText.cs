using System.Text;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Html;

/// <summary>
/// Escapes text for HTML element content and quoted attribute values (<c>&amp; &lt; &gt; " '</c>), after removing
/// the characters XML cannot hold, so the page is also well-formed XML after its doctype.
/// </summary>
internal static class HtmlText
{
    public static string Escape(string text)
    {
        var clean = XmlText.Clean(text);
        var escaped = new StringBuilder(clean.Length + 16);
        foreach (var c in clean)
        {
            escaped.Append(c switch
            {
                '&' => "&amp;",
                '<' => "&lt;",
                '>' => "&gt;",
                '"' => "&quot;",
                '\'' => "&#39;",
                _ => c.ToString(),
            });
        }

        return escaped.ToString();
    }
}
