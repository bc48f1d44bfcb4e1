namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// A fault seeded into a rule-test scheme by text edits (applied in order), the rule it must break, and what the
/// counterexample must show: how named signals' waveforms end, and named signals' values at the failing scan.
/// </summary>
internal sealed record SeededFault(
    string Rule,
    string Scheme,
    IReadOnlyList<(string From, string To)> Edits,
    IReadOnlyList<(string Signal, string Ending)> WaveEndings,
    IReadOnlyList<(string Signal, bool Value)> AtFailure)
{
    public string FaultyScheme() => Edits.Aggregate(Scheme, (text, edit) => RuleProofHarness.Replace(text, edit.From, edit.To));
}
