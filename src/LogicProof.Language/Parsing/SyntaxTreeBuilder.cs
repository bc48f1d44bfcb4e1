using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Generated;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Parsing;

/// <summary>
/// Parse tree (of a file without syntax errors) to the immutable syntax tree. Sections may repeat; their contents
/// are concatenated in file order. A second breaker_model block, a frequency unit other than Hz and an invalid
/// duration, and a zero frequency or scan interval are reported here; the tree is still built so that names and types can be checked too.
/// </summary>
internal sealed class SyntaxTreeBuilder
{
    /// <summary>The word after <c>init</c> for a non-volatile memory.</summary>
    public const string RetainedWord = "retained";

    private readonly SourceText _source;
    private readonly DiagnosticBag _diagnostics;
    private readonly LiteralReader _literals;
    private readonly ExpressionBuilder _expressions;

    public SyntaxTreeBuilder(SourceText source, DiagnosticBag diagnostics)
    {
        _source = source;
        _diagnostics = diagnostics;
        _literals = new LiteralReader(source, diagnostics);
        _expressions = new ExpressionBuilder(source, _literals);
    }

    public SchemeSyntax Build(LogicProofParser.SchemeContext scheme)
    {
        var header = scheme.header();
        var frequencyUnit = _source.TextOf(header.frequencyUnit);
        if (!string.Equals(frequencyUnit, "Hz", StringComparison.OrdinalIgnoreCase))
        {
            _diagnostics.Error(
                LanguageCodes.FrequencyUnitNotHertz,
                $"the power frequency must be given in Hz, not '{frequencyUnit}'",
                _source.SpanOf(header.frequencyUnit));
        }

        var frequency = _literals.Number(header.frequency);
        if (frequency.IsZero)
        {
            _diagnostics.Error(LanguageCodes.TimingNotPositive, "the power frequency must be above zero", _source.SpanOf(header.frequency));
        }

        var scanInterval = _literals.Duration(header.scanInterval);
        if ((scanInterval.Milliseconds ?? scanInterval.Cycles ?? Fraction.One).IsZero && !_diagnostics.Any(d => d.Span == scanInterval.Span))
        {
            _diagnostics.Error(LanguageCodes.TimingNotPositive, "the scan interval must be above zero", scanInterval.Span);
        }

        var sections = new Sections();
        foreach (var section in scheme.section())
        {
            AddSection(section, sections);
        }

        return new SchemeSyntax(
            _source.TextOf(header.name),
            _literals.Description(header.description()),
            frequency,
            scanInterval,
            sections.Inputs,
            sections.Settings,
            sections.Variables,
            sections.Equations,
            sections.Roles,
            sections.BreakerModel,
            sections.Assumptions,
            sections.Requirements,
            _source.Between(0, _source.Content.Length));
    }

    private void AddSection(LogicProofParser.SectionContext section, Sections into)
    {
        switch (section)
        {
            case LogicProofParser.InputsSectionContext inputs:
                into.Inputs.AddRange(inputs.inputDecl().Select(Input));
                break;
            case LogicProofParser.SettingsSectionContext settings:
                into.Settings.AddRange(settings.settingDecl().Select(Setting));
                break;
            case LogicProofParser.LocalsSectionContext locals:
                into.Variables.AddRange(locals.variableDecl().Select(v => Variable(v, VariableKind.Local)));
                break;
            case LogicProofParser.OutputsSectionContext outputs:
                into.Variables.AddRange(outputs.variableDecl().Select(v => Variable(v, VariableKind.Output)));
                break;
            case LogicProofParser.LogicSectionContext logic:
                into.Equations.AddRange(logic.equation().Select(Equation));
                break;
            case LogicProofParser.RolesSectionContext roles:
                into.Roles.AddRange(roles.roleBinding().Select(Role));
                break;
            case LogicProofParser.BreakerModelSectionContext breaker:
                AddBreakerModel(breaker, into);
                break;
            case LogicProofParser.RequireStatementContext require:
                into.Requirements.Add(new RequirementSyntax(
                    _source.TextOf(require.name), _source.SpanOf(require.name), _expressions.Build(require.expr()), _source.SpanOf(require)));
                break;
            case LogicProofParser.AssumeStatementContext assume:
                into.Assumptions.Add(new AssumptionSyntax(
                    assume.name is null ? null : _source.TextOf(assume.name), _expressions.Build(assume.expr()), _source.SpanOf(assume)));
                break;
            default:
                throw new InvalidOperationException($"unknown section form {section.GetType().Name}");
        }
    }

    private void AddBreakerModel(LogicProofParser.BreakerModelSectionContext breaker, Sections into)
    {
        var span = _source.SpanOf(breaker);
        var model = new BreakerModelSyntax(breaker.plantSetting().Select(PlantSetting).ToList(), span);
        if (into.BreakerModel is { } first)
        {
            var keyword = _source.SpanOf(breaker.BREAKER_MODEL().Symbol);
            _diagnostics.Error(
                LanguageCodes.DuplicateBreakerModel,
                "a scheme has at most one breaker_model block",
                keyword,
                new RelatedLocation("the first breaker_model block", first.Span));
            return;
        }

        into.BreakerModel = model;
    }

