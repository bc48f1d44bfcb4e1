using System.Globalization;
using Fractions;
using LogicProof.Language.Syntax;

namespace LogicProof.Language.Tests.Support;

/// <summary>
/// Compares two syntax trees ignoring source spans. Numbers compare by exact value (their text is only their
/// spelling, which the printer makes canonical); durations by value, unit and text as written. Locals and outputs
/// compare as two lists, since the printer groups them into their own sections. Expressions are walked with an
/// explicit stack, so trees of any depth compare. Returns a description of the first difference, or null.
/// </summary>
internal static class SyntaxComparer
{
    public static string? FirstDifference(SchemeSyntax expected, SchemeSyntax actual)
    {
        return Same("scheme name", expected.Name, actual.Name)
            ?? Same("scheme description", expected.Description, actual.Description)
            ?? Same("frequency", expected.FrequencyHz, actual.FrequencyHz)
            ?? Duration("scan interval", expected.ScanInterval, actual.ScanInterval)
            ?? Lists("input", expected.Inputs, actual.Inputs, Input)
            ?? Lists("setting", expected.Settings, actual.Settings, Setting)
            ?? Lists("local", Kind(expected, VariableKind.Local), Kind(actual, VariableKind.Local), Variable)
            ?? Lists("output", Kind(expected, VariableKind.Output), Kind(actual, VariableKind.Output), Variable)
            ?? Lists("equation", expected.Equations, actual.Equations, (a, b) => Same("target", a.Target, b.Target) ?? FirstDifference(a.Expression, b.Expression))
            ?? Lists("role", expected.Roles, actual.Roles, Role)
            ?? BreakerModel(expected.BreakerModel, actual.BreakerModel)
            ?? Lists("assumption", expected.Assumptions, actual.Assumptions, (a, b) => Same("name", a.Name, b.Name) ?? FirstDifference(a.Formula, b.Formula))
            ?? Lists("requirement", expected.Requirements, actual.Requirements, (a, b) => Same("name", a.Name, b.Name) ?? FirstDifference(a.Formula, b.Formula));
    }

    public static string? FirstDifference(ExpressionSyntax expected, ExpressionSyntax actual)
    {
        var pending = new Stack<(ExpressionSyntax Expected, ExpressionSyntax Actual)>();
        pending.Push((expected, actual));
        while (pending.Count > 0)
        {
            var (a, b) = pending.Pop();
            if (a.GetType() != b.GetType())
            {
                return $"expected a {a.GetType().Name} at {a.Span}, found a {b.GetType().Name} at {b.Span}";
            }

            var difference = (a, b) switch
            {
                (BoolLiteralSyntax x, BoolLiteralSyntax y) => Same("bool literal", x.Value, y.Value),
                (NumberLiteralSyntax x, NumberLiteralSyntax y) => Same("number", x.Value, y.Value),
                (DurationLiteralSyntax x, DurationLiteralSyntax y) => Duration("duration", x.Duration, y.Duration),
                (NameSyntax x, NameSyntax y) => Same("name", x.Name, y.Name),
                (UnarySyntax x, UnarySyntax y) => Same("unary operator", x.Operator, y.Operator),
                (BinarySyntax x, BinarySyntax y) => Same("binary operator", x.Operator, y.Operator),
                (CallSyntax x, CallSyntax y) => Same("callee", x.Callee, y.Callee)
                    ?? Same($"argument count of {x.Callee}", x.Arguments.Count, y.Arguments.Count)
                    ?? x.Arguments.Zip(y.Arguments).Select(p => Same("argument name", p.First.Name, p.Second.Name)).FirstOrDefault(d => d is not null),
                _ => null,
            };
            if (difference is not null)
            {
                return $"{difference} (at {a.Span})";
            }

            switch ((a, b))
            {
                case (UnarySyntax x, UnarySyntax y):
                    pending.Push((x.Operand, y.Operand));
                    break;
                case (BinarySyntax x, BinarySyntax y):
                    pending.Push((x.Right, y.Right));
                    pending.Push((x.Left, y.Left));
                    break;
                case (CallSyntax x, CallSyntax y):
                    foreach (var (first, second) in x.Arguments.Zip(y.Arguments).Reverse())
                    {
                        pending.Push((first.Value, second.Value));
                    }

                    break;
            }
        }

        return null;
    }

