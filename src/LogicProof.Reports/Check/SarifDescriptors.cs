using LogicProof.Model.Scan;

namespace LogicProof.Reports.Check;

/// <summary>
/// The reporting descriptors (SARIF "rules") of a report, each id once, in a fixed order: properties and rules
/// that did not apply in file order, then diagnostic codes in ordinal order.
/// </summary>
internal sealed class SarifDescriptors
{
    private readonly Dictionary<string, int> _indexById = new(StringComparer.Ordinal);
    private readonly List<SarifDescriptor> _all = [];

    public IReadOnlyList<SarifDescriptor> All => _all;

    public static SarifDescriptors Collect(CheckReport report)
    {
        var descriptors = new SarifDescriptors();
        foreach (var file in report.Files)
        {
            foreach (var property in file.Properties)
            {
                var what = property.Origin == PropertyOrigin.Rule
                    ? $"Built-in close-supervision rule {property.Name}"
                    : $"Requirement {property.Name} of scheme {file.SchemeName}";
                descriptors.Add(new SarifDescriptor(
                    PropertyId(file, property),
                    property.Name,
                    what + ".",
                    property.Statement ?? what + ": it must hold at every scan of every input sequence.",
                    "A violation comes with the shortest timed input sequence that breaks it; replay it with the simulator. "
                        + "Inconclusive means neither proved nor violated within the limits.",
                    ReportSentences.Origin(property.Origin)));
            }

            foreach (var rule in file.NotApplicableRules)
            {
                descriptors.Add(new SarifDescriptor(
                    rule.RuleId,
                    rule.RuleId,
                    $"Built-in close-supervision rule {rule.RuleId}.",
                    rule.Statement ?? $"Built-in close-supervision rule {rule.RuleId}.",
                    "A rule applies once the scheme binds every role it names; until then it is reported as not applicable, never as passed.",
                    "rule"));
            }
        }

        var codes = report.Files.SelectMany(file => file.Diagnostics)
            .GroupBy(diagnostic => diagnostic.Code, StringComparer.Ordinal)
            .OrderBy(group => group.Key, StringComparer.Ordinal);
        foreach (var code in codes)
        {
            var first = code.First();
            descriptors.Add(new SarifDescriptor(
                code.Key,
                code.Key,
                $"LogicProof {ReportSentences.SeverityName(first.Severity)} {code.Key}.",
                $"LogicProof diagnostic {code.Key}, for example: {first.Message}",
                "Each result's message says what was found and where; diagnostic codes are stable across releases.",
                "diagnostic"));
        }

        return descriptors;
    }

    public static string PropertyId(FileCheckReport file, PropertyReport property) =>
        property.Origin == PropertyOrigin.Rule ? property.Name : $"{file.SchemeName}.{property.Name}";

    public int IndexOf(string id) => _indexById[id];

    private void Add(SarifDescriptor descriptor)
    {
        if (_indexById.TryAdd(descriptor.Id, _all.Count))
        {
            _all.Add(descriptor);
        }
    }
}
