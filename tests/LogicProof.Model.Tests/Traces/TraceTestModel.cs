using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Tests.Simulation;
using LogicProof.Model.Traces;

namespace LogicProof.Model.Tests.Traces;

/// <summary>
/// A small hand-built model for trace tests: inputs CLOSE_CMD, LOCKOUT_86 (bool) and SLIP_HZ (real, -2 .. 2),
/// and an output CLOSE_OUT := CLOSE_CMD AND NOT LOCKOUT_86.
/// </summary>
internal static class TraceTestModel
{
    public const int CloseCmd = 0;
    public const int Lockout = 1;
    public const int Slip = 2;
    public const int CloseOut = 3;

    public static ScanModel Build(Fraction? scanMilliseconds = null)
    {
        var builder = new TestModelBuilder();
        builder.BoolInput("CLOSE_CMD");
        builder.BoolInput("LOCKOUT_86");
        builder.RealInput("SLIP_HZ", -2, 2);
        builder.Bool("CLOSE_OUT", isOutput: true);
        builder.Assign(CloseOut, new AndExpression([builder.Now(CloseCmd), new NotExpression(builder.Now(Lockout))]));
        return builder.Build(scanMilliseconds ?? new Fraction(2));
    }

    public static InputTraceResult Read(string text, Fraction? scanMilliseconds = null) =>
        InputTraceReader.Read(new SourceText("trace.csv", text), Build(scanMilliseconds));

    public static InputTrace ReadValid(string text, Fraction? scanMilliseconds = null)
    {
        var result = Read(text, scanMilliseconds);
        Assert.True(result.Trace is not null, string.Join(Environment.NewLine, result.Diagnostics));
        return result.Trace!;
    }
}
