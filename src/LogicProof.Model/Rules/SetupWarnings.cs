using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Model.Plant;
using LogicProof.Model.Simulation;
using LogicProof.Model.Timing;

namespace LogicProof.Model.Rules;

/// <summary>
/// Warnings on the roles and the breaker model that need no proof: settings that disagree with the modelled breaker,
/// and a lockout that comes up operated.
/// </summary>
internal static class SetupWarnings
{
    /// <summary>
    /// The close-fail time must be longer than the longest closing time of the breaker model, or a healthy breaker
    /// at the slow end of its range is called a close failure and its close is cut off (common practice: the
    /// close-fail timer is set with a margin above the breaker's rated closing time).
    /// </summary>
    public static void CheckCloseFailTime(BoundScheme scheme, RoleBindings roles, BreakerModelSettings? breaker, DiagnosticBag diagnostics)
    {
        if (breaker is null || roles.Find(RoleNames.CloseFailTime) is not { Duration: { } closeFail } role)
        {
            return;
        }

        var frequency = scheme.Syntax.FrequencyHz;
        var closeFailMs = DurationConverter.ToMilliseconds(closeFail, frequency);
        var closingMs = DurationConverter.ToMilliseconds(breaker.ClosingTime.High, frequency);
        if (closeFailMs > closingMs)
        {
            return;
        }

        diagnostics.Add(new Diagnostic(
            RuleCodes.CloseFailNotAboveClosingTime,
            Severity.Warning,
            $"close_fail_time {role.FormulaText} ({ExactNumberText.FormatForDisplay(closeFailMs)} ms) is not longer than the longest closing time of the breaker model, "
            + $"{breaker.ClosingTime.HighText} ({ExactNumberText.FormatForDisplay(closingMs)} ms): a healthy breaker closing slowly would be called a close failure; "
            + "set the close-fail time above the longest closing time with a margin",
            role.Span)
        {
            Related = [new RelatedLocation("the closing time of the breaker model", breaker.ClosingTime.Span)],
        });
    }

    /// <summary>
    /// An 86 lockout relay trips its breaker and holds it open (IEEE C37.2, device 86, from memory); one declared
    /// init TRUE comes up operated after every relay restart and so trips a breaker that was in service. A
    /// non-volatile lockout keeps the state it had before the restart instead: init retained.
    /// </summary>
    public static void CheckLockoutPowerUp(BoundScheme scheme, RoleBindings roles, DiagnosticBag diagnostics)
    {
        // Without a trip output the lockout trips nothing the checker knows of (it still blocks closes, which is safe).
        if (roles.Find(RoleNames.Lockout) is not { } lockout || !roles.IsBound(RoleNames.TripOutput))
        {
            return;
        }

        foreach (var signal in lockout.Signals)
        {
            if (scheme.Symbols.TryGetValue(signal.Name, out var symbol) && symbol.PowerUp is BoundBoolConstant { Value: true })
            {
                diagnostics.Add(new Diagnostic(
                    RuleCodes.LockoutOperatedAtPowerUp,
                    Severity.Warning,
                    $"the lockout '{symbol.Name}' is declared init TRUE: it comes up operated after every relay restart and trips a breaker that was in service; "
                    + "declare it init retained (a non-volatile lockout keeps the state it had before the restart) or init FALSE",
                    symbol.DeclarationSpan)
                {
                    Related = [new RelatedLocation("bound as the lockout here", lockout.Span)],
                });
            }
        }
    }
}
