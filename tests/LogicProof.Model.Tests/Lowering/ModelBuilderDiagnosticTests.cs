using System.Runtime.CompilerServices;
using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Scan;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Lowering;

public sealed class ModelBuilderDiagnosticTests
{
    [Fact]
    public void Build_WhenTimerPresetIsLongerThanACounterHolds_ReportsPresetTooLongAndNoModel()
    {
        var scheme = BindScheme(Header + """
            inputs A : bool; end
            outputs X : bool; end
            logic
              X := TON(A, T#100000d);
            end
            """);

        var built = ModelBuilder.Build(scheme);

        Assert.Null(built.Model);
        var error = Assert.Single(built.Diagnostics);
        Assert.Equal(ModelCodes.PresetTooLong, error.Code);
        Assert.Equal(Severity.Error, error.Severity);
        Assert.Equal((7, 15), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Build_WhenPresetIsRounded_RecordsTheRoundingWithoutADiagnostic()
    {
        var built = ModelBuilder.Build(BindScheme(Header + """
            inputs A : bool; end
            outputs X : bool; end
            logic X := TON(A, T#25ms); end
            """));

        Assert.Empty(built.Diagnostics);
        var rounding = Assert.Single(built.Model!.Roundings);
        Assert.Equal(new Fractions.Fraction(25, 2), rounding.ExactScans);
        Assert.Equal(13, rounding.Scans);
        Assert.Equal((6, 19), (rounding.Span.Line, rounding.Span.Column));
    }

    [Theory]
    [InlineData("qm7-close-trip.lpl")]
    [InlineData("qm9-pumping.lpl")]
    [InlineData("qm9-corrected.lpl")]
    public void Build_WhenExampleScheme_BuildsAConsistentModelWithoutDiagnostics(string fileName)
    {
        var path = Directory.GetFiles(RepositoryRoot(), fileName, SearchOption.AllDirectories).Single(p => p.Contains("examples", StringComparison.Ordinal));
        var front = FrontEnd.Load(path);
        Assert.False(front.HasErrors, Describe(front.Diagnostics));

        var built = ModelBuilder.Build(front.Scheme!);

        Assert.Empty(built.Diagnostics);
        var model = built.Model!;
        Assert.Equal(front.Scheme!.Requirements.Count, model.Properties.Count);
        Assert.Equal(front.Scheme.Assumptions.Count, model.Assumptions.Count);
    }

    [Fact]
    public void Build_WhenQuarterCycleExample_HasNoRoundings()
    {
        var path = Directory.GetFiles(RepositoryRoot(), "qm7-close-trip.lpl", SearchOption.AllDirectories).First();

        var model = ModelBuilder.Build(FrontEnd.Load(path).Scheme!).Model!;

        // Every preset is a multiple of 25 ms, a whole number of quarter cycles at 60 Hz.
        Assert.Empty(model.Roundings);
        Assert.Equal(120, Assert.IsType<TimerStep>(model.WriterOf("CLOSE_FAIL")).PresetScans);
    }

    /// <summary>The folder holding LogicProof.sln, found above the test assembly or, with an outside artifacts path, above this source file.</summary>
    internal static string RepositoryRoot([CallerFilePath] string sourceFile = "")
    {
        foreach (var start in new[] { AppContext.BaseDirectory, Path.GetDirectoryName(sourceFile) ?? string.Empty })
        {
            for (var directory = new DirectoryInfo(start); directory is not null; directory = directory.Parent)
            {
                if (File.Exists(Path.Combine(directory.FullName, "LogicProof.sln")))
                {
                    return directory.FullName;
                }
            }
        }

        throw new InvalidOperationException("LogicProof.sln not found above the test assembly or its sources");
    }
}
