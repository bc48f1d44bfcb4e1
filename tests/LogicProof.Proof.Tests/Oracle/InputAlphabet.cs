using Fractions;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// The finite input alphabet of an exploration: bool inputs take FALSE and TRUE (0 and 1 here), each real input the
/// values of its domain. The exploration is exhaustive only when the scheme's assumptions allow no other real values
/// (the generated schemes restrict each real input with an assumption to exactly its domain).
/// </summary>
internal static class InputAlphabet
{
    public static Fraction[] Domain(string name, bool isBool, IReadOnlyDictionary<string, Fraction[]>? realDomains) =>
        isBool
            ? [Fraction.Zero, Fraction.One]
            : realDomains?.GetValueOrDefault(name)
              ?? throw new ArgumentException($"the real input '{name}' has no finite domain", nameof(realDomains));

    /// <summary>Every combination of one value per input, the first input varying fastest.</summary>
    public static IEnumerable<Fraction[]> Vectors(IReadOnlyList<Fraction[]> domains)
    {
        var count = domains.Aggregate(1L, (product, domain) => product * domain.Length);
        for (var vector = 0L; vector < count; vector++)
        {
            var values = new Fraction[domains.Count];
            var rest = vector;
            for (var i = 0; i < domains.Count; i++)
            {
                values[i] = domains[i][rest % domains[i].Length];
                rest /= domains[i].Length;
            }

            yield return values;
        }
    }
}
