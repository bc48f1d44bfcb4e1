using System.Diagnostics;
using System.Globalization;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;
using Xunit.Abstractions;

namespace LogicProof.Proof.Tests.Engines;

public sealed class DeepTimerTests
{
    private readonly ITestOutputHelper _output;

    public DeepTimerTests(ITestOutputHelper output)
    {
        _output = output;
    }

    [Fact]
    public async Task Bmc_WhenViolationNeedsATenSecondTimer_FindsItAtScan5000InAFewSteps()
    {
        var model = SchemeLoader.Load(Schemes.DeepTimer);
        var clock = Stopwatch.StartNew();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;

        var verdict = await Verdicts.RunAsync(new BmcEngine(), model, "NO_GAS_LOCK", new EngineOptions { MaxDepth = 10 });

        clock.Stop();
        cpu = Process.GetCurrentProcess().TotalProcessorTime - cpu;
        var trace = Assert.IsType<Violated>(verdict).Trace;
        _output.WriteLine(string.Create(
            CultureInfo.InvariantCulture,
            $"deep violation: {trace.Steps.Count} steps, failing scan {trace.FailingScan}, {clock.Elapsed.TotalSeconds:0.000} s wall, {cpu.TotalSeconds:0.000} s CPU"));

        // IEC 61131-3 TON: 10 s at 2 ms per scan is 5,000 scans; Q is TRUE first at scan index 5,000.
        Assert.Equal(5000, trace.FailingScan);
        Assert.True(trace.Steps.Count <= 3, $"{trace.Steps.Count} steps were unrolled");
        Assert.Equal(new Fractions.Fraction(10000), trace.Steps[trace.FailingStep].StartMilliseconds);
        TraceReplayer.Replay(model, SchemeLoader.Property(model, "NO_GAS_LOCK"), trace, "bmc");
    }

    [Fact]
    public async Task KInduction_WhenPropertyHoldsWithATenSecondTimer_ProvesItWithoutUnrolling5000Steps()
    {
        var model = SchemeLoader.Load(Schemes.DeepTimer);
        var clock = Stopwatch.StartNew();

        var verdict = await Verdicts.RunAsync(new KInductionEngine(), model, "LOCK_NEEDS_GAS", new EngineOptions { MaxDepth = 10 });

        clock.Stop();
        var proved = Assert.IsType<Proved>(verdict);
        _output.WriteLine(string.Create(
            CultureInfo.InvariantCulture, $"deep proof: depth {proved.Depth}, {clock.Elapsed.TotalSeconds:0.000} s"));
        Assert.True(proved.Depth <= 2, $"depth {proved.Depth}");
    }

    [Fact]
    public async Task Bmc_WhenAccelerationIsOff_DoesNotReachTheTenSecondViolationInFewSteps()
    {
        var model = SchemeLoader.Load(Schemes.DeepTimer);

        var verdict = await Verdicts.RunAsync(
            new BmcEngine(), model, "NO_GAS_LOCK", new EngineOptions { MaxDepth = 10, Accelerate = false });

        Assert.Equal(10, Assert.IsType<Inconclusive>(verdict).DepthReached);
    }
}
