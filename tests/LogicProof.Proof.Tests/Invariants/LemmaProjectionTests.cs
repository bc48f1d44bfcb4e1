using LogicProof.Model.Graph;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Lemmas;
using LogicProof.Proof.Results;
using LogicProof.Proof.Tests.Support;

namespace LogicProof.Proof.Tests.Invariants;

public sealed class LemmaProjectionTests
{
    private const string TwoBays = """
        // Quillmere 115 kV substation, two gas alarms in two bays (fictional)
        scheme QM_TWO_BAYS;
        frequency 60 Hz;
        scan 2 ms;
        inputs
          GAS_LOW_7 : bool;
          GAS_LOW_9 : bool;
        end
        locals
          FAST_7 : bool;
          SLOW_7 : bool;
          FAST_9 : bool;
          SLOW_9 : bool;
        end
        logic
          FAST_7 := TON(GAS_LOW_7, T#5s);
          SLOW_7 := TON(GAS_LOW_7, T#10s);
          FAST_9 := TON(GAS_LOW_9, T#1s);
          SLOW_9 := TON(GAS_LOW_9, T#2s);
        end
        require BAY_7: SLOW_7 -> FAST_7;
        require BAY_9: SLOW_9 -> FAST_9;
        """;

    [Fact]
    public async Task Onto_WhenLemmasOfTheWholeModelMeetOneCone_KeepsThoseOfTheConeAndTheyStillProve()
    {
        var model = SchemeLoader.Load(TwoBays);
        var property = SchemeLoader.Property(model, "BAY_7");
        var slice = ConeSlicer.Slice(model, [property.Cell]);
        var lemmas = new InvariantGenerator().Generate(model);

        var projected = LemmaProjection.Onto(lemmas, model, slice);

        Assert.Contains(lemmas, l => l.Description.Contains("FAST_9", StringComparison.Ordinal));
        Assert.DoesNotContain(projected, l => l.Description.Contains("_9", StringComparison.Ordinal));
        Assert.Contains(projected, l => l.Description == "FAST_7@timer = min(SLOW_7@timer, 2500)");
        Assert.All(projected, l => Assert.All(Slots(l.Expression), s => Assert.InRange(s, 0, slice.StateSlots.Count - 1)));
        var slicedProperty = slice.Properties.Single(p => p.Name == "BAY_7");
        var verdict = await new KInductionEngine().CheckAsync(
            new ProofProblem(slice, slicedProperty) { Lemmas = projected }, new EngineOptions { MaxDepth = 4 }, CancellationToken.None);
        Assert.IsType<Proved>(verdict);
    }

    [Fact]
    public void Onto_WhenTheTargetIsTheSameModel_KeepsEveryLemma()
    {
        var model = SchemeLoader.Load(TwoBays);
        var lemmas = new InvariantGenerator().Generate(model);

        var projected = LemmaProjection.Onto(lemmas, model, model);

        Assert.Equal(lemmas.Select(l => LemmaKey.Of(l.Expression)), projected.Select(l => LemmaKey.Of(l.Expression)));
    }

    private static IEnumerable<int> Slots(LemmaExpression expression) => expression switch
    {
        LemmaSlot slot => [slot.Slot],
        LemmaNot not => Slots(not.Operand),
        LemmaAnd and => and.Operands.SelectMany(Slots),
        LemmaOr or => or.Operands.SelectMany(Slots),
        LemmaImplies implies => Slots(implies.Left).Concat(Slots(implies.Right)),
        LemmaCompare compare => Slots(compare.Left).Concat(Slots(compare.Right)),
        LemmaAdd add => Slots(add.Left).Concat(Slots(add.Right)),
        LemmaScale scale => Slots(scale.Operand),
        _ => [],
    };
}
