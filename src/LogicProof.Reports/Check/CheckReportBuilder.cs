using LogicProof.Core.Diagnostics;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Reports.Check;

/// <summary>
/// Builds a <see cref="CheckReport"/> from what the checker produced: per file, the model that was checked, its
/// static diagnostics, the proof results and the rules that did not apply; then the run summary over all files.
/// The model is read here, once, so that the renderers need nothing but the report.
/// </summary>
public static class CheckReportBuilder
{
    /// <summary>
    /// The report of one file. <paramref name="model"/> is null when the file could not be modelled; then there
    /// must be no results. Power-up notes are taken from the counterexamples.
    /// </summary>
    public static FileCheckReport ForFile(
        string path,
        ScanModel? model,
        IEnumerable<Diagnostic> diagnostics,
        IEnumerable<PropertyResult> results,
        IEnumerable<NotApplicableRule>? notApplicableRules = null,
        bool breakerModelled = false)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(diagnostics);
        ArgumentNullException.ThrowIfNull(results);
        var resultList = results.ToList();
        if (model is null && resultList.Count > 0)
        {
            throw new ArgumentException("proof results need the model they were checked on.", nameof(results));
        }

        var properties = resultList.Select(result => ForProperty(model!, result)).ToList();
        return new FileCheckReport(path, model?.Name, model?.Timing, [.. diagnostics], properties)
        {
            NotApplicableRules = [.. notApplicableRules ?? []],
            PowerUpNotes = [.. properties.SelectMany(property => property.Counterexample?.PowerUp ?? [])],
            BreakerModelled = breakerModelled,
        };
    }

    public static PropertyReport ForProperty(ScanModel model, PropertyResult result)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(result);
        var property = result.Property;
        return new PropertyReport(property.Name, property.Origin, property.Statement, property.Span, result.Verdict, result.Elapsed)
        {
            Counterexample = result.Verdict is Violated violated ? ViewOf(model, property, violated) : null,
        };
    }

    /// <summary>The columns of a counterexample and the latches it starts at a chosen power-up value.</summary>
    public static CounterexampleView ViewOf(ScanModel model, ModelProperty property, Violated violated)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(property);
        ArgumentNullException.ThrowIfNull(violated);
        var trace = violated.Trace;
        var first = trace.Steps.Count > 0 ? trace.Steps[0] : null;
        var signals = new List<TraceSignal>();
        foreach (var input in first?.Inputs ?? [])
        {
            signals.Add(new TraceSignal(input.Name, TraceSignalRole.Input, TypeOf(model, input), input.Index));
        }

        var cells = first?.Cells ?? [];
        var ordered = cells.OrderBy(cell => cell.Index).ToList();
        signals.AddRange(ordered.Where(cell => IsOutput(model, cell) && cell.Index != property.Cell)
            .Select(cell => new TraceSignal(cell.Name, TraceSignalRole.Output, TypeOf(model, cell), cell.Index)));
        signals.AddRange(ordered.Where(cell => !IsOutput(model, cell) && cell.Index != property.Cell)
            .Select(cell => new TraceSignal(cell.Name, TraceSignalRole.Internal, TypeOf(model, cell), cell.Index)));
        signals.AddRange((first?.Memories ?? [])
            .Where(memory => IsTimer(model, memory.Index))
            .OrderBy(memory => memory.Index)
            .Select(memory => new TraceSignal(memory.Name, TraceSignalRole.Timer, TraceSignalType.Counter, memory.Index)));
        var propertyName = cells.FirstOrDefault(cell => cell.Index == property.Cell)?.Name ?? property.Name;
        signals.Add(new TraceSignal(propertyName, TraceSignalRole.Property, TraceSignalType.Bool, property.Cell));

        var powerUp = trace.PowerUp
            .Where(slot => slot.Value is BoolTraceValue)
            .Select(slot => new PowerUpNote(property.Name, LatchName(model, slot), slot.Name, ((BoolTraceValue)slot.Value).Value))
            .ToList();
        return new CounterexampleView(model.Name, property.Name, model.Timing, violated.Engine, signals, trace) { PowerUp = powerUp };
    }

    public static CheckReport ForRun(string toolVersion, string z3Version, IReadOnlyList<FileCheckReport> files, bool internalFailure = false)
    {
        ArgumentNullException.ThrowIfNull(toolVersion);
        ArgumentNullException.ThrowIfNull(z3Version);
        ArgumentNullException.ThrowIfNull(files);
        return new CheckReport(toolVersion, z3Version, files, Summarize(files, internalFailure));
    }

    public static CheckRunSummary Summarize(IReadOnlyList<FileCheckReport> files, bool internalFailure = false)
    {
        ArgumentNullException.ThrowIfNull(files);
        var verdicts = files.SelectMany(file => file.Properties).Select(property => property.Verdict).ToList();
        var diagnostics = files.SelectMany(file => file.Diagnostics).ToList();
        var proved = verdicts.Count(verdict => verdict is Proved);
        var violated = verdicts.Count(verdict => verdict is Violated);
        var inconclusive = verdicts.Count(verdict => verdict is Inconclusive);
        var errors = diagnostics.Count(d => d.Severity == Severity.Error);
        return new CheckRunSummary(
            files.Count,
            proved,
            violated,
            inconclusive,
            files.Sum(file => file.NotApplicableRules.Count),
            errors,
            diagnostics.Count(d => d.Severity == Severity.Warning),
            diagnostics.Count(d => d.Severity == Severity.Info),
            CheckExitCode.Of(internalFailure, errors, violated, inconclusive));
    }

    private static bool IsOutput(ScanModel model, NamedValue cell) =>
        (uint)cell.Index < (uint)model.Cells.Count && model.Cells[cell.Index].IsOutput;

    private static bool IsTimer(ScanModel model, int slot) =>
        (uint)slot < (uint)model.StateSlots.Count && model.StateSlots[slot].Kind == StateSlotKind.TimerCounter;

    private static TraceSignalType TypeOf(ScanModel model, NamedValue value) => value.Value switch
    {
        RealTraceValue => TraceSignalType.Real,
        CounterTraceValue => TraceSignalType.Counter,
        _ when (uint)value.Index < (uint)model.Cells.Count && model.Cells[value.Index].Type == SignalType.Real => TraceSignalType.Real,
        _ => TraceSignalType.Bool,
    };

    /// <summary>The name the simulator's <c>--powerup</c> takes for a slot: the cell it keeps.</summary>
    private static string LatchName(ScanModel model, NamedValue slot) =>
        (uint)slot.Index < (uint)model.StateSlots.Count && (uint)model.StateSlots[slot.Index].Cell < (uint)model.Cells.Count
            ? model.Cells[model.StateSlots[slot.Index].Cell].Name
            : slot.Name;
}
