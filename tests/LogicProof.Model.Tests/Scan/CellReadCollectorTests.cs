using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Tests.Scan;

public sealed class CellReadCollectorTests
{
    [Fact]
    public void Collect_WhenEveryExpressionKind_ReadsEachCellInEvaluationOrder()
    {
        var expression = new AndExpression(
        [
            new NotExpression(Bool(0)),
            new OrExpression([Bool(1), new BoolConstantExpression(true), Bool(2)]),
            new XorExpression(Bool(3), new ImpliesExpression(Bool(4), Bool(5))),
            new CompareExpression(
                CompareOperator.Less,
                new AddExpression(Real(6), new SubtractExpression(Real(7), new NegateExpression(Real(8)))),
                new MinExpression(
                    new ScaleExpression(2, new AbsExpression(Real(9))),
                    new MaxExpression(Real(10), new RealConstantExpression(Fraction.One)))),
            new CompareExpression(CompareOperator.Equal, Bool(11, ReadTiming.Previous), Bool(12)),
        ]);
        var reads = new List<CellReadExpression>();

        new CellReadCollector().Collect(expression, reads);

        Assert.Equal(Enumerable.Range(0, 13), reads.Select(read => read.Cell));
        Assert.Equal(ReadTiming.Previous, reads[11].Timing);
    }

    [Fact]
    public void Collect_WhenLatchStep_ReadsSetBeforeResetAndAppendsAcrossCalls()
    {
        var collector = new CellReadCollector();
        var reads = new List<CellReadExpression>();
        var latch = new LatchStep(LatchKind.SetDominant, 9, new OrExpression([Bool(0), Bool(1)]), Bool(2), 0, SourceSpan.None);
        var timer = new TimerStep(TimerKind.OnDelay, 8, Bool(3), 5, 1, SourceSpan.None);

        collector.Collect(latch, reads);
        collector.Collect(timer, reads);

        Assert.Equal([0, 1, 2, 3], reads.Select(read => read.Cell));
    }

    [Fact]
    public void Collect_WhenExpressionIsNestedFarDeeperThanTheCallStackAllows_ReadsItsCell()
    {
        ScanExpression expression = Bool(7);
        for (var i = 0; i < 1_000_000; i++)
        {
            expression = new NotExpression(expression);
        }

        var reads = new List<CellReadExpression>();
        new CellReadCollector().Collect(expression, reads);

        Assert.Equal(7, Assert.Single(reads).Cell);
    }

    private static CellReadExpression Bool(int cell, ReadTiming timing = ReadTiming.Current) => new(cell, timing, SignalType.Bool);

    private static CellReadExpression Real(int cell) => new(cell, ReadTiming.Current, SignalType.Real);
}