    private InputDeclarationSyntax Input(LogicProofParser.InputDeclContext input)
    {
        RangeSyntax? range = null;
        if (input.range() is { } r)
        {
            range = new RangeSyntax(_literals.SignedNumber(r.low).Value, _literals.SignedNumber(r.high).Value, _source.SpanOf(r));
        }

        return new InputDeclarationSyntax(
            _source.TextOf(input.name), _source.SpanOf(input.name), Type(input.typeName()), range, _literals.Description(input.description()), _source.SpanOf(input));
    }

    private SettingDeclarationSyntax Setting(LogicProofParser.SettingDeclContext setting) =>
        new(_source.TextOf(setting.name), _source.SpanOf(setting.name), Type(setting.typeName()), _literals.Literal(setting.value), _literals.Description(setting.description()), _source.SpanOf(setting));

    private VariableDeclarationSyntax Variable(LogicProofParser.VariableDeclContext variable, VariableKind kind)
    {
        if (variable.retained is { } word && !string.Equals(_source.TextOf(word), RetainedWord, StringComparison.OrdinalIgnoreCase))
        {
            _diagnostics.Error(
                LanguageCodes.UnknownInitWord,
                $"init takes TRUE, FALSE, a number or the word {RetainedWord}, not '{_source.TextOf(word)}'",
                _source.SpanOf(word));
        }

        return new(
            _source.TextOf(variable.name),
            _source.SpanOf(variable.name),
            kind,
            Type(variable.typeName()),
            variable.initial is null ? null : _literals.Literal(variable.initial),
            _literals.Description(variable.description()),
            _source.SpanOf(variable))
        {
            Retained = variable.retained is not null,
        };
    }

    private EquationSyntax Equation(LogicProofParser.EquationContext equation) =>
        new(_source.TextOf(equation.target), _source.SpanOf(equation.target), _expressions.Build(equation.expr()), _source.SpanOf(equation));

    private RoleBindingSyntax Role(LogicProofParser.RoleBindingContext role) =>
        new(_source.TextOf(role.role), _source.SpanOf(role.role), role.roleValue().Select(RoleValue).ToList(), _source.SpanOf(role));

    private RoleValueSyntax RoleValue(LogicProofParser.RoleValueContext value)
    {
        var span = _source.SpanOf(value);
        return value switch
        {
            LogicProofParser.NameRoleValueContext name => new NameRoleValueSyntax(_source.TextOf(name.IDENT().Symbol), span),
            LogicProofParser.DurationRoleValueContext duration => new DurationRoleValueSyntax(_literals.Duration(duration.duration()), span),
            LogicProofParser.TrueRoleValueContext => new BoolRoleValueSyntax(true, span),
            LogicProofParser.FalseRoleValueContext => new BoolRoleValueSyntax(false, span),
            _ => throw new InvalidOperationException($"unknown role value form {value.GetType().Name}"),
        };
    }

    private PlantSettingSyntax PlantSetting(LogicProofParser.PlantSettingContext setting)
    {
        var value = setting.plantValue();
        var span = _source.SpanOf(value);
        PlantValueSyntax plantValue = value switch
        {
            LogicProofParser.DurationRangeValueContext range => new DurationRangePlantValueSyntax(_literals.Duration(range.low), _literals.Duration(range.high), span),
            LogicProofParser.SingleDurationValueContext single => new DurationPlantValueSyntax(_literals.Duration(single.duration()), span),
            LogicProofParser.TruePlantValueContext => new BoolPlantValueSyntax(true, span),
            LogicProofParser.FalsePlantValueContext => new BoolPlantValueSyntax(false, span),
            LogicProofParser.NamePlantValueContext name => new NamePlantValueSyntax(_source.TextOf(name.IDENT().Symbol), span),
            _ => throw new InvalidOperationException($"unknown breaker model value form {value.GetType().Name}"),
        };
        return new PlantSettingSyntax(_source.TextOf(setting.key), _source.SpanOf(setting.key), plantValue, _source.SpanOf(setting));
    }

    private static ValueType Type(LogicProofParser.TypeNameContext type) =>
        type.Start.Type switch
        {
            LogicProofParser.BOOL => ValueType.Bool,
            LogicProofParser.REAL => ValueType.Real,
            _ => ValueType.Time,
        };

    private sealed class Sections
    {
        public List<InputDeclarationSyntax> Inputs { get; } = [];

        public List<SettingDeclarationSyntax> Settings { get; } = [];

        public List<VariableDeclarationSyntax> Variables { get; } = [];

        public List<EquationSyntax> Equations { get; } = [];

        public List<RoleBindingSyntax> Roles { get; } = [];

        public BreakerModelSyntax? BreakerModel { get; set; }

        public List<AssumptionSyntax> Assumptions { get; } = [];

        public List<RequirementSyntax> Requirements { get; } = [];
    }
}
