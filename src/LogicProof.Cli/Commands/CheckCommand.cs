using System.CommandLine;
using System.Reflection;
using LogicProof.Cli.Checking;
using LogicProof.Cli.Output;
using LogicProof.Core.Threading;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;
using LogicProof.Proof.Engines;
using LogicProof.Proof.Invariants;
using LogicProof.Proof.Lemmas;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Solving;
using LogicProof.Reports.Check;

namespace LogicProof.Cli.Commands;

/// <summary>
/// The <c>check</c> command: for each scheme, the static checks, then every applicable built-in rule and every
/// <c>require</c> formula proved or refuted for all input sequences. Diagnostics go to the error stream with the
/// source line; the report goes to the output (or <c>--output</c>). Exit codes: 0 everything proved (or clean, with
/// <c>--static-only</c>), 1 a violation, 2 inconclusive with no violation, 3 input error, 4 internal or solver failure.
/// </summary>
public static class CheckCommand
{
    private static readonly string[] Formats = ["text", "json", "sarif", "junit", "html"];
    private static readonly string[] EngineNames = ["auto", "bmc", "kind", "pdr"];

    public static Command Create()
    {
        var files = new Argument<string[]>("FILE") { Description = "The schemes (.lpl) to check.", Arity = ArgumentArity.OneOrMore };
        var staticOnly = new Option<bool>("--static-only") { Description = "Run the static checks only (no proofs)." };
        var format = new Option<string>("--format")
        {
            Description = "Report format: text (default), json, sarif (SARIF 2.1.0), junit (JUnit XML) or html.",
            HelpName = "FORMAT",
            DefaultValueFactory = _ => "text",
        };
        format.AcceptOnlyFromAmong(Formats);
        var outputFile = new Option<string>("--output") { Description = "Write the report to this file instead of the output stream.", HelpName = "FILE" };
        var engine = new Option<string>("--engine")
        {
            Description = "Proof engine: auto (portfolio of all, first conclusive answer wins), bmc, kind (k-induction) or pdr.",
            HelpName = "ENGINE",
            DefaultValueFactory = _ => "auto",
        };
        engine.AcceptOnlyFromAmong(EngineNames);
        var depth = new Option<int>("--depth")
        {
            Description = "Deepest unrolling, in steps of the encoding (a step may span many scans while only timers run).",
            HelpName = "N",
            DefaultValueFactory = _ => 60,
        };
        var timeLimit = new Option<int>("--time-limit")
        {
            Description = "Time limit per property, in seconds; reaching it gives inconclusive, never a pass.",
            HelpName = "SECONDS",
            DefaultValueFactory = _ => 60,
        };
        var rules = new Option<string[]>("--rules") { Description = "Apply only these built-in rules (ids, comma-separated).", HelpName = "ID,..." };
        var skipRules = new Option<string[]>("--skip-rules") { Description = "Do not apply these built-in rules (ids, comma-separated).", HelpName = "ID,..." };
        var noAcceleration = new Option<bool>("--no-acceleration") { Description = "Let every step of the encoding be exactly one scan (slower; for cross-checking)." };
        var noConstantCheck = new Option<bool>("--no-constant-check") { Description = "Skip the solver search for equations that are constant in every reachable state." };
        var traceOut = new Option<string>("--trace-out") { Description = "Write the first violation as a simulator input trace (CSV).", HelpName = "FILE.csv" };
        var vcdOut = new Option<string>("--vcd-out") { Description = "Write the first violation as a value change dump for waveform viewers.", HelpName = "FILE.vcd" };

        var command = new Command("check", "Check schemes: static checks, then the close-supervision rules and the require formulas for every input sequence.");
        command.Arguments.Add(files);
        foreach (var option in new Option[] { staticOnly, format, outputFile, engine, depth, timeLimit, rules, skipRules, noAcceleration, noConstantCheck, traceOut, vcdOut })
        {
            command.Options.Add(option);
        }

        command.SetAction(parseResult =>
        {
            var error = parseResult.InvocationConfiguration.Error;
            if (parseResult.GetValue(depth) < 1 || parseResult.GetValue(timeLimit) < 1)
            {
                error.WriteLine("error: --depth and --time-limit must be at least 1.");
                return ExitCodes.InputError;
            }

            var settings = new CheckSettings(
                parseResult.GetValue(staticOnly),
                new RuleSelection(SplitIds(parseResult.GetValue(rules)), SplitIds(parseResult.GetValue(skipRules)) ?? []),
                new CheckOptions
                {
                    Engine = EngineOf(parseResult.GetValue(engine)),
                    MaxDepth = parseResult.GetValue(depth),
                    TimeLimitPerProperty = TimeSpan.FromSeconds(parseResult.GetValue(timeLimit)),
                    Accelerate = !parseResult.GetValue(noAcceleration),
                    LemmaSource = InvariantLemmas,
                },
                !parseResult.GetValue(noConstantCheck));
            var request = new CheckRequest(
                parseResult.GetValue(files) ?? [],
                settings,
                FormatOf(parseResult.GetValue(format)),
                parseResult.GetValue(outputFile),
                parseResult.GetValue(traceOut),
                parseResult.GetValue(vcdOut));
            return LargeStack.Run(() => Execute(request, parseResult.InvocationConfiguration.Output, error));
        });
        return command;
    }

