using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>Calls: function blocks (formal inputs by name or position), functions and past-time operators.</summary>
internal sealed partial class ExpressionBinder
{
    private BoundExpression? BindCall(CallSyntax call, bool inFormula)
    {
        if (BuiltinCallables.FunctionBlocks.TryGetValue(call.Callee, out var block))
        {
            return BindFunctionBlock(call, block.Kind, block.Inputs, inFormula);
        }

        if (BuiltinCallables.Functions.TryGetValue(call.Callee, out var function))
        {
            return BindFunction(call, function, inFormula);
        }

        if (BuiltinCallables.TemporalOperators.TryGetValue(call.Callee, out var temporal))
        {
            return BindTemporal(call, temporal, inFormula);
        }

        var message = symbols.TryGetValue(call.Callee, out var symbol)
            ? $"'{symbol.Name}' is a {symbol.Kind.ToString().ToLowerInvariant()}, not something that can be called"
            : $"'{call.Callee}' is not a known function; the language has {BuiltinCallables.ListAll()}";
        diagnostics.Error(LanguageCodes.UnknownFunction, message, call.CalleeSpan);
        BindLeftovers(call.Arguments, inFormula);
        return null;
    }

    private BoundExpression? BindFunctionBlock(CallSyntax call, FunctionBlockKind kind, string[] inputs, bool inFormula)
    {
        var matched = MatchArguments(call, inputs, inFormula);
        if (matched is null)
        {
            return null;
        }

        var hasPreset = BuiltinCallables.HasPreset(kind);
        var bound = new List<BoundExpression>();
        var failed = false;
        for (var i = 0; i < inputs.Length; i++)
        {
            if (hasPreset && i == BuiltinCallables.PresetIndex)
            {
                continue;
            }

            var input = BindAs(matched[i], ValueType.Bool, inFormula, $"input {inputs[i]} of {call.Callee.ToUpperInvariant()}");
            failed |= input is null;
            if (input is not null)
            {
                bound.Add(input);
            }
        }

        var preset = hasPreset ? BindDuration(matched[BuiltinCallables.PresetIndex], $"the preset PT of {call.Callee.ToUpperInvariant()}") : null;
        failed |= hasPreset && preset is null;
        return failed ? null : new BoundFunctionBlockCall(kind, bound, preset, call.Span);
    }

    private BoundExpression? BindFunction(CallSyntax call, BuiltinFunction function, bool inFormula)
    {
        var name = call.Callee.ToUpperInvariant();
        var arguments = PositionalArguments(call, inFormula);
        if (arguments is null)
        {
            return null;
        }

        // IEC 61131-3 lets MIN and MAX take more than two inputs; the scan model takes two, so nest them for more.
        var expected = function == BuiltinFunction.Abs ? 1 : 2;
        if (arguments.Count != expected)
        {
            diagnostics.Error(
                LanguageCodes.WrongArgumentCount,
                function == BuiltinFunction.Abs
                    ? $"ABS takes one argument, not {arguments.Count}"
                    : $"{name} takes two arguments, not {arguments.Count} (nest calls for more: {name}(a, {name}(b, c)))",
                call.Span);
            BindLeftovers(call.Arguments, inFormula);
            return null;
        }

        var bound = arguments.Select((a, i) => BindAs(a, ValueType.Real, inFormula, $"argument {i + 1} of {name}")).ToList();
        if (bound.Any(b => b is null))
        {
            return null;
        }

        var node = new BoundFunctionCall(function, bound!, call.Span);
        var values = bound.Select(b => ConstantValue(b!)).ToList();
        if (values.Any(v => v is null))
        {
            return node;
        }

        var known = values.Select(v => v!.Value).ToList();
        return Constant(node, function switch
        {
            BuiltinFunction.Abs => known[0].Abs(),
            BuiltinFunction.Min => known.Aggregate((a, b) => a < b ? a : b),
            _ => known.Aggregate((a, b) => a > b ? a : b),
        });
    }

    private BoundExpression? BindTemporal(CallSyntax call, TemporalOperator op, bool inFormula)
    {
        var name = call.Callee.ToUpperInvariant();
        if (!inFormula)
        {
            diagnostics.Error(
                LanguageCodes.TemporalInEquation,
                $"{name} is a past-time operator, allowed only in require and assume formulas",
                call.CalleeSpan);
            BindLeftovers(call.Arguments, inFormula: true);
            return null;
        }

        var arguments = PositionalArguments(call, inFormula);
        if (arguments is null)
        {
            return null;
        }

        var windowed = op is TemporalOperator.Held or TemporalOperator.Within;
        var expected = windowed ? 2 : 1;
        if (arguments.Count != expected)
        {
            diagnostics.Error(
                LanguageCodes.WrongArgumentCount,
                windowed ? $"{name} takes two arguments, a condition and a duration, not {arguments.Count}" : $"{name} takes one argument, not {arguments.Count}",
                call.Span);
            BindLeftovers(call.Arguments, inFormula);
            return null;
        }

        BoundExpression? operand;
        if (op == TemporalOperator.Prev)
        {
            operand = Bind(arguments[0], inFormula);
            if (operand is { Type: ValueType.Time })
            {
                diagnostics.Error(LanguageCodes.TypeMismatch, "the argument of PREV must be bool or real, but this is time", operand.Span);
                operand = null;
            }
        }
        else
        {
            operand = BindAs(arguments[0], ValueType.Bool, inFormula, $"the argument of {name}");
        }

        var window = windowed ? BindDuration(arguments[1], $"the duration of {name}") : null;
        return operand is null || (windowed && window is null) ? null : new BoundTemporal(op, operand, window, call.Span);
    }

