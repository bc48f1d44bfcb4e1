using LogicProof.Proof.Results;
using static LogicProof.Proof.Tests.Rules.RequirementProofHarness;
using static LogicProof.Proof.Tests.Rules.RuleProofHarness;

namespace LogicProof.Proof.Tests.Rules;

/// <summary>
/// A non-volatile 86 lockout (<c>init retained</c>, IEC 61131-3 RETAIN: kept across a restart) may be operated when
/// the relay starts, while every volatile memory starts afresh. A close block kept in a volatile copy of the lockout
/// is then lost at a restart. Invented scheme: Quillmere 115 kV substation, bay 4 (fictional).
/// </summary>
public sealed class RetainedLockoutProofTests
{
    private static string Scheme(string lockoutInit, string closeBlock) => $"""
        // Quillmere 115 kV substation, bay 4, breaker QM-4 (fictional)
        scheme QM4_LOCKOUT;
        frequency 60 Hz;
        scan 2 ms;
        inputs CS_CLOSE : bool; TRIP_86 : bool; RESET_86 : bool; BRK_52A : bool; BRK_52B : bool; end
        locals CLOSE_BLOCK : bool init FALSE; end
        outputs CLOSE_OUT : bool; TRIP_OUT : bool; LOCKOUT_86 : bool {lockoutInit}; end
        logic
          LOCKOUT_86 := SR(S1 := TRIP_86, R := RESET_86);
          CLOSE_BLOCK := SR(S1 := TRIP_86, R := RESET_86);
          TRIP_OUT := TRIP_86;
          CLOSE_OUT := CS_CLOSE AND BRK_52B AND NOT BRK_52A AND NOT TRIP_OUT AND NOT {closeBlock};
        end
        require NO_CLOSE_IN_LOCKOUT: NOT (CLOSE_OUT AND LOCKOUT_86);
        roles close_output = CLOSE_OUT; close_command = CS_CLOSE; lockout = LOCKOUT_86; lockout_reset_local = RESET_86; breaker_closed = BRK_52A; breaker_open = BRK_52B; trip_output = TRIP_OUT; end
        """;

    [Fact]
    public async Task CloseBlock_WhenKeptInAVolatileCopy_IsProvedForAVolatileLockoutButLostAfterARestart()
    {
        // Both latches start FALSE and follow the same set and reset: the copy is exact.
        Assert.IsType<Proved>(await RequirementAsync(Scheme("init FALSE", "CLOSE_BLOCK"), "NO_CLOSE_IN_LOCKOUT"));

        var trace = Assert.IsType<Violated>(await RequirementAsync(Scheme("init retained", "CLOSE_BLOCK"), "NO_CLOSE_IN_LOCKOUT")).Trace;

        // The lockout was operated before the restart and still is (no trip since), the volatile block came up released.
        Assert.Contains(trace.PowerUp, value => value.Name.StartsWith("LOCKOUT_86@", StringComparison.Ordinal) && value.Value is BoolTraceValue { Value: true });
        Assert.True(AtFailure(trace, "LOCKOUT_86"));
        Assert.True(AtFailure(trace, "CLOSE_OUT"));
        Assert.False(AtFailure(trace, "CLOSE_BLOCK"));
        Assert.DoesNotContain('1', Wave(trace, "TRIP_86"));
    }

    [Fact]
    public async Task CloseBlock_WhenItReadsTheRetainedLockout_IsProvedFromEitherPowerUpValue()
    {
        var verdict = await RequirementAsync(Scheme("init retained", "LOCKOUT_86"), "NO_CLOSE_IN_LOCKOUT");

        Assert.IsType<Proved>(verdict);
    }
}
