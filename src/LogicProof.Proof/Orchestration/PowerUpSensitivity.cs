using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Orchestration;

/// <summary>
/// The power-up check. A latch (SR, RS or a seal-in loop) without a declared <c>init</c> has no de-energised state,
/// so every property must hold from both of its power-up values; a proved property already does (nothing to add).
/// For a violated one whose counterexample chose such values, each latch of the counterexample is checked again with
/// its power-up value fixed (a copy of the model with <see cref="KnownBoolPowerUp"/> on its memories, the other
/// unknown latches still free): the value the counterexample used is known to break the property, the other value is
/// checked with the same checker and options. The result says which latch and which value breaks the property, and
/// whether the other value proves it.
/// </summary>
public static class PowerUpSensitivity
{
    /// <summary>Null when the result is not a violation, or its counterexample uses no unknown power-up value.</summary>
    public static async Task<PowerUpSensitivityReport?> AnalyzeAsync(
        ScanModel model, PropertyResult result, PortfolioChecker checker, CheckOptions options, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(checker);
        ArgumentNullException.ThrowIfNull(options);
        if (result.Verdict is not Violated violated || violated.Trace.PowerUp.Count == 0)
        {
            return null;
        }

        var latches = new List<PowerUpSensitivityLatch>();
        foreach (var latch in violated.Trace.PowerUp.GroupBy(p => model.StateSlots[p.Index].Cell).OrderBy(g => g.Key))
        {
            var chosen = latch.Select(p => p.Value is BoolTraceValue b && b.Value).ToList();
            var slots = latch.Select(p => p.Index).ToList();
            var whenTrue = await OutcomeAsync(model, result.Property, slots, true, chosen, checker, options, cancellationToken).ConfigureAwait(false);
            var whenFalse = await OutcomeAsync(model, result.Property, slots, false, chosen, checker, options, cancellationToken).ConfigureAwait(false);
            latches.Add(new PowerUpSensitivityLatch(model.Cells[latch.Key].Name, [.. latch.Select(p => p.Name)], whenTrue, whenFalse));
        }

        return new PowerUpSensitivityReport(result.Property.Name, latches);
    }

    /// <summary>A copy of <paramref name="model"/> in which the given memories start at <paramref name="value"/>.</summary>
    public static ScanModel WithPowerUp(ScanModel model, IReadOnlyCollection<int> slots, bool value)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(slots);
        return model with
        {
            StateSlots = [.. model.StateSlots.Select(slot => slots.Contains(slot.Index) ? slot with { PowerUp = new KnownBoolPowerUp(value) } : slot)],
        };
    }

    private static async Task<PowerUpSensitivityOutcome> OutcomeAsync(
        ScanModel model,
        ModelProperty property,
        IReadOnlyList<int> slots,
        bool value,
        IReadOnlyList<bool> chosen,
        PortfolioChecker checker,
        CheckOptions options,
        CancellationToken cancellationToken)
    {
        if (chosen.All(c => c == value))
        {
            // The counterexample itself starts every memory of this latch at this value and breaks the property.
            return PowerUpSensitivityOutcome.Violated;
        }

        var fixedModel = WithPowerUp(model, slots.ToHashSet(), value);
        var result = await checker.CheckPropertyAsync(fixedModel, property, options, cancellationToken).ConfigureAwait(false);
        return result.Verdict switch
        {
            Proved => PowerUpSensitivityOutcome.Proved,
            Violated => PowerUpSensitivityOutcome.Violated,
            _ => PowerUpSensitivityOutcome.Inconclusive,
        };
    }
}
