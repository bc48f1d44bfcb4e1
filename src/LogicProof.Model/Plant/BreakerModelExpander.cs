using System.Globalization;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Parsing;
using LogicProof.Language.Syntax;
using LogicProof.Model.Lowering;
using LogicProof.Model.Rules;
using LogicProof.Model.Simulation;
using LogicProof.Model.Timing;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Model.Plant;

/// <summary>
/// Adds the breaker of a <c>breaker_model</c> block to a scheme, syntax to syntax: the inputs bound to
/// breaker_closed (52a) and breaker_open (52b) become locals driven by a breaker written in the language (see
/// <see cref="BreakerProgramWriter"/> for its behaviour), with free inputs for the checker's choices and
/// assumptions for the travel times. Every generated formula is parsed by the language's own parser, its spans
/// moved onto the breaker_model line it comes from, and the whole scheme is bound again by the language's binder.
/// Travel times become whole scans exactly as timer presets do (rounded up; rounding is reported).
/// The roles must have been bound against the scheme as written (<see cref="RoleBinder"/>).
/// </summary>
public static class BreakerModelExpander
{
    private const string BasePrefix = "BKM";

    public static BreakerModelExpansion Expand(BoundScheme scheme, RoleBindings roles, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(scheme);
        ArgumentNullException.ThrowIfNull(roles);
        ArgumentNullException.ThrowIfNull(diagnostics);
        if (scheme.Syntax.BreakerModel is not { } block)
        {
            return new BreakerModelExpansion(scheme, false, null, null);
        }

        var settings = BreakerModelSettingsReader.Read(scheme, diagnostics);
        var connections = Connect(roles, settings, block.Span, diagnostics);
        if (settings is null || connections is null)
        {
            return new BreakerModelExpansion(null, false, settings, null);
        }

        var program = BreakerProgramWriter.Write(settings, connections, ChoosePrefix(scheme));
        ReportRounding(scheme, settings, diagnostics);
        WarnAboutAssumptionsOnStatus(scheme, program.DrivenStatuses, diagnostics);
        var problems = new DiagnosticBag();
        var syntax = AddToScheme(scheme.Syntax, program, problems);
        var bound = syntax is null ? null : SchemeBinder.Bind(syntax, problems);
        if (bound is null || problems.HasErrors)
        {
            diagnostics.AddRange(problems);
            diagnostics.Error(RuleCodes.BreakerProgramInvalid, "internal error: the breaker model could not be added to this scheme (see the errors above)", block.Span);
            return new BreakerModelExpansion(null, false, settings, program);
        }

        return new BreakerModelExpansion(bound, true, settings, program);
    }

