using LogicProof.Core.Text;

namespace LogicProof.Core.Tests.Text;

public class SourceTextTests
{
    private static readonly SourceText Text = new("a.lpl", "ab\ncd\r\n\nef");

    [Theory]
    [InlineData(0, 1, 1)]
    [InlineData(1, 1, 2)]
    [InlineData(3, 2, 1)]
    [InlineData(5, 2, 3)]
    [InlineData(7, 3, 1)]
    [InlineData(8, 4, 1)]
    [InlineData(10, 4, 3)]
    public void Position_WhenGivenAnOffset_GivesOneBasedLineAndColumn(int offset, int line, int column)
    {
        Assert.Equal((line, column), Text.Position(offset));
    }

    [Fact]
    public void Position_WhenOffsetIsOutsideTheText_IsClampedToIt()
    {
        Assert.Equal((1, 1), Text.Position(-5));
        Assert.Equal((4, 3), Text.Position(99));
    }

    [Fact]
    public void Line_WhenAsked_GivesTheLineWithoutItsBreak()
    {
        Assert.Equal(4, Text.LineCount);
        Assert.Equal("cd", Text.Line(2));
        Assert.Equal(string.Empty, Text.Line(3));
        Assert.Equal(string.Empty, Text.Line(9));
    }

    [Fact]
    public void Span_WhenMade_CarriesFileOffsetLengthLineAndColumn()
    {
        Assert.Equal(new SourceSpan("a.lpl", 4, 1, 2, 2), Text.Span(4, 1));
        Assert.Equal("a.lpl:2:2", Text.Span(4, 1).ToString());
    }
}
