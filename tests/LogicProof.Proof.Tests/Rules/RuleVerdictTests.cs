using LogicProof.Model.Rules;
using LogicProof.Proof.Results;
using static LogicProof.Proof.Tests.Rules.RuleProofHarness;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// Every built-in rule proved on a correct scheme, and broken by a seeded fault with the counterexample checked
/// (the faults issue 4 names, and one more for each other rule). Counterexamples have been replayed in the simulator
/// by the portfolio before they reach these checks.
/// </summary>
public sealed class RuleVerdictTests
{
    public static TheoryData<string> RuleIds => [.. RuleCatalog.All.Select(r => r.Id)];

    public static TheoryData<string> SeededFaultNames => [.. SeededFaults.ByName.Keys];

    [Theory]
    [MemberData(nameof(RuleIds))]
    public async Task Rule_WhenTheSchemeIsCorrect_IsProved(string id)
    {
        Assert.IsType<Proved>(await CheckAsync(RuleProofSchemes.Correct, id));
    }

    [Theory]
    [InlineData("trip-not-blocked")]
    [InlineData("lockout-trips")]
    [InlineData("low-gas-philosophy")]
    public async Task TripRule_WhenLowGasBlocksTheTripAsDeclared_IsProved(string id)
    {
        Assert.IsType<Proved>(await CheckAsync(RuleProofSchemes.BlockTrip, id));
    }

    [Theory]
    [MemberData(nameof(SeededFaultNames))]
    public async Task Rule_WhenAFaultIsSeeded_FailsWithATraceThatShowsTheFault(string fault)
    {
        var seeded = SeededFaults.ByName[fault];

        var trace = await ViolationAsync(seeded.FaultyScheme(), seeded.Rule);

        foreach (var (signal, ending) in seeded.WaveEndings)
        {
            Assert.EndsWith(ending, Wave(trace, signal), StringComparison.Ordinal);
        }

        foreach (var (signal, value) in seeded.AtFailure)
        {
            Assert.True(AtFailure(trace, signal) == value, $"{signal} should be {value} at the failing scan");
        }
    }

    [Fact]
    public async Task LockoutResetOnly_WhenTheRemoteResetAlsoClearsTheLockout_FailsUnderLocalOnlyAndHoldsUnderLocalOrRemote()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "R := RESET_LOCAL)", "R := RESET_LOCAL OR RESET_REMOTE)");

        var trace = await ViolationAsync(faulty, "lockout-reset-only");
        var allowed = await CheckAsync(Replace(faulty, "lockout_reset_policy = local_only;", "lockout_reset_policy = local_or_remote;"), "lockout-reset-only");

        Assert.EndsWith("10", Wave(trace, "LOCKOUT"), StringComparison.Ordinal);
        Assert.True(AtFailure(trace, "RESET_REMOTE"));
        Assert.False(AtFailure(trace, "RESET_LOCAL"));
        Assert.IsType<Proved>(allowed);
    }

    [Fact]
    public async Task NoPumping_WhenTheAntiPumpResetsOnTheWrongSignal_FailsWithASecondCloseOnAStandingCommand()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "ANTI_PUMP := (ANTI_PUMP OR CLOSE_OUT) AND CLOSE_CMD;", "ANTI_PUMP := (ANTI_PUMP OR CLOSE_OUT) AND NOT BRK_52B;");

        var trace = await ViolationAsync(faulty, "no-pumping");

        var close = Wave(trace, "CLOSE_OUT");
        var command = Wave(trace, "CLOSE_CMD");
        var firstClose = close.IndexOf('1', StringComparison.Ordinal);
        Assert.EndsWith("01", close, StringComparison.Ordinal);
        Assert.True(firstClose < close.Length - 1, close);
        Assert.DoesNotContain('0', command[firstClose..]);
    }

    [Fact]
    public async Task TripNotBlocked_WhenTheTripIsSupervisedByAClosePermissive_FailsWithATripCommandThatDoesNotTrip()
    {
        var faulty = Replace(RuleProofSchemes.Correct, "TRIP_OUT := TRIP_REQ;", "TRIP_OUT := TRIP_REQ AND SPRING_OK;");

        var trace = await ViolationAsync(faulty, "trip-not-blocked");

        Assert.True(AtFailure(trace, "PROT_TRIP") || AtFailure(trace, "PROT_TRIP_86") || AtFailure(trace, "CS_TRIP"));
        Assert.True(AtFailure(trace, "BRK_52A"));
        Assert.False(AtFailure(trace, "SPRING_OK"));
        Assert.False(AtFailure(trace, "TRIP_OUT"));
    }
}