    /// <summary>A timer preset or a window: a duration literal or a setting of type time.</summary>
    private BoundDuration? BindDuration(ExpressionSyntax syntax, string role)
    {
        switch (syntax)
        {
            case DurationLiteralSyntax literal:
                return new BoundDuration(literal.Duration, null, literal.Span);
            case NameSyntax name when symbols.TryGetValue(name.Name, out var symbol)
                                      && symbol is { Kind: SymbolKind.Setting, Type: ValueType.Time }:
                return symbol.SettingValue is BoundDurationConstant value ? new BoundDuration(value.Duration, symbol.Name, name.Span) : null;
            case NameSyntax name when !symbols.ContainsKey(name.Name):
                BindName(name); // reports the undefined name
                return null;
            default:
                diagnostics.Error(
                    LanguageCodes.DurationExpected,
                    $"{role} must be a duration literal (such as T#500ms or 30 cyc) or a setting of type time",
                    syntax.Span);
                return null;
        }
    }

    /// <summary>Matches arguments to formal inputs (positional first, then named as in IEC <c>IN := x</c>); null after reporting a problem.</summary>
    private ExpressionSyntax[]? MatchArguments(CallSyntax call, string[] inputs, bool inFormula)
    {
        var name = call.Callee.ToUpperInvariant();
        var matched = new ExpressionSyntax?[inputs.Length];
        var ok = true;
        var sawNamed = false;
        var position = 0;
        foreach (var argument in call.Arguments)
        {
            int index;
            if (argument.Name is null)
            {
                if (sawNamed)
                {
                    diagnostics.Error(LanguageCodes.PositionalAfterNamed, $"a positional argument cannot follow a named one in a call of {name}", argument.Span);
                    ok = false;
                    continue;
                }

                index = position++;
                if (index >= inputs.Length)
                {
                    diagnostics.Error(LanguageCodes.WrongArgumentCount, $"{name} takes {inputs.Length} argument(s) ({string.Join(", ", inputs)}); this one is extra", argument.Span);
                    ok = false;
                    continue;
                }
            }
            else
            {
                sawNamed = true;
                index = Array.FindIndex(inputs, i => string.Equals(i, argument.Name, StringComparison.OrdinalIgnoreCase));
                if (index < 0)
                {
                    diagnostics.Error(LanguageCodes.WrongArgumentName, $"{name} has no input named '{argument.Name}'; its inputs are {string.Join(" and ", inputs)}", argument.Span);
                    ok = false;
                    continue;
                }
            }

            if (matched[index] is not null)
            {
                diagnostics.Error(LanguageCodes.WrongArgumentName, $"input {inputs[index]} of {name} is given twice", argument.Span);
                ok = false;
                continue;
            }

            matched[index] = argument.Value;
        }

        var missing = inputs.Where((_, i) => matched[i] is null).ToList();
        if (ok && missing.Count > 0)
        {
            diagnostics.Error(LanguageCodes.WrongArgumentCount, $"{name} needs input {string.Join(" and ", missing)}", call.Span);
            ok = false;
        }

        if (!ok)
        {
            BindLeftovers(call.Arguments, inFormula);
            return null;
        }

        return matched!;
    }

    /// <summary>Arguments of a function or past-time operator, which take them by position only.</summary>
    private List<ExpressionSyntax>? PositionalArguments(CallSyntax call, bool inFormula)
    {
        var named = call.Arguments.Where(a => a.Name is not null).ToList();
        foreach (var argument in named)
        {
            diagnostics.Error(
                LanguageCodes.WrongArgumentName,
                $"{call.Callee.ToUpperInvariant()} takes its arguments by position; remove '{argument.Name} :='",
                argument.Span);
        }

        if (named.Count > 0)
        {
            BindLeftovers(call.Arguments, inFormula);
            return null;
        }

        return call.Arguments.Select(a => a.Value).ToList();
    }

    /// <summary>Binds arguments of a call that cannot be checked, only to report errors inside them.</summary>
    private void BindLeftovers(IEnumerable<ArgumentSyntax> arguments, bool inFormula)
    {
        foreach (var argument in arguments)
        {
            Bind(argument.Value, inFormula);
        }
    }
}
