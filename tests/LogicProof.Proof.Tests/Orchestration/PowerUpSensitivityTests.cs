using LogicProof.Model.Scan;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Orchestration;

public sealed class PowerUpSensitivityTests
{
    // An invented close seal-in (Quillmere 115 kV substation, breaker QM-7) and a lockout latch, neither with a
    // declared power-up value, so both start unknown.
    private const string Scheme = """
        scheme QM7_POWER_UP;
        frequency 60 Hz;
        scan 2 ms;
        inputs CMD : bool; STOP : bool; SET : bool; RESET : bool; end
        locals SEAL : bool; end
        outputs OUT : bool; LK : bool; end
        logic
          SEAL := (CMD OR SEAL) AND NOT STOP;
          OUT := SEAL;
          LK := SR(S1 := SET, R := RESET);
        end
        require OUT_NEEDS_A_COMMAND: OUT -> ONCE(CMD);
        require NEVER_ON: NOT OUT;
        require STOP_DROPS_OUT: STOP -> NOT OUT;
        require LOCKOUT_NEEDS_A_SET: LK -> ONCE(SET);
        """;

    private static readonly CheckOptions Options = new() { TimeLimitPerProperty = TimeSpan.FromSeconds(30), MaxParallelProperties = 1 };

    [Fact]
    public async Task Analyze_WhenOnlyOnePowerUpValueBreaksTheProperty_NamesTheLatchAndTheValue()
    {
        var report = await AnalyzeAsync("OUT_NEEDS_A_COMMAND");

        var latch = Assert.Single(report!.Latches);
        Assert.Equal("SEAL", latch.Latch);
        Assert.Equal(PowerUpSensitivityOutcome.Violated, latch.WhenTrue);
        Assert.Equal(PowerUpSensitivityOutcome.Proved, latch.WhenFalse);
        Assert.True(latch.BreakingValue);
        Assert.True(report.DependsOnPowerUp);
        Assert.Equal("SEAL: power-up TRUE breaks it; power-up FALSE proves it", latch.Summary);
    }

    [Fact]
    public async Task Analyze_WhenTheLatchIsAnSrBlock_NamesItsVariable()
    {
        var report = await AnalyzeAsync("LOCKOUT_NEEDS_A_SET");

        var latch = Assert.Single(report!.Latches);
        Assert.Equal("LK", latch.Latch);
        Assert.NotEmpty(latch.Memories);
        Assert.True(latch.BreakingValue);
    }

    [Fact]
    public async Task Analyze_WhenEitherPowerUpValueBreaksTheProperty_SaysSo()
    {
        var report = await AnalyzeAsync("NEVER_ON");

        var latch = Assert.Single(report!.Latches);
        Assert.Equal(PowerUpSensitivityOutcome.Violated, latch.WhenTrue);
        Assert.Equal(PowerUpSensitivityOutcome.Violated, latch.WhenFalse);
        Assert.Null(latch.BreakingValue);
        Assert.False(report.DependsOnPowerUp);
        Assert.Equal("SEAL: it fails with either power-up value", latch.Summary);
    }

    [Fact]
    public async Task Analyze_WhenThePropertyIsProved_GivesNothing()
    {
        var (model, result) = await CheckAsync("STOP_DROPS_OUT");

        var report = await PowerUpSensitivity.AnalyzeAsync(model, result, new PortfolioChecker(), Options);

        Assert.IsType<Proved>(result.Verdict);
        Assert.Null(report);
    }

    [Fact]
    public async Task Analyze_WhenTheLatchHasADeclaredPowerUp_GivesNothing()
    {
        var (model, result) = await CheckAsync("NEVER_ON", Scheme.Replace("SEAL : bool;", "SEAL : bool init FALSE;", StringComparison.Ordinal));

        var report = await PowerUpSensitivity.AnalyzeAsync(model, result, new PortfolioChecker(), Options);

        Assert.Empty(Assert.IsType<Violated>(result.Verdict).Trace.PowerUp);
        Assert.Null(report);
    }

    [Fact]
    public void WithPowerUp_WhenSlotsAreFixed_ChangesOnlyThoseSlots()
    {
        var model = SchemeLoader.Load(Scheme);
        var unknown = model.StateSlots.Where(s => s.PowerUp is UnknownPowerUp).Select(s => s.Index).ToList();

        var fixedModel = PowerUpSensitivity.WithPowerUp(model, [unknown[0]], true);

        Assert.Equal(new KnownBoolPowerUp(true), fixedModel.StateSlots[unknown[0]].PowerUp);
        Assert.All(unknown.Skip(1), slot => Assert.IsType<UnknownPowerUp>(fixedModel.StateSlots[slot].PowerUp));
        Assert.IsType<UnknownPowerUp>(model.StateSlots[unknown[0]].PowerUp);
    }

    private static async Task<PowerUpSensitivityReport?> AnalyzeAsync(string property)
    {
        var (model, result) = await CheckAsync(property);
        Assert.IsType<Violated>(result.Verdict);
        return await PowerUpSensitivity.AnalyzeAsync(model, result, new PortfolioChecker(), Options);
    }

    private static async Task<(ScanModel Model, PropertyResult Result)> CheckAsync(string property, string text = Scheme)
    {
        var model = SchemeLoader.Load(text);
        var result = await new PortfolioChecker().CheckPropertyAsync(model, SchemeLoader.Property(model, property), Options);
        return (model, result);
    }
}
