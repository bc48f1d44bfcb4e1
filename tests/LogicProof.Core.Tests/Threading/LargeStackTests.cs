using System.Globalization;
using LogicProof.Core.Threading;

namespace LogicProof.Core.Tests.Threading;

public class LargeStackTests
{
    [Fact]
    public void Run_WhenFunctionReturns_GivesItsResult()
    {
        Assert.Equal(42, LargeStack.Run(() => 6 * 7));
    }

    [Fact]
    public void Run_WhenRecursionIsFarDeeperThanADefaultStack_Completes()
    {
        // 400,000 frames would overflow a default 1 MB (or 8 MB) thread stack.
        Assert.Equal(400_000, LargeStack.Run(() => Depth(400_000)));
    }

    [Fact]
    public void Run_WhenFunctionThrows_RethrowsTheSameExceptionWithItsOriginalStackTrace()
    {
        var thrown = Assert.Throws<InvalidOperationException>(() => LargeStack.Run<int>(Fail));

        Assert.Equal("failed inside", thrown.Message);
        Assert.Contains(nameof(Fail), thrown.StackTrace, StringComparison.Ordinal);
    }

    [Fact]
    public void Run_WhenCalled_UsesAnotherThreadWithTheCallersCulture()
    {
        var before = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo("tr-TR");
            var (threadId, culture) = LargeStack.Run(() => (Environment.CurrentManagedThreadId, CultureInfo.CurrentCulture.Name));

            Assert.NotEqual(Environment.CurrentManagedThreadId, threadId);
            Assert.Equal("tr-TR", culture);
        }
        finally
        {
            CultureInfo.CurrentCulture = before;
        }
    }

    [Fact]
    public void Run_WhenNested_RunsTheInnerFunctionOnTheSameThread()
    {
        var (outer, inner) = LargeStack.Run(() => (Environment.CurrentManagedThreadId, LargeStack.Run(() => Environment.CurrentManagedThreadId)));

        Assert.Equal(outer, inner);
    }

    private static int Depth(int remaining) => remaining == 0 ? 0 : 1 + Depth(remaining - 1);

    private static int Fail() => throw new InvalidOperationException("failed inside");
}
