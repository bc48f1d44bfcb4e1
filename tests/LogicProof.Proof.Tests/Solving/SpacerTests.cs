using Microsoft.Z3;

namespace LogicProof.Proof.Tests.Solving;

public sealed class SpacerTests
{
    [Fact]
    public void Query_WhenCounterBoundIsReachable_ReturnsSatisfiable()
    {
        using var ctx = Z3TestContext.Create();
        var (fixedpoint, reach, x) = Counter(ctx, bound: 10);

        var status = fixedpoint.Query(ctx.MkExists([x], ctx.MkAnd((BoolExpr)reach.Apply(x), ctx.MkEq(x, ctx.MkInt(10)))));

        Assert.Equal(Status.SATISFIABLE, status);
    }

    [Fact]
    public void Query_WhenValueIsOutsideCounterRange_ReturnsUnsatisfiable()
    {
        using var ctx = Z3TestContext.Create();
        var (fixedpoint, reach, x) = Counter(ctx, bound: 10);

        var below = fixedpoint.Query(ctx.MkExists([x], ctx.MkAnd((BoolExpr)reach.Apply(x), ctx.MkEq(x, ctx.MkInt(-1)))));
        var above = fixedpoint.Query(ctx.MkExists([x], ctx.MkAnd((BoolExpr)reach.Apply(x), ctx.MkGt(x, ctx.MkInt(10)))));

        Assert.Equal(Status.UNSATISFIABLE, below);
        Assert.Equal(Status.UNSATISFIABLE, above);
    }

    [Fact]
    public void Query_WhenTimeoutIsTiny_StopsEarlyAsUnknownOrCanceledAndContextStaysUsable()
    {
        using var ctx = Z3TestContext.Create();
        var (fixedpoint, reach, x) = Counter(ctx, bound: 1_000_000, timeoutMilliseconds: 10);
        var watch = System.Diagnostics.Stopwatch.StartNew();

        // Z3 reports a fixedpoint timeout as a "canceled" error, which the managed API throws;
        // an engine that stops by itself answers unknown. Both mean: no verdict.
        Status? status = null;
        var canceled = false;
        try
        {
            status = fixedpoint.Query(ctx.MkExists([x], ctx.MkAnd((BoolExpr)reach.Apply(x), ctx.MkEq(x, ctx.MkInt(1_000_000)))));
        }
        catch (Z3Exception e) when (e.Message == "canceled")
        {
            canceled = true;
        }

        Assert.True(canceled || status == Status.UNKNOWN, $"status {status}");
        Assert.True(watch.Elapsed < TimeSpan.FromSeconds(30), $"took {watch.Elapsed}");
        var (again, reachAgain, y) = Counter(ctx, bound: 10);
        Assert.Equal(
            Status.SATISFIABLE,
            again.Query(ctx.MkExists([y], ctx.MkAnd((BoolExpr)reachAgain.Apply(y), ctx.MkEq(y, ctx.MkInt(10))))));
    }

    /// <summary>reach(0); reach(x) and x &lt; bound imply reach(x + 1).</summary>
    private static (Fixedpoint Fixedpoint, FuncDecl Reach, IntExpr X) Counter(Context ctx, int bound, uint? timeoutMilliseconds = null)
    {
        var fixedpoint = ctx.MkFixedpoint();
        var parameters = ctx.MkParams().Add("engine", "spacer");
        if (timeoutMilliseconds is { } timeout)
        {
            parameters.Add("timeout", timeout);
        }

        fixedpoint.Parameters = parameters;
        var reach = ctx.MkFuncDecl("reach", [ctx.IntSort], ctx.BoolSort);
        fixedpoint.RegisterRelation(reach);
        var x = ctx.MkIntConst("x");
        fixedpoint.AddRule((BoolExpr)reach.Apply(ctx.MkInt(0)));
        fixedpoint.AddRule(ctx.MkForall([x], ctx.MkImplies(
            ctx.MkAnd((BoolExpr)reach.Apply(x), ctx.MkLt(x, ctx.MkInt(bound))),
            (BoolExpr)reach.Apply(ctx.MkAdd(x, ctx.MkInt(1))))));
        return (fixedpoint, reach, x);
    }
}
