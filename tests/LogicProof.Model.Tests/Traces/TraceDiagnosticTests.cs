using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Traces;

namespace LogicProof.Model.Tests.Traces;

/// <summary>Every trace problem has its code and points at the CSV line and column of the offending cell.</summary>
public sealed class TraceDiagnosticTests
{
    private const string Header = "time_ms,CLOSE_CMD,LOCKOUT_86,SLIP_HZ\n";

    [Theory]
    [InlineData("time,CLOSE_CMD\n0,1\n", TraceCodes.MissingTimeColumn, 1, 1)]
    [InlineData("time_ms,CLOSE_CMD,BOGUS\n0,1\n", TraceCodes.UnknownColumn, 1, 19)]
    [InlineData("time_ms,CLOSE_CMD,CLOSE_OUT\n0,1\n", TraceCodes.UnknownColumn, 1, 19)]
    [InlineData("time_ms,CLOSE_CMD, close_cmd\n0,1\n", TraceCodes.DuplicateColumn, 1, 20)]
    [InlineData(Header + "0,1\nabc,0\n", TraceCodes.BadTime, 3, 1)]
    [InlineData(Header + "0,1\n-2,0\n", TraceCodes.BadTime, 3, 1)]
    [InlineData(Header + "0,1\n1e3,0\n", TraceCodes.BadTime, 3, 1)]
    [InlineData(Header + "0,1\n,0\n", TraceCodes.BadTime, 3, 1)]
    [InlineData(Header + "10,1\n5,0\n", TraceCodes.DecreasingTime, 3, 1)]
    [InlineData(Header + "0,1\n4,  yes\n", TraceCodes.BadBoolValue, 3, 5)]
    [InlineData(Header + "0,1,0,fast\n", TraceCodes.BadRealValue, 2, 7)]
    [InlineData(Header + "0,1,0,\"0,5\"\n", TraceCodes.BadRealValue, 2, 8)]
    [InlineData(Header + "0,1,0,2.5\n", TraceCodes.RealOutOfRange, 2, 7)]
    [InlineData(Header + "0,1,0,0,1\n", TraceCodes.TooManyCells, 2, 9)]
    [InlineData(Header + "0,1\n10,END\n12,0\n", TraceCodes.MisplacedEnd, 4, 1)]
    [InlineData(Header + "0,1\n10,END,1\n", TraceCodes.MisplacedEnd, 3, 8)]
    [InlineData(Header, TraceCodes.NoRows, 1, 1)]
    [InlineData("", TraceCodes.MissingTimeColumn, 1, 1)]
    [InlineData(Header + "0,\"1\n\",0\n", TraceCodes.MultiLineCell, 2, 1)]
    public void Read_WhenProblem_ReportsCodeAtLineAndColumn(string text, string code, int line, int column)
    {
        var result = TraceTestModel.Read(text);
        var diagnostic = result.Diagnostics.First(d => d.IsError);
        Assert.Equal(code, diagnostic.Code);
        Assert.Equal("trace.csv", diagnostic.Span.File);
        Assert.Equal((line, column), (diagnostic.Span.Line, diagnostic.Span.Column));
        Assert.Null(result.Trace);
    }

    [Theory]
    [InlineData(Header + "0,1\n3,0\n3.5,1\n", TraceCodes.RowNeverInForce, 3)]
    [InlineData(Header + "0,1\n3,0\n4,END\n", TraceCodes.RowNeverInForce, 3)]
    [InlineData(Header + "5,1\n", TraceCodes.LateFirstRow, 2)]
    public void Read_WhenRowIsNeverSeenOrLate_WarnsAtItsLine(string text, string code, int line)
    {
        var result = TraceTestModel.Read(text);
        Assert.NotNull(result.Trace);
        var warning = Assert.Single(result.Diagnostics, d => d.Code == code);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Equal(line, warning.Span.Line);
    }

    [Fact]
    public void Read_WhenSeveralProblems_ReportsEveryOne()
    {
        var result = TraceTestModel.Read(Header + "0,maybe,0,0\n2,1,2,9\n");
        Assert.Equal(
            [TraceCodes.BadBoolValue, TraceCodes.BadBoolValue, TraceCodes.RealOutOfRange],
            result.Diagnostics.Where(d => d.IsError).Select(d => d.Code));
    }

    [Fact]
    public void Format_WhenBadValue_ShowsFileLineColumnExcerptAndCaret()
    {
        var text = Header + "0,1,0,0\n4,1,0,  2.5\n";
        var source = new SourceText("trace.csv", text);
        var result = InputTraceReader.Read(source, TraceTestModel.Build());

        var formatted = DiagnosticFormatter.Format(result.Diagnostics.Single(d => d.IsError), source);

        var lines = formatted.Split('\n');
        Assert.StartsWith("trace.csv:3:9: error LP4010: 2.5 is outside the range -2 .. 2", lines[0], StringComparison.Ordinal);
        Assert.Equal("    | 4,1,0,  2.5", lines[1]);
        Assert.Equal("    |         ^^^", lines[2]);
    }

    [Fact]
    public void Read_WhenDecreasingTime_RelatesThePreviousRow()
    {
        var result = TraceTestModel.Read(Header + "0,1\n10,1\n5,0\n");
        var diagnostic = Assert.Single(result.Diagnostics, d => d.IsError);
        Assert.Equal(3, Assert.Single(diagnostic.Related).Span.Line);
    }
}
