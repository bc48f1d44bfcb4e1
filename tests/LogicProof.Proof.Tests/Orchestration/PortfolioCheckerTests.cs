using System.Diagnostics;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Orchestration;

public sealed class PortfolioCheckerTests
{
    [Fact]
    public async Task CheckAsync_WhenModelHasSeveralProperties_ReturnsOneConclusiveResultEachInOrder()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);

        var results = await new PortfolioChecker().CheckAsync(model, new CheckOptions());

        Assert.Equal(model.Properties, results.Select(r => r.Property));
        Assert.Equal(10, Assert.IsType<Violated>(results[0].Verdict).Trace.FailingScan);
        Assert.IsType<Proved>(results[1].Verdict);
    }

    [Theory]
    [InlineData(EngineSelection.Bmc, typeof(Inconclusive))]
    [InlineData(EngineSelection.KInduction, typeof(Proved))]
    [InlineData(EngineSelection.Pdr, typeof(Inconclusive))]
    public async Task CheckPropertyAsync_WhenOneEngineIsSelected_UsesOnlyThatEngine(EngineSelection engine, Type expected)
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);
        var options = new CheckOptions { Engine = engine, MaxDepth = 5 };

        var result = await new PortfolioChecker().CheckPropertyAsync(model, SchemeLoader.Property(model, "CLOSES_ONLY_ON_COMMAND"), options);

        Assert.IsType(expected, result.Verdict);
    }

    [Fact]
    public async Task CheckPropertyAsync_WhenTimeLimitIsTooSmall_IsInconclusiveNeverProved()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);
        var options = new CheckOptions { TimeLimitPerProperty = TimeSpan.FromTicks(1) };

        var result = await new PortfolioChecker().CheckPropertyAsync(model, SchemeLoader.Property(model, "CLOSES_ONLY_ON_COMMAND"), options);

        var inconclusive = Assert.IsType<Inconclusive>(result.Verdict);
        Assert.Contains("time limit", inconclusive.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckPropertyAsync_WhenSearchWouldRunLong_StopsAtTheTimeLimit()
    {
        var model = SchemeLoader.Load(Schemes.EveryBlock);
        var options = new CheckOptions
        {
            Engine = EngineSelection.Bmc,
            MaxDepth = 1_000_000,
            TimeLimitPerProperty = TimeSpan.FromSeconds(1),
        };
        var clock = Stopwatch.StartNew();

        // The property holds, so BMC alone would unroll until the depth limit.
        var result = await new PortfolioChecker().CheckPropertyAsync(model, SchemeLoader.Property(model, "SEAL_NEEDS_NO_TRIP"), options);

        var inconclusive = Assert.IsType<Inconclusive>(result.Verdict);
        Assert.Contains("time limit", inconclusive.Reason, StringComparison.Ordinal);
        Assert.True(inconclusive.DepthReached > 0);
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(30), $"took {clock.Elapsed}");
    }

    [Fact]
    public async Task CheckPropertyAsync_WhenEveryEngineRunsOutOfTime_IsInconclusiveWithoutAnError()
    {
        var model = SchemeLoader.Load(Schemes.TwoTimers);
        var options = new CheckOptions { MaxDepth = 1_000_000, TimeLimitPerProperty = TimeSpan.FromSeconds(1) };
        var clock = Stopwatch.StartNew();

        var result = await new PortfolioChecker().CheckPropertyAsync(model, SchemeLoader.Property(model, "SLOW_AFTER_FAST"), options);

        Assert.Contains("time limit", Assert.IsType<Inconclusive>(result.Verdict).Reason, StringComparison.Ordinal);
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(30), $"took {clock.Elapsed}");
    }

    [Fact]
    public async Task CheckAsync_WhenCancelled_Throws()
    {
        var model = SchemeLoader.Load(Schemes.ShortDelay);
        using var cancel = new CancellationTokenSource();
        await cancel.CancelAsync();

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => new PortfolioChecker().CheckAsync(model, new CheckOptions(), cancel.Token));
    }

    [Theory]
    [InlineData(nameof(Schemes.ShortDelay))]
    [InlineData(nameof(Schemes.DeepTimer))]
    [InlineData("SealInWithoutInit")]
    [InlineData("SealInWithInit")]
    [InlineData(nameof(Schemes.EveryBlock))]
    [InlineData(nameof(Schemes.QuickOrSlow))]
    public async Task CheckAsync_WhenAccelerationIsOnOrOff_GivesTheSameVerdictsAndFailingScans(string scheme)
    {
        var model = SchemeLoader.Load(scheme switch
        {
            nameof(Schemes.ShortDelay) => Schemes.ShortDelay,
            nameof(Schemes.DeepTimer) => Schemes.DeepTimer,
            "SealInWithoutInit" => Schemes.SealIn(false),
            "SealInWithInit" => Schemes.SealIn(true),
            nameof(Schemes.QuickOrSlow) => Schemes.QuickOrSlow,
            _ => Schemes.EveryBlock,
        });
        var checker = new PortfolioChecker();

        // Depth 12 without acceleration cannot reach the 5,000-scan violation: that one must stay Inconclusive.
        var on = await checker.CheckAsync(model, new CheckOptions { MaxDepth = 12 });
        var off = await checker.CheckAsync(model, new CheckOptions { MaxDepth = 12, Accelerate = false });

        Assert.NotEmpty(on);
        Assert.Equal(on.Count, off.Count);
        for (var i = 0; i < on.Count; i++)
        {
            if (off[i].Verdict is Inconclusive)
            {
                Assert.NotEqual(typeof(Proved), on[i].Verdict.GetType());
                continue;
            }

            Assert.Equal(off[i].Verdict.GetType(), on[i].Verdict.GetType());
            if (off[i].Verdict is Violated offViolation)
            {
                Assert.Equal(offViolation.Trace.FailingScan, ((Violated)on[i].Verdict).Trace.FailingScan);
            }
        }
    }
}