    private static List<VariableDeclarationSyntax> Kind(SchemeSyntax scheme, VariableKind kind) =>
        scheme.Variables.Where(v => v.Kind == kind).ToList();

    private static string? Input(InputDeclarationSyntax a, InputDeclarationSyntax b) =>
        Same("name", a.Name, b.Name) ?? Same("type", a.Type, b.Type) ?? Same("description", a.Description, b.Description)
        ?? Same("has range", a.Range is null, b.Range is null)
        ?? (a.Range is null ? null : Same("range low", a.Range.Low, b.Range!.Low) ?? Same("range high", a.Range.High, b.Range.High));

    private static string? Setting(SettingDeclarationSyntax a, SettingDeclarationSyntax b) =>
        Same("name", a.Name, b.Name) ?? Same("type", a.Type, b.Type) ?? Same("description", a.Description, b.Description)
        ?? FirstDifference(a.Value, b.Value);

    private static string? Variable(VariableDeclarationSyntax a, VariableDeclarationSyntax b) =>
        Same("name", a.Name, b.Name) ?? Same("type", a.Type, b.Type) ?? Same("description", a.Description, b.Description)
        ?? Same("has init", a.Initial is null, b.Initial is null) ?? Same("retained", a.Retained, b.Retained)
        ?? (a.Initial is null ? null : FirstDifference(a.Initial, b.Initial!));

    private static string? Role(RoleBindingSyntax a, RoleBindingSyntax b) =>
        Same("role", a.Role, b.Role) ?? Lists("role value", a.Values, b.Values, (x, y) => (x, y) switch
        {
            (NameRoleValueSyntax n, NameRoleValueSyntax m) => Same("name", n.Name, m.Name),
            (DurationRoleValueSyntax n, DurationRoleValueSyntax m) => Duration("duration", n.Duration, m.Duration),
            (BoolRoleValueSyntax n, BoolRoleValueSyntax m) => Same("bool", n.Value, m.Value),
            _ => $"role value {x.GetType().Name} became {y.GetType().Name}",
        });

    private static string? BreakerModel(BreakerModelSyntax? a, BreakerModelSyntax? b)
    {
        if (a is null || b is null)
        {
            return Same("has breaker_model", a is null, b is null);
        }

        return Lists("breaker_model setting", a.Settings, b.Settings, (x, y) => Same("key", x.Key, y.Key) ?? (x.Value, y.Value) switch
        {
            (DurationRangePlantValueSyntax n, DurationRangePlantValueSyntax m) => Duration("low", n.Low, m.Low) ?? Duration("high", n.High, m.High),
            (DurationPlantValueSyntax n, DurationPlantValueSyntax m) => Duration("duration", n.Duration, m.Duration),
            (BoolPlantValueSyntax n, BoolPlantValueSyntax m) => Same("bool", n.Value, m.Value),
            (NamePlantValueSyntax n, NamePlantValueSyntax m) => Same("name", n.Name, m.Name),
            _ => $"breaker_model value {x.Value.GetType().Name} became {y.Value.GetType().Name}",
        });
    }

    private static string? Duration(string what, DurationSyntax a, DurationSyntax b) =>
        Same($"{what} text", a.Text, b.Text) ?? Same($"{what} milliseconds", a.Milliseconds, b.Milliseconds) ?? Same($"{what} cycles", a.Cycles, b.Cycles);

    private static string? Lists<T>(string what, IReadOnlyList<T> a, IReadOnlyList<T> b, Func<T, T, string?> compare)
    {
        if (a.Count != b.Count)
        {
            return string.Create(CultureInfo.InvariantCulture, $"{what} count: expected {a.Count}, found {b.Count}");
        }

        for (var i = 0; i < a.Count; i++)
        {
            if (compare(a[i], b[i]) is { } difference)
            {
                return string.Create(CultureInfo.InvariantCulture, $"{what} {i + 1}: {difference}");
            }
        }

        return null;
    }

    private static string? Same<T>(string what, T expected, T actual) =>
        EqualityComparer<T>.Default.Equals(expected, actual) ? null : $"{what}: expected '{Show(expected)}', found '{Show(actual)}'";

    private static string Show<T>(T value) => value switch
    {
        null => "(none)",
        Fraction f => f.ToString(CultureInfo.InvariantCulture),
        _ => Convert.ToString(value, CultureInfo.InvariantCulture) ?? string.Empty,
    };
}
