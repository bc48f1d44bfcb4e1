using System.Collections.Concurrent;
using System.Runtime.CompilerServices;
using LogicProof.Proof.Solving;
using Microsoft.Z3;

namespace LogicProof.Proof.Tests.Solving;

public sealed class ConcurrentReleaseTests
{
    private const int Workers = 4;
    private const int ContextsPerWorker = 10;
    private const int StepsPerContext = 10;
    private const int GarbagePerStep = 300;

    [Fact]
    public void IncrementalQueries_WhenFinalizersRunConcurrently_AllAnswersAreCorrect()
    {
        var errors = new ConcurrentQueue<Exception>();
        var queries = 0;
        var collections = 0;
        using var done = new CancellationTokenSource();

        var collector = new Thread(() =>
        {
            while (!done.IsCancellationRequested)
            {
                GC.Collect();
                GC.WaitForPendingFinalizers();
                Interlocked.Increment(ref collections);
            }
        })
        { IsBackground = true };
        var workers = Enumerable.Range(0, Workers)
            .Select(w => new Thread(() =>
            {
                try
                {
                    for (var c = 0; c < ContextsPerWorker; c++)
                    {
                        Interlocked.Add(ref queries, RunContext(w, c, dispose: c % 2 == 0));
                    }
                }
                catch (Exception e)
                {
                    errors.Enqueue(e);
                }
            })
            { IsBackground = true })
            .ToList();

        collector.Start();
        workers.ForEach(t => t.Start());
        // Background threads and a bounded wait: a corrupted native heap tends to hang rather than fail.
        var finished = workers.All(t => t.Join(TimeSpan.FromSeconds(120)));
        done.Cancel();
        Assert.True(finished, "workers did not finish within 120 s");
        collector.Join();
        GC.Collect();
        GC.WaitForPendingFinalizers();

        Assert.Empty(errors);
        Assert.Equal(Workers * ContextsPerWorker * StepsPerContext * 2, queries);
        Assert.True(collections > 0);
    }

    [Fact]
    public void DecRef_WhenRunByFinalizer_IsDeferredUntilOwnerTakesNextReference()
    {
        using var ctx = Z3TestContext.Create();
        var handle = Z3TestContext.NativeHandle(ctx);
        DropExpressions(ctx, 200);

        GC.Collect();
        GC.WaitForPendingFinalizers();
        var pendingAfterCollection = Z3Runtime.PendingReleases(handle);
        var fresh = ctx.MkIntConst("fresh");
        var pendingAfterIncRef = Z3Runtime.PendingReleases(handle);

        if (OperatingSystem.IsLinux())
        {
            Assert.True(pendingAfterCollection > 0, "finalized expressions should be queued");
        }

        Assert.Equal(0, pendingAfterIncRef);
        Assert.Equal("fresh", fresh.ToString());
    }

    [Fact]
    public void Dispose_WhenReleasesArePending_DeletesContextCleanly()
    {
        var ctx = Z3TestContext.Create();
        var handle = Z3TestContext.NativeHandle(ctx);
        DropExpressions(ctx, 200);
        GC.Collect();
        GC.WaitForPendingFinalizers();

        ctx.Dispose();

        Assert.Equal(0, Z3Runtime.PendingReleases(handle));
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void DropExpressions(Context ctx, int count)
    {
        for (var i = 0; i < count; i++)
        {
            _ = ctx.MkAdd(ctx.MkIntConst($"d{i}"), ctx.MkInt(i));
        }
    }

    /// <summary>Fresh terms nobody keeps: the finalizers release them while the owner builds more.</summary>
    private static void MakeGarbage(Context ctx, BitVecExpr x, IntExpr n, int step)
    {
        for (var j = 0; j < GarbagePerStep; j++)
        {
            _ = ctx.MkBVAdd(x, ctx.MkExtract(7, 0, ctx.MkBV((uint)(step * GarbagePerStep + j), 16 + (uint)(j % 8))));
            _ = ctx.MkLe(ctx.MkAdd(n, ctx.MkInt(j + step * GarbagePerStep)), ctx.MkInt(j));
        }
    }

    /// <summary>Runs 2 * StepsPerContext assumption queries in one context; returns how many gave the expected answer.</summary>
    private static int RunContext(int worker, int round, bool dispose)
    {
        var ctx = Z3TestContext.Create();
        var correct = 0;
        var solver = ctx.MkSolver();
        var x = ctx.MkBVConst("x", 8);
        var n = ctx.MkIntConst("n");
        for (var k = 0; k < StepsPerContext; k++)
        {
            var value = (uint)((worker * 31 + round * 7 + k * 3) % 200);
            MakeGarbage(ctx, x, n, k);
            var p = ctx.MkBoolConst($"p{k}");
            var q = ctx.MkBoolConst($"q{k}");
            solver.Add(ctx.MkImplies(p, ctx.MkAnd(
                ctx.MkEq(x, ctx.MkBV(value, 8)),
                ctx.MkEq(n, ctx.MkAdd(ctx.MkMul(ctx.MkInt(2), ctx.MkInt(k)), ctx.MkInt(1))))));
            solver.Add(ctx.MkImplies(q, ctx.MkBVUGT(x, ctx.MkBV(value + 1, 8))));

            if (solver.Check(p) == Status.SATISFIABLE
                && ((BitVecNum)solver.Model.Eval(x, true)).UInt == value
                && ((IntNum)solver.Model.Eval(n, true)).Int == 2 * k + 1)
            {
                correct++;
            }

            if (solver.Check(p, q) == Status.UNSATISFIABLE
                && solver.UnsatCore.Select(e => e.ToString()).Order(StringComparer.Ordinal)
                    .SequenceEqual([$"p{k}", $"q{k}"]))
            {
                correct++;
            }
        }

        if (dispose)
        {
            solver.Dispose();
            ctx.Dispose();
        }
        else
        {
            // Left to the finalizers, context included.
            GC.KeepAlive(ctx);
        }

        return correct;
    }
}
