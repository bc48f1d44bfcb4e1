using System.CommandLine;
using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Core.Threading;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Simulation;
using LogicProof.Model.Traces;
using LogicProof.Reports.Simulation;

namespace LogicProof.Cli.Commands;

/// <summary>
/// The <c>simulate</c> command: runs a scheme scan by scan over an input trace (CSV, format documented on
/// <see cref="InputTraceReader"/>) and prints every scan, or only the scans where something changed, as a text
/// table, CSV or JSON. Diagnostics go to the error stream; exit 3 on any error, 0 otherwise.
/// </summary>
public static class SimulateCommand
{
    private const string TextFormat = "text";
    private const string CsvFormat = "csv";
    private const string JsonFormat = "json";

    public static Command Create()
    {
        var file = new Argument<string>("FILE") { Description = "The scheme (.lpl) to simulate." };
        var inputs = new Option<string>("--inputs")
        {
            Description = "Input trace (CSV): time_ms, then one column per input; see the README for the format.",
            HelpName = "TRACE.csv",
            Required = true,
        };
        var format = new Option<string>("--format")
        {
            Description = $"Output format: {TextFormat} (default), {CsvFormat} or {JsonFormat}.",
            HelpName = "FORMAT",
            DefaultValueFactory = _ => TextFormat,
        };
        var changesOnly = new Option<bool>("--changes-only") { Description = "Print scan 0 and only the scans where a printed value changed." };
        var show = new Option<string[]>("--show")
        {
            Description = "Also print these cells (locals, hidden function-block outputs); repeatable.",
            HelpName = "NAME,...",
        };
        var powerUp = new Option<string[]>("--powerup")
        {
            Description = "Power-up value of latches without a declared init (unset ones start FALSE, with a warning); repeatable.",
            HelpName = "NAME=TRUE|FALSE,...",
        };
        var until = new Option<string>("--until")
        {
            Description = "Run the scans that start before this time, in ms (overrides the trace's END row).",
            HelpName = "MS",
        };

        var command = new Command("simulate", "Run a scheme scan by scan over an input trace and print inputs, outputs and chosen cells.");
        command.Arguments.Add(file);
        command.Options.Add(inputs);
        command.Options.Add(format);
        command.Options.Add(changesOnly);
        command.Options.Add(show);
        command.Options.Add(powerUp);
        command.Options.Add(until);
        command.SetAction(parseResult =>
        {
            var request = new SimulateRequest(
                parseResult.GetValue(file)!,
                parseResult.GetValue(inputs)!,
                parseResult.GetValue(format) ?? TextFormat,
                parseResult.GetValue(changesOnly),
                parseResult.GetValue(show) ?? [],
                parseResult.GetValue(powerUp) ?? [],
                parseResult.GetValue(until));
            var output = parseResult.InvocationConfiguration.Output;
            var error = parseResult.InvocationConfiguration.Error;
            return LargeStack.Run(() => Execute(request, output, error));
        });
        return command;
    }

