using LogicProof.Model.Scan;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Lowering;

public sealed class PowerUpTests
{
    [Fact]
    public void Build_WhenSealInReadsItselfWithoutInit_ItsMemoryIsUnknown()
    {
        var model = BuildModel(Header + """
            inputs CMD : bool; CLOSED : bool; end
            outputs SEAL : bool; end
            logic SEAL := (CMD OR SEAL) AND NOT CLOSED; end
            """);

        Assert.IsType<UnknownPowerUp>(model.PreviousSlotOf("SEAL").PowerUp);
    }

    [Fact]
    public void Build_WhenSealInDeclaresInit_ItsMemoryTakesIt()
    {
        var model = BuildModel(Header + """
            inputs CMD : bool; CLOSED : bool; end
            outputs SEAL : bool init TRUE; end
            logic SEAL := (CMD OR SEAL) AND NOT CLOSED; end
            """);

        Assert.Equal(new KnownBoolPowerUp(true), model.PreviousSlotOf("SEAL").PowerUp);
    }

    [Fact]
    public void Build_WhenLoopRunsThroughTwoVariables_BothMemoriesInTheLoopAreUnknown()
    {
        // HOLD reads OUT before OUT's equation: OUT's last value feeds HOLD, which feeds OUT.
        var model = BuildModel(Header + """
            inputs CMD : bool; end
            locals HOLD : bool; end
            outputs OUT : bool; end
            logic HOLD := CMD OR OUT; OUT := HOLD; end
            """);

        Assert.IsType<UnknownPowerUp>(model.PreviousSlotOf("OUT").PowerUp);
        Assert.False(model.HasPreviousSlot("HOLD"));
    }

    [Fact]
    public void Build_WhenReadBeforeWriteHasNoLoop_ItIsAPlainOneScanDelayStartingFalse()
    {
        var model = BuildModel(Header + """
            inputs CMD : bool; LEVEL : real; end
            locals DELAYED : bool; V : real; end
            outputs OUT : bool; end
            logic OUT := DELAYED AND V > 0; DELAYED := CMD; V := LEVEL; end
            """);

        Assert.Equal(new KnownBoolPowerUp(false), model.PreviousSlotOf("DELAYED").PowerUp);
        Assert.Equal(new KnownRealPowerUp(Fractions.Fraction.Zero), model.PreviousSlotOf("V").PowerUp);
    }

    [Fact]
    public void Build_WhenLoopPassesThroughATimer_TheVariableIsStillALatch()
    {
        var model = BuildModel(Header + """
            inputs CMD : bool; end
            locals FAIL : bool; end
            outputs OUT : bool; end
            logic OUT := CMD AND NOT FAIL; FAIL := TON(OUT, T#10ms); end
            """);

        Assert.IsType<UnknownPowerUp>(model.PreviousSlotOf("FAIL").PowerUp);
    }

    [Fact]
    public void Build_WhenVariableIsRealWithInit_ItsMemoryTakesTheExactValue()
    {
        var model = BuildModel(Header + """
            inputs LEVEL : real; end
            outputs PEAK : real init 0.25; end
            logic PEAK := MAX(PEAK, LEVEL); end
            """);

        Assert.Equal(new KnownRealPowerUp(new Fractions.Fraction(1, 4)), model.PreviousSlotOf("PEAK").PowerUp);
    }

    [Fact]
    public void Build_WhenTimersAndEdges_CountersAndEdgeMemoriesStartAsIecSays()
    {
        var model = BuildModel(Header + """
            inputs A : bool; end
            outputs ON_DELAY : bool; OFF_DELAY : bool; PULSE : bool; RISE : bool; FALL : bool; end
            logic
              ON_DELAY := TON(A, T#10ms);
              OFF_DELAY := TOF(A, T#10ms);
              PULSE := TP(A, T#10ms);
              RISE := R_TRIG(A);
              FALL := F_TRIG(A);
            end
            """);

        PowerUp SlotOf(string name) => model.StateSlots.Single(s => s.Kind != StateSlotKind.PreviousValue && s.Cell == model.CellNamed(name).Index).PowerUp;

        // IEC 61131-3 timers: TON and TP start with no time elapsed; TOF starts expired (Q = IN at power-up).
        Assert.Equal(new KnownCounterPowerUp(0), SlotOf("ON_DELAY"));
        Assert.Equal(new KnownCounterPowerUp(5), SlotOf("OFF_DELAY"));
        Assert.Equal(new KnownCounterPowerUp(0), SlotOf("PULSE"));

        // IEC 61131-3 edge detection: the memory M starts FALSE.
        Assert.Equal(new KnownBoolPowerUp(false), SlotOf("RISE"));
        Assert.Equal(new KnownBoolPowerUp(false), SlotOf("FALL"));
        var counter = model.StateSlots.Single(s => s.Kind == StateSlotKind.TimerCounter && s.Cell == model.CellNamed("OFF_DELAY").Index);
        Assert.Equal(5, counter.CounterMax);
    }

    [Fact]
    public void Build_WhenLatchIsTheWholeEquation_ItsMemoryTakesTheVariablesInitOrIsUnknown()
    {
        var model = BuildModel(Header + """
            inputs S : bool; R : bool; end
            outputs LOCKOUT : bool init TRUE; FREE : bool; INSIDE : bool init FALSE; end
            logic
              LOCKOUT := SR(S1 := S, R := R);
              FREE := RS(S, R);
              INSIDE := SR(S, R) AND S;
            end
            """);

        PowerUp LatchOf(string name) => model.StateSlots.Single(s => s.Kind == StateSlotKind.LatchMemory && s.Cell == model.CellNamed(name).Index).PowerUp;

        Assert.Equal(new KnownBoolPowerUp(true), LatchOf("LOCKOUT"));
        Assert.IsType<UnknownPowerUp>(LatchOf("FREE"));

        // A latch inside a larger expression is not the variable itself: its memory has no declared value.
        Assert.IsType<UnknownPowerUp>(LatchOf("INSIDE.SR#1"));
        var latch = Assert.IsType<LatchStep>(model.WriterOf("LOCKOUT"));
        Assert.Equal(LatchKind.SetDominant, latch.Kind);
        Assert.Equal(LatchKind.ResetDominant, Assert.IsType<LatchStep>(model.WriterOf("FREE")).Kind);
    }

    [Fact]
    public void Build_WhenLatchVariableWithoutInitIsReadEarlier_ItsLastValueIsUnknownLikeTheLatch()
    {
        var model = BuildModel(Header + """
            inputs S : bool; R : bool; end
            outputs ALARM : bool; LOCKOUT : bool; end
            logic ALARM := LOCKOUT; LOCKOUT := SR(S, R); end
            """);

        Assert.IsType<UnknownPowerUp>(model.PreviousSlotOf("LOCKOUT").PowerUp);
    }
}
