using System.Text;

namespace LogicProof.Model.Rules;

/// <summary>
/// Formula templates of the built-in rules: text in the language with <c>{role}</c> placeholders, and optional parts
/// in square brackets (<c>[ AND NOT {lockout}]</c>) kept only when every role inside is bound. Square brackets are
/// not part of the language, so they cannot be confused with it. Brackets do not nest.
/// </summary>
public static class RuleTemplate
{
    /// <summary>The role names of every placeholder, in order of first appearance.</summary>
    public static IReadOnlyList<string> Placeholders(string template)
    {
        ArgumentNullException.ThrowIfNull(template);
        return [.. Scan(template).Select(p => p.Name).Distinct(StringComparer.OrdinalIgnoreCase)];
    }

    /// <summary>The placeholders outside square brackets: a template cannot be rendered without them.</summary>
    public static IReadOnlyList<string> MandatoryPlaceholders(string template)
    {
        ArgumentNullException.ThrowIfNull(template);
        return [.. Scan(template).Where(p => !p.Optional).Select(p => p.Name).Distinct(StringComparer.OrdinalIgnoreCase)];
    }

    /// <summary>
    /// The formula text with each placeholder replaced by <paramref name="roleText"/> (null for an unbound role) and
    /// each bracketed part kept or dropped; null when a placeholder outside brackets is unbound.
    /// </summary>
    public static string? Render(string template, Func<string, string?> roleText)
    {
        ArgumentNullException.ThrowIfNull(template);
        ArgumentNullException.ThrowIfNull(roleText);
        var output = new StringBuilder();
        var segment = new StringBuilder();
        var inSegment = false;
        var segmentComplete = true;
        var i = 0;
        while (i < template.Length)
        {
            var c = template[i];
            if (c == '[' || c == ']')
            {
                if (c == ']' && segmentComplete)
                {
                    output.Append(segment);
                }

                inSegment = c == '[';
                segment.Clear();
                segmentComplete = true;
                i++;
                continue;
            }

            var target = inSegment ? segment : output;
            if (c != '{')
            {
                target.Append(c);
                i++;
                continue;
            }

            var close = template.IndexOf('}', i);
            if (close < 0)
            {
                throw new FormatException($"unclosed placeholder in the rule template '{template}'");
            }

            var text = roleText(template[(i + 1)..close]);
            if (text is null && !inSegment)
            {
                return null;
            }

            segmentComplete &= text is not null;
            target.Append(text);
            i = close + 1;
        }

        if (inSegment)
        {
            throw new FormatException($"unclosed '[' in the rule template '{template}'");
        }

        return output.ToString();
    }

    private static IEnumerable<(string Name, bool Optional)> Scan(string template)
    {
        var optional = false;
        for (var i = 0; i < template.Length; i++)
        {
            switch (template[i])
            {
                case '[':
                    optional = true;
                    break;
                case ']':
                    optional = false;
                    break;
                case '{':
                    var close = template.IndexOf('}', i);
                    if (close < 0)
                    {
                        throw new FormatException($"unclosed placeholder in the rule template '{template}'");
                    }

                    yield return (template[(i + 1)..close], optional);
                    i = close;
                    break;
            }
        }
    }
}