    private static int Execute(CheckRequest request, TextWriter output, TextWriter error)
    {
        try
        {
            if (!request.Settings.StaticOnly)
            {
                Z3Runtime.EnsureLoaded();
            }

            var checker = new SchemeChecker(request.Settings, new PortfolioChecker([new BmcEngine(), new KInductionEngine(), new PdrEngine()]));
            var schemes = new List<CheckedScheme>();
            foreach (var path in request.Files)
            {
                var scheme = checker.CheckAsync(path, CancellationToken.None).GetAwaiter().GetResult();
                DiagnosticPrinter.Print(error, scheme.Report.Diagnostics, scheme.Source);
                schemes.Add(scheme);
            }

            var report = CheckReportBuilder.ForRun(ToolVersion(), request.Settings.StaticOnly ? "not used" : Z3Runtime.Version, [.. schemes.Select(s => s.Report)]);
            WriteReport(report, request, output);
            foreach (var line in TraceExports.Write(schemes, request.TraceOut, request.VcdOut))
            {
                error.WriteLine(line);
            }

            return report.Summary.ExitCode;
        }
        catch (SolverUnavailableException ex)
        {
            error.WriteLine($"error: {ex.Message}");
            return ExitCodes.InternalError;
        }
        catch (ReplayMismatchException ex)
        {
            error.WriteLine($"internal error: a counterexample did not replay in the simulator, so it is not shown: {ex.Message}");
            return ExitCodes.InternalError;
        }
        catch (IOException ex)
        {
            error.WriteLine($"error: {ex.Message}");
            return ExitCodes.InputError;
        }
        catch (UnauthorizedAccessException ex)
        {
            error.WriteLine($"error: {ex.Message}");
            return ExitCodes.InputError;
        }
    }

    private static void WriteReport(CheckReport report, CheckRequest request, TextWriter output)
    {
        if (request.OutputFile is null)
        {
            ReportWriter.Write(report, request.Format, output);
            return;
        }

        using (var writer = new StreamWriter(request.OutputFile))
        {
            ReportWriter.Write(report, request.Format, writer);
        }

        output.WriteLine(TextReportRenderer.SummaryLine(report.Summary));
    }

    /// <summary>Invariants proved on each property's cone, given to every engine (they make timer relations inductive).</summary>
    private static IReadOnlyList<Lemma> InvariantLemmas(ScanModel model) => new InvariantGenerator().Generate(model);

    private static string[]? SplitIds(string[]? values) =>
        values is null || values.Length == 0
            ? null
            : [.. values.SelectMany(v => v.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))];

    private static EngineSelection EngineOf(string? name) => name?.ToLowerInvariant() switch
    {
        "bmc" => EngineSelection.Bmc,
        "kind" => EngineSelection.KInduction,
        "pdr" => EngineSelection.Pdr,
        _ => EngineSelection.Auto,
    };

    private static ReportFormat FormatOf(string? name) => name?.ToLowerInvariant() switch
    {
        "json" => ReportFormat.Json,
        "sarif" => ReportFormat.Sarif,
        "junit" => ReportFormat.Junit,
        "html" => ReportFormat.Html,
        _ => ReportFormat.Text,
    };

    private static string ToolVersion() =>
        typeof(CheckCommand).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0]
        ?? typeof(CheckCommand).Assembly.GetName().Version?.ToString(3) ?? "0.0.0";

    private sealed record CheckRequest(
        IReadOnlyList<string> Files,
        CheckSettings Settings,
        ReportFormat Format,
        string? OutputFile,
        string? TraceOut,
        string? VcdOut);
}
