namespace LogicProof.Reports.Check;

/// <summary>One SARIF reporting descriptor: what a rule id means, for tools that list rules.</summary>
internal sealed record SarifDescriptor(string Id, string Name, string ShortDescription, string FullDescription, string Help, string Category);
