using System.Globalization;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>Counts over one oracle run, safe to update from CsCheck's threads.</summary>
internal sealed class OracleTally
{
    private long _schemes;
    private long _incompleteExplorations;
    private long _properties;
    private long _violated;
    private long _proved;
    private long _inconclusive;
    private long _pdrProved;
    private long _pdrViolated;
    private long _pdrInconclusive;
    private long _lemmas;
    private long _realSchemes;
    private long _breakerSchemes;
    private long _ruleProperties;

    public long Schemes => Interlocked.Read(ref _schemes);

    public long IncompleteExplorations => Interlocked.Read(ref _incompleteExplorations);

    public long Properties => Interlocked.Read(ref _properties);

    public long Inconclusive => Interlocked.Read(ref _inconclusive);

    public long PdrInconclusive => Interlocked.Read(ref _pdrInconclusive);

    public void Scheme(bool hasRealInputs, bool hasBreakerModel)
    {
        Interlocked.Increment(ref _schemes);
        Interlocked.Add(ref _realSchemes, hasRealInputs ? 1 : 0);
        Interlocked.Add(ref _breakerSchemes, hasBreakerModel ? 1 : 0);
    }

    public void IncompleteExploration() => Interlocked.Increment(ref _incompleteExplorations);

    public void Lemmas(int count) => Interlocked.Add(ref _lemmas, count);

    public void Portfolio(string outcome) => Interlocked.Increment(ref Counter(outcome, ref _proved, ref _violated, ref _inconclusive));

    public void Pdr(string outcome) => Interlocked.Increment(ref Counter(outcome, ref _pdrProved, ref _pdrViolated, ref _pdrInconclusive));

    public void Property(bool isRule)
    {
        Interlocked.Increment(ref _properties);
        Interlocked.Add(ref _ruleProperties, isRule ? 1 : 0);
    }

    public override string ToString() => string.Create(
        CultureInfo.InvariantCulture,
        $"{Schemes} schemes ({_realSchemes} with real inputs, {_breakerSchemes} with the breaker model, {IncompleteExplorations} too large to explore), {Properties} properties ({_ruleProperties} built-in rules); portfolio: {_proved} proved, {_violated} violated, {_inconclusive} inconclusive; pdr alone: {_pdrProved} proved, {_pdrViolated} violated, {_pdrInconclusive} inconclusive; {_lemmas} lemmas generated, all true in every reachable state");

    private static ref long Counter(string outcome, ref long proved, ref long violated, ref long inconclusive)
    {
        if (outcome == "proved")
        {
            return ref proved;
        }

        if (outcome == "violated")
        {
            return ref violated;
        }

        return ref inconclusive;
    }
}
