using Antlr4.Runtime;
using Antlr4.Runtime.Misc;
using LogicProof.Language.Generated;

namespace LogicProof.Language.Parsing;

/// <summary>Describes tokens and sets of expected tokens in plain words for syntax error messages.</summary>
internal static class TokenDescriber
{
    private const int MaxShownTextLength = 40;

    private static readonly int[] ExpressionStart =
    [
        LogicProofParser.TRUE, LogicProofParser.FALSE, LogicProofParser.TIME_LITERAL, LogicProofParser.LPAREN,
        LogicProofParser.NUMBER, LogicProofParser.IDENT, LogicProofParser.NOT, LogicProofParser.MINUS,
    ];

    private static readonly int[] BinaryOperators =
    [
        LogicProofParser.IMPLIES, LogicProofParser.SINCE, LogicProofParser.OR, LogicProofParser.XOR, LogicProofParser.AND,
        LogicProofParser.EQ, LogicProofParser.NEQ, LogicProofParser.LT, LogicProofParser.LE, LogicProofParser.GT,
        LogicProofParser.GE, LogicProofParser.PLUS, LogicProofParser.MINUS, LogicProofParser.STAR, LogicProofParser.SLASH,
    ];

    private static readonly int[] SectionStart =
    [
        LogicProofParser.INPUTS, LogicProofParser.SETTINGS, LogicProofParser.LOCALS, LogicProofParser.OUTPUTS,
        LogicProofParser.LOGIC, LogicProofParser.ROLES, LogicProofParser.BREAKER_MODEL, LogicProofParser.REQUIRE,
        LogicProofParser.ASSUME,
    ];

    private static readonly int[] TypeNames = [LogicProofParser.BOOL, LogicProofParser.REAL, LogicProofParser.TIME];

    private static readonly int[] LiteralStart =
    [
        LogicProofParser.TRUE, LogicProofParser.FALSE, LogicProofParser.MINUS, LogicProofParser.NUMBER,
        LogicProofParser.TIME_LITERAL,
    ];

    /// <summary>"the name 'X'", "the number 5", "';'", "the end of the file".</summary>
    public static string DescribeFound(IToken token)
    {
        var text = Shorten(token.Text ?? string.Empty);
        return token.Type switch
        {
            TokenConstants.EOF => "the end of the file",
            LogicProofParser.IDENT => $"the name '{text}'",
            LogicProofParser.NUMBER => $"the number {text}",
            LogicProofParser.STRING => $"the text {text}",
            LogicProofParser.TIME_LITERAL => $"the duration {text}",
            LogicProofParser.UNEXPECTED_CHAR => $"the character '{text}'",
            _ when IsKeyword(token.Type) => $"the keyword '{text}'",
            _ => $"'{text}'",
        };
    }

    /// <summary>"';' or an operator", "an expression", "a section (inputs, ...)".</summary>
    public static string DescribeExpected(IntervalSet expected)
    {
        var remaining = new SortedSet<int>(expected.ToList());
        if (remaining.Count == 1 && remaining.Contains(LogicProofParser.SCHEME))
        {
            return "the scheme header ('scheme NAME;', then 'frequency' and 'scan')";
        }

        var parts = new List<string>();
        if (remaining.Contains(TokenConstants.EOF))
        {
            remaining.Remove(TokenConstants.EOF);
            parts.Add("the end of the file");
        }

        TakeGroup(remaining, SectionStart, "a section (inputs, settings, locals, outputs, logic, roles, breaker_model, require or assume)", parts);
        TakeGroup(remaining, TypeNames, "a type (bool, real or time)", parts);
        var hadExpression = TakeGroup(remaining, ExpressionStart, "an expression", parts);
        if (!TakeGroup(remaining, BinaryOperators, "an operator", parts) && hadExpression)
        {
            // MINUS belonged to the expression group; the remaining binary operators still form "an operator".
            TakeGroup(remaining, BinaryOperators.Where(t => t != LogicProofParser.MINUS).ToArray(), "an operator", parts);
        }

        TakeGroup(remaining, LiteralStart, "a value (TRUE, FALSE, a number or a duration)", parts);
        parts.AddRange(remaining.Select(DescribeTokenType));
        return parts.Count switch
        {
            0 => "something else",
            1 => parts[0],
            _ => string.Join(", ", parts.Take(parts.Count - 1)) + " or " + parts[^1],
        };
    }

    private static string DescribeTokenType(int type) => type switch
    {
        TokenConstants.EOF => "the end of the file",
        LogicProofParser.IDENT => "a name",
        LogicProofParser.NUMBER => "a number",
        LogicProofParser.STRING => "a description in double quotes",
        LogicProofParser.TIME_LITERAL => "a duration such as T#500ms",
        _ => LogicProofParser.DefaultVocabulary.GetLiteralName(type) ?? LogicProofParser.DefaultVocabulary.GetDisplayName(type),
    };

    private static bool TakeGroup(SortedSet<int> remaining, int[] group, string description, List<string> parts)
    {
        if (!group.All(remaining.Contains))
        {
            return false;
        }

        remaining.ExceptWith(group);
        parts.Add(description);
        return true;
    }

    private static bool IsKeyword(int type) => type is >= LogicProofParser.SCHEME and <= LogicProofParser.SINCE;

    private static string Shorten(string text) =>
        text.Length <= MaxShownTextLength ? text : string.Concat(text.AsSpan(0, MaxShownTextLength), "...");
}
