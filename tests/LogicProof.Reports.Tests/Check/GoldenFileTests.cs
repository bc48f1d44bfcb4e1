namespace LogicProof.Reports.Tests.Check;

public sealed class GoldenFileTests
{
    [Fact]
    public void Difference_WhenOneLineDiffers_ShowsContextThenExpectedAndActual()
    {
        var difference = GoldenFile.Difference("a\nb\nc\nd\n", "a\nb\nX\nd\n");

        Assert.Equal("  1: a\n  2: b\n- 3: c\n- 4: d\n- 5: \n+ 3: X\n+ 4: d\n+ 5: \n", difference);
    }
}
