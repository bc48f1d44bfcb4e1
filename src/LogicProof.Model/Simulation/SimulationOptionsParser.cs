using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Traces;

namespace LogicProof.Model.Simulation;

/// <summary>
/// Resolves the text of a simulation run's options against a model: <c>--show NAME,...</c> (any cell, hidden
/// ones included, by name), <c>--powerup NAME=TRUE|FALSE,...</c> (a latch of unknown power-up, by the name of the
/// cell it keeps or of its memory) and <c>--until MS</c>. Names compare ordinally, ignoring case; every problem
/// is a diagnostic (codes in <see cref="TraceCodes"/>).
/// </summary>
public static class SimulationOptionsParser
{
    public static (SimulationOptions? Options, IReadOnlyList<Diagnostic> Diagnostics) Parse(
        ScanModel model,
        IEnumerable<string> show,
        IEnumerable<string> powerUps,
        string? until)
    {
        ArgumentNullException.ThrowIfNull(model);
        var diagnostics = new DiagnosticBag();
        var shown = ResolveShown(model, show, diagnostics);
        var unknown = ResolvePowerUps(model, powerUps, diagnostics);
        var untilMs = ResolveUntil(until, diagnostics);
        return diagnostics.HasErrors
            ? (null, diagnostics.ToList())
            : (new SimulationOptions(shown, unknown, untilMs), diagnostics.ToList());
    }

    /// <summary>The latch name a user types for a slot in <c>--powerup</c>: the name of the cell it keeps.</summary>
    public static string PowerUpName(ScanModel model, StateSlot slot) => model.Cells[slot.Cell].Name;

    private static List<int> ResolveShown(ScanModel model, IEnumerable<string> show, DiagnosticBag diagnostics)
    {
        var cells = new List<int>();
        foreach (var name in Items(show))
        {
            var cell = model.Cells.FirstOrDefault(c => c.Name.Equals(name, StringComparison.OrdinalIgnoreCase));
            if (cell is null)
            {
                diagnostics.Error(TraceCodes.UnknownShowName, $"--show: '{name}' is not a name in scheme '{model.Name}'.", SourceSpan.None);
            }
            else
            {
                cells.Add(cell.Index);
            }
        }

        return cells;
    }

    private static Dictionary<int, bool> ResolvePowerUps(ScanModel model, IEnumerable<string> powerUps, DiagnosticBag diagnostics)
    {
        var values = new Dictionary<int, bool>();
        var unknownSlots = model.StateSlots.Where(slot => slot.PowerUp is UnknownPowerUp).ToList();
        foreach (var item in Items(powerUps))
        {
            var equals = item.IndexOf('=', StringComparison.Ordinal);
            var name = equals < 0 ? item : item[..equals].Trim();
            var valueText = equals < 0 ? string.Empty : item[(equals + 1)..].Trim();
            var value = InputTraceReader.ParseBool(valueText);
            if (name.Length == 0 || value is null)
            {
                diagnostics.Error(TraceCodes.BadPowerUp, $"--powerup: '{item}' is not NAME=TRUE or NAME=FALSE.", SourceSpan.None);
                continue;
            }

            var matching = unknownSlots
                .Where(slot => slot.Name.Equals(name, StringComparison.OrdinalIgnoreCase)
                    || PowerUpName(model, slot).Equals(name, StringComparison.OrdinalIgnoreCase))
                .ToList();
            if (matching.Count == 0)
            {
                var choices = unknownSlots.Count == 0
                    ? "the scheme has none"
                    : "they are: " + string.Join(", ", unknownSlots.Select(slot => PowerUpName(model, slot)).Distinct(StringComparer.OrdinalIgnoreCase));
                diagnostics.Error(TraceCodes.BadPowerUp, $"--powerup: '{name}' is not a latch of unknown power-up ({choices}).", SourceSpan.None);
                continue;
            }

            foreach (var slot in matching)
            {
                values[slot.Index] = value.Value;
            }
        }

        return values;
    }

    private static Fraction? ResolveUntil(string? until, DiagnosticBag diagnostics)
    {
        if (until is null)
        {
            return null;
        }

        if (!ExactNumberText.TryParse(until.Trim(), out var value)
            || value.CompareTo(Fraction.Zero) <= 0
            || value.CompareTo(InputTrace.MaxTimeMs) > 0)
        {
            diagnostics.Error(
                TraceCodes.BadUntil,
                $"--until: '{until}' is not a run length in ms: use a positive exact decimal such as 1000 or 2.5 (at most {ExactNumberText.FormatExact(InputTrace.MaxTimeMs)}).",
                SourceSpan.None);
            return null;
        }

        return value;
    }

    private static IEnumerable<string> Items(IEnumerable<string> texts) =>
        texts.SelectMany(text => text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries));
}
