using System.Diagnostics;
using System.Globalization;
using System.Text;
using LogicProof.Core.Threading;
using LogicProof.Language;
using LogicProof.Model.Graph;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;
using LogicProof.Model.StaticChecks;
using Xunit.Abstractions;

namespace LogicProof.Model.Tests.Lowering;

public sealed class LargeSchemeTests(ITestOutputHelper output)
{
    /// <summary>
    /// A generated scheme (demo data): 100 inputs, <paramref name="equations"/> locals, each equation reading two
    /// inputs, the previous local (this scan) and a later one (last scan); every 50th a timer, every 70th a latch.
    /// </summary>
    internal static string GenerateScheme(int equations)
    {
        var text = new StringBuilder(equations * 60);
        text.Append("scheme BIG;\nfrequency 60 Hz;\nscan 2 ms;\ninputs\n");
        for (var i = 0; i < 100; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"  I{i} : bool;\n");
        }

        text.Append("end\nlocals\n");
        for (var i = 0; i < equations; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"  X{i} : bool;\n");
        }

        text.Append("end\nlogic\n");
        for (var i = 0; i < equations; i++)
        {
            var previous = i == 0 ? "I0" : $"X{i - 1}";
            var later = $"X{(i + 7) % equations}";
            var line = (i % 50, i % 70) switch
            {
                (0, _) => $"  X{i} := TON(I{i % 100} AND {previous}, T#20ms);\n",
                (_, 0) => $"  X{i} := SR({previous}, I{(i + 1) % 100});\n",
                _ => $"  X{i} := (I{i % 100} OR {previous}) AND NOT {later} OR I{(i * 3) % 100};\n",
            };
            text.Append(line);
        }

        text.Append("end\n");
        return text.ToString();
    }

    [Fact]
    public void Build_When100000Equations_BuildsAConsistentModelQuickly()
    {
        var text = GenerateScheme(100_000);
        var clock = Stopwatch.StartNew();
        var front = FrontEnd.LoadText("big.lpl", text);
        var frontEndTime = clock.Elapsed;
        Assert.False(front.HasErrors);

        clock.Restart();
        var built = LargeStack.Run(() => ModelBuilder.Build(front.Scheme!));
        var buildTime = clock.Elapsed;
        output.WriteLine($"100,000 equations: parse + bind {frontEndTime.TotalMilliseconds:F0} ms, model build {buildTime.TotalMilliseconds:F0} ms");

        var model = built.Model!;
        Assert.Equal(100_100, model.Cells.Count);
        Assert.Equal(100_000, model.EquationStepCount);
        Assert.IsType<TimerStep>(model.Steps[0]);

        // A guard against quadratic passes (they would take minutes here), not the benchmark: a debug build on a
        // shared machine. The release figure is measured by the benchmark (bench/).
        Assert.True(buildTime < TimeSpan.FromSeconds(20), $"model build took {buildTime}");
    }

    [Fact]
    public void StaticChecksAndGraph_When100000Equations_FinishQuickly()
    {
        var scheme = FrontEnd.LoadText("big.lpl", GenerateScheme(100_000)).Scheme!;

        var clock = Stopwatch.StartNew();
        var graph = DependencyGraph.Build(scheme);
        var diagnostics = StaticChecker.Check(scheme, graph);
        var cone = graph.ConeOfInfluence("X99999");
        output.WriteLine($"graph + static checks + cone: {clock.Elapsed.TotalMilliseconds:F0} ms, {diagnostics.Count} diagnostics, cone {cone.Count}");

        Assert.Contains(diagnostics, d => d.Code == ModelCodes.ReadBeforeWrite);
        // A guard against quadratic passes, as above.
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(60), $"took {clock.Elapsed}");
    }

    [Fact]
    public void Build_WhenOneEquationIsAMegabyteLong_BuildsOnALargeStack()
    {
        var text = new StringBuilder("scheme LONG;\nfrequency 50 Hz;\nscan 1 ms;\ninputs A : bool; B : bool; V : real; end\noutputs X : bool; Y : bool; end\nlogic\n  X := A");
        while (text.Length < 1_000_000)
        {
            text.Append(" AND NOT B OR A XOR B");
        }

        text.Append(";\n  Y := V");
        for (var i = 0; i < 20_000; i++)
        {
            text.Append(" + V");
        }

        text.Append(" > 1;\nend\n");
        var front = FrontEnd.LoadText("long.lpl", text.ToString());
        Assert.False(front.HasErrors, LoweringFixture.Describe(front.Diagnostics));

        var clock = Stopwatch.StartNew();
        var built = LargeStack.Run(() => ModelBuilder.Build(front.Scheme!));
        var sliced = LargeStack.Run(() => ConeSlicer.Slice(built.Model!, [built.Model!.CellNamed("X").Index]));
        var checks = StaticChecker.Check(front.Scheme!);
        output.WriteLine($"1 MB equation: build + slice + checks {clock.Elapsed.TotalMilliseconds:F0} ms");

        Assert.Empty(built.Diagnostics);
        Assert.Equal(3, sliced.Cells.Count);
        Assert.Empty(checks);
    }
}