    private static BreakerConnections? Connect(RoleBindings roles, BreakerModelSettings? settings, SourceSpan block, DiagnosticBag diagnostics)
    {
        var ok = true;
        string? Needed(string role, string why)
        {
            if (roles.Find(role) is { Signals: [var signal, ..] })
            {
                return signal.Name;
            }

            diagnostics.Error(RuleCodes.BreakerModelNeedsRole, $"the breaker model needs the role {role} bound in the roles section: {why}", block);
            ok = false;
            return null;
        }

        var close = Needed(RoleNames.CloseOutput, "the breaker closes on it");
        var trip = Needed(RoleNames.TripOutput, "the breaker opens on it");
        var closed = Status(roles, RoleNames.BreakerClosed, diagnostics, ref ok);
        var open = Status(roles, RoleNames.BreakerOpen, diagnostics, ref ok);
        if (roles.Find(RoleNames.BreakerClosed) is null && roles.Find(RoleNames.BreakerOpen) is null)
        {
            diagnostics.Error(
                RuleCodes.BreakerModelNeedsRole,
                "the breaker model drives the breaker status: bind breaker_closed (52a) or breaker_open (52b), or both, to inputs",
                block);
            ok = false;
        }

        if (closed is not null && string.Equals(closed, open, StringComparison.OrdinalIgnoreCase))
        {
            diagnostics.Error(
                RuleCodes.BreakerModelNeedsRole,
                $"breaker_closed and breaker_open both name '{closed}'; the breaker model drives 52a and 52b as two inputs",
                roles.Get(RoleNames.BreakerOpen).Span);
            ok = false;
        }

        string? protection = null;
        if (settings is { CloseIntoFault: true })
        {
            var command = roles.Find(RoleNames.TripCommand)?.Signals.FirstOrDefault();
            var isStatus = command is not null
                           && (string.Equals(command.Name, closed, StringComparison.OrdinalIgnoreCase)
                               || string.Equals(command.Name, open, StringComparison.OrdinalIgnoreCase));
            if (command is not { Kind: SymbolKind.Input } || isStatus)
            {
                diagnostics.Error(
                    RuleCodes.CloseIntoFaultNeedsTripInput,
                    command is null
                        ? "close_into_fault = TRUE needs the role trip_command: its first name is the protection trip that the fault raises"
                        : $"close_into_fault = TRUE needs the first name of trip_command to be an input other than the breaker status (the protection trip); '{command.Name}' is not",
                    settings.CloseIntoFaultDelay?.Span ?? block);
                ok = false;
            }

            protection = command?.Name;
        }

        string? spring = null;
        if (settings is { SpringRechargeTime: { } recharge })
        {
            spring = Status(roles, RoleNames.SpringCharged, diagnostics, ref ok);
            if (roles.Find(RoleNames.SpringCharged) is null)
            {
                diagnostics.Error(
                    RuleCodes.BreakerModelNeedsRole,
                    "spring_recharge_time models the closing spring: bind spring_charged to the spring-charged input, which the model then drives",
                    recharge.Span);
                ok = false;
            }
        }

        return ok ? new BreakerConnections(close!, trip!, closed, open, protection) { SpringStatus = spring } : null;
    }

    private static string? Status(RoleBindings roles, string role, DiagnosticBag diagnostics, ref bool ok)
    {
        if (roles.Find(role) is not { Signals: [var signal, ..] } bound)
        {
            return null;
        }

        if (signal.Kind == SymbolKind.Input)
        {
            return signal.Name;
        }

        diagnostics.Add(new Diagnostic(
            RuleCodes.BreakerStatusNotInput,
            Severity.Error,
            $"{role} '{signal.Name}' is {(signal.Kind == SymbolKind.Output ? "an output" : "a local")}; the breaker model can drive a status input only",
            bound.Span)
        {
            Related = [new RelatedLocation($"'{signal.Name}' is declared here", signal.DeclarationSpan)],
        });
        ok = false;
        return null;
    }

    /// <summary>"BKM_", or "BKM2_", "BKM3_" ... when a name of the scheme already starts with the shorter prefix.</summary>
    private static string ChoosePrefix(BoundScheme scheme)
    {
        for (var n = 1; ; n++)
        {
            var prefix = n == 1 ? BasePrefix + "_" : string.Create(CultureInfo.InvariantCulture, $"{BasePrefix}{n}_");
            if (!scheme.Symbols.Keys.Any(name => name.StartsWith(prefix, StringComparison.OrdinalIgnoreCase)))
            {
                return prefix;
            }
        }
    }

    private static void ReportRounding(BoundScheme scheme, BreakerModelSettings settings, DiagnosticBag diagnostics)
    {
        var timing = ScanTimingBuilder.Build(scheme.Syntax, new DiagnosticBag());
        if (timing is null)
        {
            return;
        }

        var converter = new DurationConverter(timing);
        var ranges = new[]
        {
            (BreakerModelSettingsReader.ClosingTimeKey, settings.ClosingTime),
            (BreakerModelSettingsReader.OpeningTimeKey, settings.OpeningTime),
            (BreakerModelSettingsReader.CloseIntoFaultDelayKey, settings.CloseIntoFaultDelay),
            (BreakerModelSettingsReader.SpringRechargeTimeKey, settings.SpringRechargeTime),
        };
        foreach (var (key, range) in ranges)
        {
            if (range is null)
            {
                continue;
            }

            foreach (var (duration, text) in new[] { (range.Low, range.LowText), (range.High, range.HighText) }.Distinct())
            {
                var rounding = converter.Convert(duration, new DiagnosticBag());
                if (rounding is { WasRounded: true })
                {
                    diagnostics.Warning(
                        RuleCodes.BreakerTimeRounded,
                        string.Create(
                            CultureInfo.InvariantCulture,
                            $"{key} {text} is {ExactNumberText.FormatForDisplay(rounding.ExactScans)} scans of {ExactNumberText.FormatForDisplay(timing.ScanMilliseconds)} ms; the breaker model uses {rounding.Scans} scans (rounded up, as a timer preset is)"),
                        range.Span);
                }
            }
        }
    }

