using System.Diagnostics;
using System.Text;
using CsCheck;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Language.Parsing;
using LogicProof.Language.Syntax;
using LogicProof.Language.Tests.Support;
using Xunit.Abstractions;

namespace LogicProof.Language.Tests.Parsing;

[Collection(SequentialCollection.Name)]
public class RobustnessTests(ITestOutputHelper output)
{
    private const string Declarations = Scheme.Header + "inputs\n  A : bool;\n  B : bool;\n  C : bool;\nend\noutputs\n  X : bool;\nend\n";

    /// <summary>
    /// A hang guard, not a speed target (the speed targets are in bench/): processor time of this process, not wall
    /// time, so that other work on a shared machine does not count, and far above what a Debug build needs. The
    /// figures themselves are written to the test output.
    /// </summary>
    private static readonly TimeSpan HangGuard = TimeSpan.FromSeconds(60);

    [Fact]
    public void Load_WhenTenThousandParenthesesNest_ReportsTheDepthWithoutParsing()
    {
        var text = Declarations + "logic\n  X := " + new string('(', 10_000) + "A" + new string(')', 10_000) + ";\nend\n";

        var result = Scheme.Load(text);

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.NestingTooDeep, error.Code);
        Assert.Equal((13, 8 + NestingGuard.MaxParenthesisDepth), (error.Span.Line, error.Span.Column));
        Assert.Null(result.Syntax);
    }

    [Fact]
    public void Load_WhenParenthesesNestToTheLimit_ParsesAndBinds()
    {
        var depth = NestingGuard.MaxParenthesisDepth;
        var text = Declarations + "logic\n  X := " + new string('(', depth) + "A" + new string(')', depth) + ";\nend\n";

        Assert.NotNull(Scheme.LoadValid(text).Scheme);
    }

    [Fact]
    public void Load_WhenPrefixOperatorsNestBeyondTheLimit_ReportsTheDepthWithoutParsing()
    {
        var text = Declarations + "logic\n  X := " + string.Concat(Enumerable.Repeat("NOT ", NestingGuard.MaxOperatorDepth + 1)) + "A;\nend\n";

        var error = Assert.Single(Scheme.Load(text).Diagnostics);

        Assert.Equal(LanguageCodes.NestingTooDeep, error.Code);
        Assert.Equal((13, 8 + (4 * NestingGuard.MaxOperatorDepth)), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Load_WhenOneEquationIsAMegabyteLong_ParsesAndBindsWithoutHanging()
    {
        var terms = new[] { "A", "NOT B", "(A OR C)", "B XOR C", "NOT (C AND A)" };
        var operators = new[] { " AND ", " OR ", " AND ", " XOR " };
        var builder = new StringBuilder("A");
        for (var i = 0; builder.Length < 1_000_000; i++)
        {
            builder.Append(operators[i % operators.Length]).Append(terms[i % terms.Length]);
        }

        var text = Declarations + "logic\n  X := " + builder + ";\nend\n";
        var (result, elapsed) = Timed(() => Scheme.LoadValid(text), $"1 MB equation ({text.Length:N0} characters), parsed and bound");

        var top = Assert.IsType<BoundBinary>(Assert.Single(result.Scheme!.Equations).Expression);
        Assert.Equal(BinaryOperator.Or, top.Operator);
        Assert.True(elapsed < HangGuard, $"took {elapsed.TotalMilliseconds} ms of processor time");
    }

    [Fact]
    public void Load_WhenAMegabyteEquationEndsInASyntaxError_ReportsItWithoutHanging()
    {
        var text = Declarations + "logic\n  X := " + string.Join(" AND ", Enumerable.Repeat("A", 200_000)) + " AND ;\nend\n";

        var (result, elapsed) = Timed(() => Scheme.Load(text), "1 MB equation with an error at its end, reported");

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.SyntaxError, error.Code);
        Assert.Equal(13, error.Span.Line);
        Assert.True(elapsed < HangGuard, $"took {elapsed.TotalMilliseconds} ms of processor time");
    }

    [Fact]
    public void Load_WhenSchemeHasOneHundredThousandEquations_ParsesAndBindsThemAll()
    {
        const int count = 100_000;
        var builder = new StringBuilder(Scheme.Header + "inputs\n  A : bool;\n  B : bool;\nend\nlocals\n");
        for (var i = 0; i < count; i++)
        {
            builder.Append("  L").Append(i).Append(" : bool;\n");
        }

        builder.Append("end\nlogic\n  L0 := A;\n");
        for (var i = 1; i < count; i++)
        {
            builder.Append("  L").Append(i).Append(" := L").Append(i - 1).Append(" AND NOT B OR L").Append((i * 7) % count).Append(";\n");
        }

        builder.Append("end\n");
        var text = builder.ToString();
        var (result, elapsed) = Timed(() => Scheme.LoadValid(text), $"100,000 equations ({text.Length:N0} characters), parsed and bound");

        Assert.Equal(count, result.Scheme!.Equations.Count);
        Assert.Equal(count - 1, result.Scheme.Equations[^1].Index);
        Assert.True(elapsed < HangGuard, $"took {elapsed.TotalMilliseconds} ms of processor time");
    }

    private (T Result, TimeSpan ProcessorTime) Timed<T>(Func<T> action, string what)
    {
        using var process = Process.GetCurrentProcess();
        var processorBefore = process.TotalProcessorTime;
        var watch = Stopwatch.StartNew();
        var result = action();
        watch.Stop();
        process.Refresh();
        var processor = process.TotalProcessorTime - processorBefore;
        output.WriteLine($"{what}: {processor.TotalMilliseconds:F0} ms of processor time, {watch.ElapsedMilliseconds} ms wall time");
        return (result, processor);
    }

    [Fact]
    public void Load_WhenSampleIsMangledAtRandom_NeverThrowsAndPlacesEveryDiagnostic()
    {
        var sample = File.ReadAllText(TestFiles.Samples()[0]);
        var tokens = new[] { "(", ")", ";", ":=", "->", "AND", "NOT", "end", "logic", "\"", "(*", "T#", "..", ",", "#", "1.5", "X", "TON(", "\u00e9", "\0" };
        var edit = Gen.Select(Gen.Int[0, sample.Length], Gen.Int[0, 20], Gen.OneOfConst(tokens));

        edit.List[1, 8].Sample(
            edits =>
            {
                var text = new StringBuilder(sample);
                foreach (var (at, remove, insert) in edits)
                {
                    var start = Math.Min(at, text.Length);
                    text.Remove(start, Math.Min(remove, text.Length - start)).Insert(start, insert);
                }

                var result = Scheme.Load(text.ToString());

                Assert.DoesNotContain(result.Diagnostics, d => d.Code == InternalCodes.InternalError);
                Assert.All(result.Diagnostics, d => Assert.True(d.Span.Line >= 1 && d.Span.Column >= 1, d.ToString()));
                Assert.Equal(result.Diagnostics.Any(d => d.IsError), result.Scheme is null);
            },
            iter: 300,
            threads: 1);
    }

    [Fact]
    public void Load_WhenTextIsRandomCharacters_NeverThrows()
    {
        Gen.String[Gen.Char["scheme frqucyHzat;:=()ANDORT#0123456789.\"*/\n-<>"], 0, 400].Sample(
            text =>
            {
                var result = Scheme.Load(text);
                Assert.DoesNotContain(result.Diagnostics, d => d.Code == InternalCodes.InternalError);
                Assert.True(result.HasErrors || result.Scheme is not null);
            },
            iter: 500,
            threads: 1);
    }
}
