using System.Diagnostics;
using CsCheck;
using Xunit.Abstractions;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// Random small schemes, checked by the engines and by the reference interpreter's exhaustive exploration; they must
/// agree (see <see cref="OracleCheck"/>). Failing schemes are shrunk by CsCheck and printed as .lpl source (replay one
/// with the seed CsCheck prints).
/// </summary>
public sealed class EngineAgreesWithExplorerTests(ITestOutputHelper output)
{
    /// <summary>At least 2,000 schemes per run; LOGICPROOF_ORACLE_SCHEMES raises it for a longer soak (never lowers it).</summary>
    private static readonly int Iterations = AtLeast(2000, "LOGICPROOF_ORACLE_SCHEMES");

    /// <summary>Bays carry about ten rules each: fewer per run; LOGICPROOF_ORACLE_BAYS raises it.</summary>
    private static readonly int BayIterations = AtLeast(60, "LOGICPROOF_ORACLE_BAYS");

    private const int Threads = 2;

    /// <summary>1-3 bool inputs, 2-6 equations, two requirements one time in four (else one), an assumption one time in four, real inputs one time in two.</summary>
    private static readonly Gen<SchemeRecipe> Recipes =
        Gen.Select(Gen.Int[1, 3], Gen.Int[2, 6], Gen.Int[0, 3], Gen.Int[0, 3], Gen.Byte.Array[24, 160], Gen.Int[0, 3])
            .Select((inputs, locals, second, assume, choices, reals) =>
                new SchemeRecipe(inputs, locals, second == 0 ? 2 : 1, assume == 0, choices, reals switch { 2 => 1, 3 => 2, _ => 0 }));

    /// <summary>A lockout one time in two, a synchronism permissive and low gas each one time in three, the breaker model one time in two.</summary>
    private static readonly Gen<BayRecipe> Bays =
        Gen.Select(Gen.Bool, Gen.Int[0, 2], Gen.Int[0, 2], Gen.Bool, Gen.Byte.Array[0, 40])
            .Select((lockout, sync, gas, breaker, choices) => new BayRecipe(lockout, sync == 0, gas == 0, breaker, choices));

    [Fact]
    public void Verdicts_WhenSchemesAreRandom_AgreeWithTheReferenceInterpreter()
    {
        var tally = new OracleTally();
        Run(tally, () => Recipes.Sample(recipe => OracleCheck.Check(recipe.Source, recipe.RealDomains, tally), iter: Iterations, threads: Threads, print: recipe => recipe.Source));
    }

    [Fact]
    public void Verdicts_WhenBaysHaveRolesAndABreakerModel_AgreeWithTheReferenceInterpreter()
    {
        var tally = new OracleTally();
        Run(tally, () => Bays.Sample(bay => OracleCheck.Check(bay.Source, bay.RealDomains, tally), iter: BayIterations, threads: Threads, print: bay => bay.Source));
    }

    private void Run(OracleTally tally, Action sample)
    {
        var clock = Stopwatch.StartNew();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;

        sample();

        var cpuSeconds = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds;
        output.WriteLine($"{tally} in {clock.Elapsed.TotalSeconds:0.0} s ({cpuSeconds:0.0} s of processor time)");
        Assert.True(tally.IncompleteExplorations * 100 <= tally.Schemes, $"too many schemes too large to explore: {tally}");
        Assert.True(tally.Inconclusive * 100 <= tally.Properties, $"more than 1% inconclusive: {tally}");
        Assert.True(tally.PdrInconclusive * 100 <= tally.Properties, $"PDR alone more than 1% inconclusive: {tally}");
    }

    private static int AtLeast(int floor, string variable) =>
        Math.Max(floor, int.TryParse(Environment.GetEnvironmentVariable(variable), out var n) ? n : 0);
}