    private static void WarnAboutAssumptionsOnStatus(BoundScheme scheme, IReadOnlyList<string> statuses, DiagnosticBag diagnostics)
    {
        foreach (var assumption in scheme.Assumptions)
        {
            var read = BoundTree.PreOrder(assumption.Formula)
                .OfType<BoundSymbolReference>()
                .FirstOrDefault(reference => statuses.Contains(reference.Symbol.Name, StringComparer.OrdinalIgnoreCase));
            if (read is not null)
            {
                diagnostics.Warning(
                    RuleCodes.AssumptionReadsModelledStatus,
                    $"this assumption reads {read.Symbol.Name}, which the breaker model now drives; an assumption that disagrees with the modelled breaker (for example during travel, when 52a and 52b are both FALSE) silently removes its behaviour from every proof",
                    assumption.Syntax.Span);
            }
        }
    }

    private static SchemeSyntax? AddToScheme(SchemeSyntax scheme, BreakerProgram program, DiagnosticBag diagnostics)
    {
        ExpressionSyntax? Parse(BreakerProgramStatement statement)
        {
            var formula = FormulaReader.Parse("breaker_model", statement.Formula, diagnostics);
            return formula is null ? null : SyntaxSpanRewriter.Remap(formula, statement.Span);
        }

        var first = program.FirstEquations.Select(e => (e, Parse(e))).ToList();
        var last = program.LastEquations.Select(e => (e, Parse(e))).ToList();
        var assumptions = program.Assumptions.Select(a => (a, Parse(a))).ToList();
        if (first.Concat(last).Concat(assumptions).Any(pair => pair.Item2 is null))
        {
            return null;
        }

        var driven = new HashSet<string>(program.DrivenStatuses, StringComparer.OrdinalIgnoreCase);
        var statusLocals = scheme.Inputs
            .Where(input => driven.Contains(input.Name))
            .Select(input => new VariableDeclarationSyntax(
                input.Name, input.NameSpan, VariableKind.Local, ValueType.Bool, null, Describe(input.Description), input.Span));
        var generatedLocals = program.Locals.Select(local => new VariableDeclarationSyntax(
            local.Name, local.Span, VariableKind.Local, ValueType.Bool, new BoolLiteralSyntax(false, local.Span), local.Description, local.Span));
        return scheme with
        {
            Inputs = [.. scheme.Inputs.Where(input => !driven.Contains(input.Name)), .. program.Inputs.Select(input =>
                new InputDeclarationSyntax(input.Name, input.Span, ValueType.Bool, null, input.Description, input.Span))],
            Variables = [.. scheme.Variables, .. statusLocals, .. generatedLocals],
            Equations = [.. first.Select(Equation), .. scheme.Equations, .. last.Select(Equation)],
            Assumptions = [.. scheme.Assumptions, .. assumptions.Select(pair => new AssumptionSyntax(pair.Item1.Name, pair.Item2!, pair.Item1.Span))],
        };
    }

    private static EquationSyntax Equation((BreakerProgramStatement Statement, ExpressionSyntax? Formula) pair) =>
        new(pair.Statement.Name, pair.Statement.Span, pair.Formula!, pair.Statement.Span);

    private static string Describe(string? description) =>
        description is null ? "driven by the breaker model" : description + " (driven by the breaker model)";
}
