using LogicProof.Proof.Tests.Oracle.Reference;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// The oracle itself must be right, or the agreement test proves nothing: small cases worked by hand, explored with
/// the reference interpreter (the verdicts) and with the product's simulator (the lemma checks' states).
/// </summary>
public sealed class BreadthFirstExplorerTests
{
    [Theory]
    [InlineData(1, 2)]
    [InlineData(3, 4)]
    public void Explore_WhenAnOnDelayClosesAfterItsPreset_ReportsPresetPlusOneScans(int presetScans, long expectedScans)
    {
        // TON: Q rises at the (n+1)-th consecutive scan with IN TRUE (IEC 61131-3 ed.3 §6.6.3.5.4, TON timing).
        var source = Delay($"T#{presetScans}ms", assume: string.Empty);

        var reference = Reference(source, 1_000);
        var simulator = BreadthFirstExplorer.Explore(new SimulatorStepper(SchemeLoader.Load(source)), 1_000);

        Assert.True(reference.Complete);
        Assert.Equal(expectedScans, reference.ShortestViolation[0]);
        Assert.Equal(expectedScans, simulator.ShortestViolation[0]);
    }

    [Fact]
    public void Explore_WhenAnAssumptionForbidsTheCommand_FindsNoViolation()
    {
        var exploration = Reference(Delay("T#2ms", assume: "assume NO_COMMAND: NOT CMD;"), 1_000);

        Assert.Null(exploration.ShortestViolation[0]);
        Assert.Single(exploration.ReachableStates);
    }

    [Fact]
    public void Explore_WhenTheAssumptionFailsOnlyAtTheViolatingScan_DoesNotCountIt()
    {
        // The only violating scans have CMD TRUE, which the assumption forbids in that very scan: a scan with a FALSE
        // assumption is a dead end, and its property value does not count.
        var exploration = Reference("""
            // Quillmere test bay, direct close (invented)
            scheme ORACLE_DIRECT;
            frequency 50 Hz;
            scan 1 ms;
            inputs
              CMD : bool;
            end
            locals
              CLOSE : bool;
            end
            logic
              CLOSE := CMD;
            end
            require NEVER_CLOSES: NOT CLOSE;
            assume NO_COMMAND: NOT CMD;
            """, 1_000);

        Assert.Null(exploration.ShortestViolation[0]);
    }

    [Theory]
    [InlineData("", 1L)]
    [InlineData(" init FALSE", null)]
    public void Explore_WhenASealInHasNoDeclaredPowerUp_TriesBothValues(string init, long? expected)
    {
        var exploration = Reference($$"""
            // Quillmere test bay, seal-in (invented)
            scheme ORACLE_SEAL;
            frequency 50 Hz;
            scan 1 ms;
            inputs
              CMD : bool;
            end
            locals
              SEAL : bool{{init}};
            end
            logic
              SEAL := CMD OR SEAL;
            end
            require NEEDS_COMMAND: SEAL -> ONCE(CMD);
            """, 1_000);

        Assert.Equal(expected, exploration.ShortestViolation[0]);
    }

    [Fact]
    public void Explore_WhenTheStateLimitIsReached_SaysTheSearchIsIncomplete()
    {
        var exploration = Reference(Delay("T#4ms", assume: string.Empty), 2);

        Assert.False(exploration.Complete);
    }

    private static Exploration<ReferenceState> Reference(string source, int maxStates) =>
        BreadthFirstExplorer.Explore(new ReferenceStepper(new ReferenceInterpreter(ReferenceProgram.FromSource(source))), maxStates);

    private static string Delay(string preset, string assume) => $$"""
        // Quillmere test bay, close delay (invented)
        scheme ORACLE_DELAY;
        frequency 50 Hz;
        scan 1 ms;
        inputs
          CMD : bool;
        end
        locals
          CLOSE : bool;
        end
        logic
          CLOSE := TON(CMD, {{preset}});
        end
        require NEVER_CLOSES: NOT CLOSE;
        {{assume}}
        """;
}
