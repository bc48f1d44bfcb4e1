using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Tests.Check;

/// <summary>
/// A small hand-built check of an invented scheme (Quillmere 115 kV substation, breaker QM-7; demo data only):
/// a proved rule, a violated requirement whose trace has an accelerated row and starts a latch of unknown
/// power-up, an inconclusive requirement, a rule that does not apply, a warning and a note.
/// </summary>
internal static class ReportSamples
{
    public const string SchemePath = "examples/quillmere-bay7/qm7_close.lpl";

    public const int CloseCmd = 0;
    public const int Lockout = 1;
    public const int Slip = 2;
    public const int Breaker52A = 3;
    public const int CloseOut = 4;
    public const int Seal = 5;
    public const int CloseFail = 6;
    public const int CloseBlockedCell = 7;
    public const int NoDoubleCloseCell = 8;
    public const int SlipWindowCell = 9;

    public static ScanModel Model { get; } = BuildModel();

    public static SourceSpan Span(int line, int column, int length = 1) => new(SchemePath, (line * 40) + column, length, line, column);

    public static CheckReport Report(bool breakerModelled = false) =>
        CheckReportBuilder.ForRun("0.4.0-demo", "4.8.12", [File(breakerModelled)]);

    public static FileCheckReport File(bool breakerModelled = false) =>
        CheckReportBuilder.ForFile(SchemePath, Model, Diagnostics(), Results(), [NotApplicable()], breakerModelled);

    public static CounterexampleView Violation() =>
        File().Properties.Single(property => property.Counterexample is not null).Counterexample!;

    public static NotApplicableRule NotApplicable() =>
        new("CLOSE_NEEDS_GAS_AND_SPRING", ["low_gas", "spring_charged"])
        {
            Statement = "Close starts only with gas pressure healthy and the closing spring charged.",
        };

    public static IReadOnlyList<Diagnostic> Diagnostics() =>
    [
        new Diagnostic(ModelCodeReadBeforeWrite, Severity.Warning, "SEAL is read here before its equation, so it sees last scan's value.", Span(22, 28, 4))
        {
            Related = [new RelatedLocation("SEAL is written here", Span(24, 1, 4))],
        },
        new Diagnostic(ModelCodeFeedbackLoop, Severity.Info, "feedback loop CLOSE_OUT -> SEAL -> CLOSE_OUT holds its state like a latch.", Span(24, 1, 4)),
    ];

    public static IReadOnlyList<PropertyResult> Results() =>
    [
        new PropertyResult(Model.Properties[0], new Proved("k-induction", 2, null), TimeSpan.FromMilliseconds(12.5)),
        new PropertyResult(Model.Properties[1], new Violated(Counterexample(), "bmc"), TimeSpan.FromMilliseconds(340)),
        new PropertyResult(
            Model.Properties[2],
            new Inconclusive("bmc: bound of 50 steps reached; k-induction: time limit of 60 s reached", 50),
            TimeSpan.FromSeconds(60)),
    ];

    /// <summary>
    /// NO_DOUBLE_CLOSE fails at scan 252 (504 ms): the seal-in latch powers up TRUE, the close command pulses at 2 ms,
    /// 250 scans pass under the same inputs (one accelerated row), and a second pulse closes again.
    /// </summary>
    public static Counterexample Counterexample()
    {
        var third = new Fraction(-1, 3);
        TraceStep Step(long first, long count, bool close, Fraction slip, bool closeOut, bool seal, long timer, bool holds) => new(
            first,
            count,
            new Fraction(2) * first,
            [Bool(CloseCmd, "CLOSE_CMD", close), Bool(Lockout, "LOCKOUT_86", false), Real(Slip, "SLIP_HZ", slip), Bool(Breaker52A, "BKR_52A", false)],
            [Bool(CloseOut, "CLOSE_OUT", closeOut), Bool(Seal, "SEAL", seal), Bool(CloseFail, "CLOSE_FAIL", false), Bool(NoDoubleCloseCell, "NO_DOUBLE_CLOSE", holds)],
            [Bool(0, "SEAL@last", seal), new NamedValue(1, "CLOSE_FAIL@timer", new CounterTraceValue(timer))]);

        var steps = new List<TraceStep>
        {
            Step(0, 1, false, new Fraction(1, 4), false, true, 0, true),
            Step(1, 1, true, new Fraction(1, 4), true, true, 0, true),
            Step(2, 250, false, third, false, false, 1, true),
            Step(252, 1, true, third, true, true, 0, false),
        };
        var input = new JustificationNode("CLOSE_CMD", BoolTraceValue.True, 252, Span(6, 3, 9), [], []) { Note = "input" };
        var closeOut = new JustificationNode(
            "CLOSE_OUT", BoolTraceValue.True, 252, Span(22, 1, 9), [new JustifyingTerm("CLOSE_CMD", BoolTraceValue.True), new JustifyingTerm("NOT LOCKOUT_86", BoolTraceValue.True)], [input]);
        var root = new JustificationNode(
            "NO_DOUBLE_CLOSE",
            BoolTraceValue.False,
            252,
            Span(31, 1, 7),
            [new JustifyingTerm("ROSE(CLOSE_OUT)", BoolTraceValue.True), new JustifyingTerm("ONCE(PREV(CLOSE_OUT))", BoolTraceValue.True)],
            [closeOut]);
        return new Counterexample([Bool(0, "SEAL@last", true)], steps, 3, new Justification(root));
    }

