using System.Globalization;

namespace LogicProof.Model.Lowering;

/// <summary>
/// The names the model builder and the dependency graph give to what the scheme does not name, written once so the
/// graph's call sites match the model's hidden cells.
/// </summary>
internal static class HiddenNames
{
    /// <summary>The n-th instance (1-based, in evaluation order) of a function block or operator: <c>OWNER.KIND#n</c>.</summary>
    public static string Instance(string owner, string kind, int number) =>
        string.Create(CultureInfo.InvariantCulture, $"{owner}.{kind}#{number}");

    /// <summary>An assumption's own name, or <c>assume#n</c> for the n-th (1-based) when it has none.</summary>
    public static string Assumption(string? name, int index) =>
        name ?? string.Create(CultureInfo.InvariantCulture, $"assume#{index + 1}");

    /// <summary>The name itself when free, otherwise the name with the first free suffix <c>~2</c>, <c>~3</c>, ...</summary>
    public static string Unique<T>(string name, IReadOnlyDictionary<string, T> taken)
    {
        var unique = name;
        for (var suffix = 2; taken.ContainsKey(unique); suffix++)
        {
            unique = string.Create(CultureInfo.InvariantCulture, $"{name}~{suffix}");
        }

        return unique;
    }
}
