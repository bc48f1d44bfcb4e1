using System.Text;

namespace LogicProof.Reports.Check;

/// <summary>Replaces the characters an output format cannot carry: lone surrogates always, and whatever else it forbids.</summary>
internal static class CharacterReplacement
{
    /// <summary>
    /// The text with each lone surrogate, and each other character that <paramref name="allowed"/> rejects, replaced by
    /// <paramref name="replacement"/>; the same string when nothing needs replacing.
    /// </summary>
    public static string Replace(string text, Func<char, bool> allowed, char replacement)
    {
        StringBuilder? replaced = null;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            var valid = char.IsSurrogate(c)
                ? (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
                    || (char.IsLowSurrogate(c) && i > 0 && char.IsHighSurrogate(text[i - 1]))
                : allowed(c);
            if (!valid)
            {
                replaced ??= new StringBuilder(text, 0, i, text.Length);
                replaced.Append(replacement);
            }
            else
            {
                replaced?.Append(c);
            }
        }

        return replaced?.ToString() ?? text;
    }
}
