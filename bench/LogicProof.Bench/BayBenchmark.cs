using System.Diagnostics;
using System.Globalization;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Solving;

namespace LogicProof.Bench;

/// <summary>
/// Decides every requirement of N generated breaker bays with the same portfolio <c>check</c> uses (BMC, k-induction
/// and PDR with invariant lemmas, each property on its cone) and prints the time, the peak memory and which engine
/// won how often.
/// </summary>
public static class BayBenchmark
{
    public static int Run(IReadOnlyList<int> bayCounts, TextWriter output)
    {
        Z3Runtime.EnsureLoaded();
        output.WriteLine("bays  equations  properties  proved  violated  inconclusive  seconds  peak MB  wins by engine");
        foreach (var bays in bayCounts)
        {
            var front = FrontEnd.LoadText($"bays-{bays}.lpl", BaySchemeGenerator.Generate(bays));
            if (front.Scheme is null)
            {
                output.WriteLine($"generated scheme of {bays} bays has errors: {front.Diagnostics.First().Message}");
                return 1;
            }

            var model = ModelBuilder.Build(front.Scheme).Model!;
            var checker = new PortfolioChecker([new BmcEngine(), new KInductionEngine(), new PdrEngine()]);
            var options = new CheckOptions
            {
                TimeLimitPerProperty = TimeSpan.FromSeconds(60),
                LemmaSource = sliced => new InvariantGenerator().Generate(sliced),
            };
            var clock = Stopwatch.StartNew();
            var results = checker.CheckAsync(model, options).GetAwaiter().GetResult();
            clock.Stop();
            using var process = Process.GetCurrentProcess();
            var wins = results
                .GroupBy(r => r.Verdict switch { Proved p => p.Engine, Violated v => v.Engine, _ => "none" })
                .OrderBy(g => g.Key, StringComparer.Ordinal)
                .Select(g => $"{g.Key} {g.Count()}");
            output.WriteLine(string.Create(
                CultureInfo.InvariantCulture,
                $"{bays,4}  {front.Scheme.Equations.Count,9}  {results.Count,10}  {results.Count(r => r.Verdict is Proved),6}  {results.Count(r => r.Verdict is Violated),8}  {results.Count(r => r.Verdict is Inconclusive),12}  {clock.Elapsed.TotalSeconds,7:0.0}  {process.PeakWorkingSet64 / (1024 * 1024),7}  {string.Join(", ", wins)}"));
        }

        return 0;
    }
}