    private const string ModelCodeReadBeforeWrite = "LP3013";
    private const string ModelCodeFeedbackLoop = "LP3014";

    private static NamedValue Bool(int index, string name, bool value) => new(index, name, TraceValue.Of(value));

    private static NamedValue Real(int index, string name, Fraction value) => new(index, name, TraceValue.Of(value));

    private static ScanModel BuildModel()
    {
        Cell Input(int index, string name, SignalType type, int line) => new(index, name, CellKind.Input, type, Span(line, 3, name.Length));
        var cells = new List<Cell>
        {
            Input(CloseCmd, "CLOSE_CMD", SignalType.Bool, 6),
            Input(Lockout, "LOCKOUT_86", SignalType.Bool, 7),
            Input(Slip, "SLIP_HZ", SignalType.Real, 8) with { Range = (new Fraction(-1), new Fraction(1)) },
            Input(Breaker52A, "BKR_52A", SignalType.Bool, 9),
            new(CloseOut, "CLOSE_OUT", CellKind.Variable, SignalType.Bool, Span(12, 3, 9)) { IsOutput = true },
            new(Seal, "SEAL", CellKind.Variable, SignalType.Bool, Span(15, 3, 4)),
            new(CloseFail, "CLOSE_FAIL", CellKind.Variable, SignalType.Bool, Span(16, 3, 10)),
            new(CloseBlockedCell, "CLOSE_BLOCKED_IN_LOCKOUT", CellKind.Hidden, SignalType.Bool, Span(22, 1, 9)),
            new(NoDoubleCloseCell, "NO_DOUBLE_CLOSE", CellKind.Hidden, SignalType.Bool, Span(31, 1, 7)),
            new(SlipWindowCell, "SLIP_WITHIN_WINDOW", CellKind.Hidden, SignalType.Bool, Span(33, 1, 7)),
        };
        var slots = new List<StateSlot>
        {
            new(0, StateSlotKind.PreviousValue, "SEAL@last", new UnknownPowerUp()) { Cell = Seal },
            new(1, StateSlotKind.TimerCounter, "CLOSE_FAIL@timer", new KnownCounterPowerUp(0)) { Cell = CloseFail, CounterMax = 250 },
        };
        var properties = new List<ModelProperty>
        {
            new("CLOSE_BLOCKED_IN_LOCKOUT", CloseBlockedCell, PropertyOrigin.Rule, Span(22, 1, 9))
            {
                Statement = "Close is blocked while the lockout is operated.",
            },
            new("NO_DOUBLE_CLOSE", NoDoubleCloseCell, PropertyOrigin.Requirement, Span(31, 1, 7))
            {
                Statement = "NOT (ROSE(CLOSE_OUT) AND ONCE(PREV(CLOSE_OUT)))",
            },
            new("SLIP_WITHIN_WINDOW", SlipWindowCell, PropertyOrigin.Requirement, Span(33, 1, 7)),
        };
        return new ScanModel(
            "QM7_CLOSE",
            new ScanTiming(new Fraction(60), new Fraction(2)),
            cells,
            [CloseCmd, Lockout, Slip, Breaker52A],
            [],
            slots,
            properties,
            []);
    }
}
