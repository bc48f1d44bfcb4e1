using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>
/// Declares every input, setting, local and output (in source order, so a duplicate points back at the first
/// declaration) and checks each declaration on its own: types allowed, ranges, setting values and init values.
/// </summary>
internal sealed class DeclarationBinder(DiagnosticBag diagnostics)
{
    private readonly Dictionary<string, Symbol> _symbols = new(StringComparer.OrdinalIgnoreCase);

    public Dictionary<string, Symbol> Declare(SchemeSyntax scheme)
    {
        var declarations = new List<(int Offset, Func<Symbol> Make)>();
        declarations.AddRange(scheme.Inputs.Select(i => (i.Span.Offset, (Func<Symbol>)(() => Input(i)))));
        declarations.AddRange(scheme.Settings.Select(s => (s.Span.Offset, (Func<Symbol>)(() => Setting(s)))));
        declarations.AddRange(scheme.Variables.Select(v => (v.Span.Offset, (Func<Symbol>)(() => Variable(v)))));
        foreach (var (_, make) in declarations.OrderBy(d => d.Offset))
        {
            Add(make());
        }

        return _symbols;
    }

    private void Add(Symbol symbol)
    {
        if (BuiltinCallables.IsBuiltin(symbol.Name))
        {
            diagnostics.Error(
                LanguageCodes.ReservedName,
                $"'{symbol.Name}' is the name of {BuiltinCallables.KindOf(symbol.Name)}; choose another name",
                symbol.DeclarationSpan);
        }

        if (_symbols.TryGetValue(symbol.Name, out var first))
        {
            diagnostics.Error(
                LanguageCodes.DuplicateName,
                $"'{symbol.Name}' is already declared (names are compared without regard to letter case)",
                symbol.DeclarationSpan,
                new RelatedLocation($"the first declaration of '{first.Name}'", first.DeclarationSpan));
            return;
        }

        _symbols.Add(symbol.Name, symbol);
    }

    private Symbol Input(InputDeclarationSyntax input)
    {
        RejectTime(input.Type, "an input", input.NameSpan);
        if (input.Range is { } range)
        {
            if (input.Type != ValueType.Real)
            {
                diagnostics.Error(
                    LanguageCodes.RangeNotAllowed,
                    $"a range is allowed only on a real input; '{input.Name}' is {TypeText.Of(input.Type)}",
                    range.Span);
            }
            else if (range.Low > range.High)
            {
                diagnostics.Error(
                    LanguageCodes.RangeEmpty,
                    $"the range of '{input.Name}' is empty: its low end is above its high end",
                    range.Span);
            }
        }

        return new Symbol(input.Name, SymbolKind.Input, input.Type, input.NameSpan, input.Description) { Range = input.Range };
    }

    private Symbol Setting(SettingDeclarationSyntax setting)
    {
        var value = ConstantOf(setting.Value, setting.Type);
        if (value is null)
        {
            diagnostics.Error(
                LanguageCodes.SettingValueType,
                $"setting '{setting.Name}' is {TypeText.Of(setting.Type)} but its value is {TypeText.Of(TypeOf(setting.Value))}",
                setting.Value.Span);
        }

        return new Symbol(setting.Name, SymbolKind.Setting, setting.Type, setting.NameSpan, setting.Description)
        {
            SettingValue = value is null ? null : value with { SettingName = setting.Name },
        };
    }

    private Symbol Variable(VariableDeclarationSyntax variable)
    {
        var kind = variable.Kind == VariableKind.Local ? SymbolKind.Local : SymbolKind.Output;
        RejectTime(variable.Type, kind == SymbolKind.Local ? "a local" : "an output", variable.NameSpan);
        BoundConstant? powerUp = null;
        if (variable.Initial is { } initial)
        {
            powerUp = ConstantOf(initial, variable.Type);
            if (powerUp is null && variable.Type != ValueType.Time)
            {
                diagnostics.Error(
                    LanguageCodes.InitValueType,
                    $"'{variable.Name}' is {TypeText.Of(variable.Type)} but its init value is {TypeText.Of(TypeOf(initial))}",
                    initial.Span);
            }
        }

        if (variable.Retained && variable.Type != ValueType.Bool)
        {
            diagnostics.Error(
                LanguageCodes.RetainedNeedsBool,
                $"'{variable.Name}' is {TypeText.Of(variable.Type)}; init retained is for bool memories (a lockout, a latch), whose retained value the checker leaves open",
                variable.Span);
        }

        return new Symbol(variable.Name, kind, variable.Type, variable.NameSpan, variable.Description) { PowerUp = powerUp, Retained = variable.Retained };
    }

    private void RejectTime(ValueType type, string what, SourceSpan span)
    {
        if (type == ValueType.Time)
        {
            diagnostics.Error(
                LanguageCodes.TimeTypeNotAllowed,
                $"{what} cannot be of type time; only settings can hold durations (use a setting for a timer preset)",
                span);
        }
    }

    /// <summary>The literal as a constant of <paramref name="type"/>, or null when it is of another type.</summary>
    private static BoundConstant? ConstantOf(ExpressionSyntax literal, ValueType type) => (literal, type) switch
    {
        (BoolLiteralSyntax b, ValueType.Bool) => new BoundBoolConstant(b.Value, b.Span),
        (NumberLiteralSyntax n, ValueType.Real) => new BoundRealConstant(n.Value, n.Span),
        (DurationLiteralSyntax d, ValueType.Time) => new BoundDurationConstant(d.Duration, d.Span),
        _ => null,
    };

    private static ValueType TypeOf(ExpressionSyntax literal) => literal switch
    {
        BoolLiteralSyntax => ValueType.Bool,
        NumberLiteralSyntax => ValueType.Real,
        _ => ValueType.Time,
    };
}