    private static int Execute(SimulateRequest request, TextWriter output, TextWriter error)
    {
        var formatName = request.Format.Trim().ToLowerInvariant();
        if (formatName is not (TextFormat or CsvFormat or JsonFormat))
        {
            Report(error, new Diagnostic(TraceCodes.BadOption, Severity.Error, $"--format: '{request.Format}' is not {TextFormat}, {CsvFormat} or {JsonFormat}.", SourceSpan.None), null);
            return ExitCodes.InputError;
        }

        var front = FrontEnd.Load(request.SchemePath);
        ReportAll(error, front.Diagnostics, front.Source);
        if (front.Scheme is null)
        {
            return ExitCodes.InputError;
        }

        var built = ModelBuilder.Build(front.Scheme);
        ReportAll(error, built.Diagnostics, front.Source);
        if (built.Model is not { } model)
        {
            return ExitCodes.InputError;
        }

        var (options, optionDiagnostics) = SimulationOptionsParser.Parse(model, request.Show, request.PowerUps, request.Until);
        ReportAll(error, optionDiagnostics, null);
        var (traceResult, traceSource) = InputTraceReader.ReadFile(request.TracePath, model);
        ReportAll(error, traceResult.Diagnostics, traceSource);
        if (options is null || traceResult.Trace is not { } trace)
        {
            return ExitCodes.InputError;
        }

        var simulator = ScanSimulator.Compile(model);
        var powerUp = simulator.PowerUpStateDefaultingUnknownToFalse(options.UnknownPowerUps);
        foreach (var slot in powerUp.DefaultedToFalse)
        {
            var name = SimulationOptionsParser.PowerUpName(model, slot);
            Report(error, new Diagnostic(
                TraceCodes.PowerUpDefaulted,
                Severity.Warning,
                model.Cells[slot.Cell].IsRetained
                    ? $"latch '{name}' is retained: its value before the restart is not in the trace; simulated from FALSE (choose with --powerup {name}=TRUE or {name}=FALSE)."
                    : $"latch '{name}' has no declared power-up value; simulated from FALSE (choose with --powerup {name}=TRUE or {name}=FALSE).",
                model.Cells[slot.Cell].Span), front.Source);
        }

        var scanCount = trace.ScanCount(options.UntilMs);
        if (scanCount > InputTrace.MaxScans)
        {
            Report(error, new Diagnostic(
                TraceCodes.RunTooLong,
                Severity.Error,
                $"the run would take {scanCount.ToString(CultureInfo.InvariantCulture)} scans, more than the limit of {InputTrace.MaxScans.ToString(CultureInfo.InvariantCulture)}; check the END row or --until (times are in ms).",
                SourceSpan.None), null);
            return ExitCodes.InputError;
        }

        var columns = SimulationRunner.DefaultColumns(model, options.ShownCells);
        var rows = SimulationRunner.Rows(simulator, powerUp.State, trace.InputsPerScan(scanCount), columns, request.ChangesOnly);
        var run = new SimulationRun(model.Name, model.Timing, scanCount, request.ChangesOnly, columns, rows);
        using (var buffered = new ChunkedWriter(output))
        {
            switch (formatName)
            {
                case CsvFormat:
                    SimulationCsvRenderer.Render(run, buffered);
                    break;
                case JsonFormat:
                    SimulationJsonRenderer.Render(run, buffered);
                    break;
                default:
                    SimulationTextRenderer.Render(run, buffered);
                    break;
            }
        }

        return ExitCodes.Success;
    }

    private static void ReportAll(TextWriter error, IEnumerable<Diagnostic> diagnostics, SourceText? source)
    {
        foreach (var diagnostic in diagnostics.Where(d => d.Severity >= Severity.Warning))
        {
            Report(error, diagnostic, source);
        }
    }

    private static void Report(TextWriter error, Diagnostic diagnostic, SourceText? source) =>
        error.WriteLine(DiagnosticFormatter.Format(diagnostic, source));

    /// <summary>
    /// Collects small writes and passes them on in blocks: the console writer flushes on every write, which for a
    /// long run would mean a system call per cell. Disposing flushes the rest (the inner writer stays open).
    /// </summary>
    private sealed class ChunkedWriter(TextWriter inner) : TextWriter
    {
        private const int BlockLength = 64 * 1024;
        private readonly System.Text.StringBuilder _pending = new(BlockLength + 1024);

        public override System.Text.Encoding Encoding => inner.Encoding;

        public override void Write(char value)
        {
            _pending.Append(value);
            FlushIfFull();
        }

        public override void Write(string? value)
        {
            _pending.Append(value);
            FlushIfFull();
        }

        public override void Write(char[] buffer, int index, int count)
        {
            _pending.Append(buffer, index, count);
            FlushIfFull();
        }

        public override void Flush()
        {
            inner.Write(_pending.ToString());
            _pending.Clear();
            inner.Flush();
        }

        protected override void Dispose(bool disposing)
        {
            if (disposing)
            {
                Flush();
            }

            base.Dispose(disposing);
        }

        private void FlushIfFull()
        {
            if (_pending.Length >= BlockLength)
            {
                Flush();
            }
        }
    }

    private sealed record SimulateRequest(
        string SchemePath,
        string TracePath,
        string Format,
        bool ChangesOnly,
        IReadOnlyList<string> Show,
        IReadOnlyList<string> PowerUps,
        string? Until);
}
