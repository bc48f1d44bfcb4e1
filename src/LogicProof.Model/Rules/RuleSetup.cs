using LogicProof.Core.Diagnostics;
using LogicProof.Core.Threading;
using LogicProof.Language.Binding;
using LogicProof.Model.Plant;

namespace LogicProof.Model.Rules;

/// <summary>
/// The one call <c>check</c> makes for the built-in rules, after the front end has bound the file and before the
/// model is built:
/// <code>
/// var front = FrontEnd.Load(path);                               // exit 3 when front.Scheme is null
/// var lints = StaticChecker.Check(front.Scheme);                 // on the scheme as written
/// var setup = RuleSetup.Prepare(front.Scheme, selection);        // print setup.Diagnostics; exit 3 when HasErrors
/// var built = ModelBuilder.Build(setup.ModelScheme!, setup.ExtraProperties);
/// var results = await checker.CheckAsync(built.Model!, options); // rules are the properties with Origin Rule
/// // for each Violated result: PowerUpSensitivity.AnalyzeAsync(built.Model!, result, checker, options)
/// // report setup.NotApplicable (never as passed) and setup.Breaker.Summary (52a/52b modelled or free)
/// </code>
/// Order inside: the roles are checked against the scheme as written; the breaker model (when the file has one)
/// adds the breaker and binds the scheme again; the rules are then written and bound against that scheme, so they
/// read the modelled 52a/52b. Selection ids are checked even when the file has no roles.
/// </summary>
public static class RuleSetup
{
    public static RuleSetupResult Prepare(BoundScheme scheme, RuleSelection? selection = null)
    {
        ArgumentNullException.ThrowIfNull(scheme);
        return LargeStack.Run(() => PrepareOnCurrentStack(scheme, selection ?? RuleSelection.Every));
    }

    private static RuleSetupResult PrepareOnCurrentStack(BoundScheme scheme, RuleSelection selection)
    {
        var diagnostics = new DiagnosticBag();
        var roles = RoleBinder.Bind(scheme, diagnostics);
        var breaker = BreakerModelExpander.Expand(scheme, roles, diagnostics);
        SetupWarnings.CheckCloseFailTime(scheme, roles, breaker.Settings, diagnostics);
        SetupWarnings.CheckLockoutPowerUp(scheme, roles, diagnostics);
        var rules = breaker.Scheme is { } modelScheme
            ? RuleExpander.Expand(modelScheme, roles, selection, diagnostics)
            : CheckSelectionOnly(selection, diagnostics);
        var usable = diagnostics.HasErrors ? null : breaker.Scheme;
        return new RuleSetupResult(usable, roles, rules, breaker, diagnostics.ToList());
    }

    private static RuleExpansion CheckSelectionOnly(RuleSelection selection, DiagnosticBag diagnostics)
    {
        RuleExpander.CheckSelection(selection, diagnostics);
        return new RuleExpansion([], [], []);
    }
}
