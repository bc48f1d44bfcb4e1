using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language;
using LogicProof.Model.Lowering;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;
using LogicProof.Model.StaticChecks;
using LogicProof.Proof.Analysis;
using LogicProof.Proof.Orchestration;
using LogicProof.Proof.Results;
using LogicProof.Reports.Check;
using ReportNotApplicable = LogicProof.Reports.Check.NotApplicableRule;

namespace LogicProof.Cli.Checking;

/// <summary>
/// The whole check of one file, in the order the layers require: read and bind; static checks on the scheme as
/// written; roles, breaker model and rules; the scan model with the rules as properties; the constant-equation
/// check; the proofs (every violation replayed in the simulator by the portfolio); the power-up check for each
/// violation that started a latch of unknown power-up value. The result is a report, never printed here.
/// </summary>
public sealed class SchemeChecker(CheckSettings settings, PortfolioChecker portfolio)
{
    public async Task<CheckedScheme> CheckAsync(string path, CancellationToken cancellationToken)
    {
        var front = FrontEnd.Load(path);
        var diagnostics = new List<Diagnostic>(front.Diagnostics);
        if (front.Scheme is not { } scheme)
        {
            return Unmodelled(path, front.Source, diagnostics);
        }

        diagnostics.AddRange(StaticChecker.Check(scheme));
        var setup = RuleSetup.Prepare(scheme, settings.Rules);
        diagnostics.AddRange(setup.Diagnostics);
        if (setup.ModelScheme is not { } modelScheme)
        {
            return Unmodelled(path, front.Source, diagnostics);
        }

        var built = ModelBuilder.Build(modelScheme, setup.ExtraProperties);
        diagnostics.AddRange(built.Diagnostics);
        if (built.Model is not { } model || diagnostics.Exists(d => d.IsError))
        {
            return Unmodelled(path, front.Source, diagnostics);
        }

        var notApplicable = setup.NotApplicable
            .Select(rule => new ReportNotApplicable(rule.Rule.Id, rule.MissingRoles) { Statement = rule.Reason })
            .ToList();
        if (settings.StaticOnly)
        {
            var staticReport = CheckReportBuilder.ForFile(path, model, diagnostics, [], notApplicable, setup.BreakerModelled);
            return new CheckedScheme(staticReport, front.Source, model);
        }

        if (settings.ConstantChecks)
        {
            diagnostics.AddRange(ConstantEquationChecker.Check(model, cancellationToken: cancellationToken));
        }

        var results = await portfolio.CheckAsync(model, settings.Proof, cancellationToken).ConfigureAwait(false);
        var notes = await PowerUpNotesAsync(model, results, cancellationToken).ConfigureAwait(false);
        var report = CheckReportBuilder.ForFile(path, model, diagnostics, results, notApplicable, setup.BreakerModelled);
        return new CheckedScheme(report with { PowerUpNotes = notes }, front.Source, model);
    }

    private async Task<IReadOnlyList<PowerUpNote>> PowerUpNotesAsync(
        ScanModel model, IReadOnlyList<PropertyResult> results, CancellationToken cancellationToken)
    {
        var notes = new List<PowerUpNote>();
        foreach (var result in results.Where(r => r.Verdict is Violated))
        {
            var sensitivity = await PowerUpSensitivity.AnalyzeAsync(model, result, portfolio, settings.Proof, cancellationToken)
                .ConfigureAwait(false);
            foreach (var latch in sensitivity?.Latches ?? [])
            {
                if (latch.BreakingValue is { } breaking)
                {
                    notes.Add(new PowerUpNote(result.Property.Name, latch.Latch, string.Join(", ", latch.Memories), breaking));
                }
            }
        }

        return notes;
    }

    private static CheckedScheme Unmodelled(string path, SourceText source, List<Diagnostic> diagnostics) =>
        new(CheckReportBuilder.ForFile(path, null, diagnostics, []), source, null);
}
