using LogicProof.Proof.Results;
using static LogicProof.Proof.Tests.Rules.RuleProofHarness;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// An anti-pumping scheme whose 94 seal is set by the breaker closing (52a) while the close command is held
/// (invented: Quillmere 115 kV substation, bay 6, breaker QM-6). It is right only for a breaker that behaves like
/// one: a close output always ends in a close within the closing time, which is shorter than the close-fail time.
/// </summary>
public sealed class BreakerModelProofTests
{
    private static string Scheme(string breakerModel) => $"""
        // Quillmere 115 kV substation, bay 6, breaker QM-6 (fictional)
        scheme QM6_PUMP;
        frequency 60 Hz;
        scan 2 ms;
        inputs CS_CLOSE : bool; PROT_TRIP : bool; BRK_52A : bool; BRK_52B : bool; end
        locals CLOSE_START : bool; CLOSE_SEAL : bool init FALSE; CLOSE_FAIL : bool init FALSE; ANTI_PUMP : bool init TRUE; end
        outputs CLOSE_OUT : bool; TRIP_OUT : bool; end
        logic
          TRIP_OUT := PROT_TRIP;
          CLOSE_START := CS_CLOSE AND BRK_52B AND NOT BRK_52A AND NOT TRIP_OUT AND NOT ANTI_PUMP;
          CLOSE_SEAL := (CLOSE_START OR CLOSE_SEAL) AND NOT BRK_52A AND NOT TRIP_OUT AND NOT CLOSE_FAIL;
          CLOSE_FAIL := TON(CLOSE_SEAL, T#12ms);
          CLOSE_OUT := CLOSE_SEAL AND NOT CLOSE_FAIL;
          ANTI_PUMP := (ANTI_PUMP OR BRK_52A) AND CS_CLOSE;
        end
        {breakerModel}
        roles close_output = CLOSE_OUT; close_command = CS_CLOSE; breaker_closed = BRK_52A; breaker_open = BRK_52B; trip_output = TRIP_OUT; end
        """;

    private static string Modelled(string tripFree) =>
        Scheme($"breaker_model closing_time = T#4ms .. T#8ms; opening_time = T#2ms .. T#4ms; trip_free = {tripFree}; end");

    [Fact]
    public async Task NoPumping_WhenTheBreakerIsModelled_IsProved()
    {
        var (_, setup) = Load(Modelled("FALSE"), "no-pumping");

        var verdict = await CheckAsync(Modelled("FALSE"), "no-pumping");

        Assert.True(setup.BreakerModelled);
        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public async Task NoPumping_WhenTheStatusInputsAreFree_FailsOnABreakerThatNeverCloses()
    {
        var (_, setup) = Load(Scheme(string.Empty), "no-pumping");

        var trace = await ViolationAsync(Scheme(string.Empty), "no-pumping");

        Assert.False(setup.BreakerModelled);
        var close = Wave(trace, "CLOSE_OUT");
        Assert.EndsWith("01", close, StringComparison.Ordinal);
        Assert.DoesNotContain('0', Wave(trace, "CS_CLOSE")[close.IndexOf('1', StringComparison.Ordinal)..]);
        Assert.DoesNotContain('1', Wave(trace, "BRK_52A"));
    }

    [Fact]
    public async Task NoPumping_WhenTheModelledBreakerIsTripFree_FailsWhenATripAbortsTheClose()
    {
        var trace = await ViolationAsync(Modelled("TRUE"), "no-pumping");

        // The trip arrives during the closing travel (52a and 52b both FALSE), the close is aborted, the breaker
        // opens again without ever reporting closed, and the standing command closes it a second time.
        var open = Wave(trace, "BRK_52B");
        var closed = Wave(trace, "BRK_52A");
        var trip = Wave(trace, "TRIP_OUT");
        var close = Wave(trace, "CLOSE_OUT");
        Assert.DoesNotContain('1', closed);
        Assert.Contains(Enumerable.Range(0, trip.Length), scan => trip[scan] == '1' && open[scan] == '0' && closed[scan] == '0');
        Assert.EndsWith("01", close, StringComparison.Ordinal);
        Assert.Equal('1', open[^1]);
        Assert.DoesNotContain('0', Wave(trace, "CS_CLOSE")[close.IndexOf('1', StringComparison.Ordinal)..]);
    }
}
