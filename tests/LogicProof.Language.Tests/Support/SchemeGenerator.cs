using System.Globalization;
using CsCheck;
using Fractions;
using LogicProof.Core.Text;
using LogicProof.Language.Printing;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Tests.Support;

/// <summary>
/// CsCheck generators of random syntax trees, for round-trip tests. The trees are well-formed syntax (names that
/// are not keywords, numbers in canonical decimal form, durations as they can be written) but not necessarily
/// well-typed: the round trip is about syntax. Expressions use every operator, function block, function and
/// past-time operator, with nesting up to <see cref="MaxDepth"/>.
/// </summary>
internal static class SchemeGenerator
{
    public const int MaxDepth = 5;

    private static readonly SourceSpan None = SourceSpan.None;

    private static readonly string[] NamePool =
    [
        "A", "b", "LO86", "CLOSE_OUT", "Fill", "FILL_2", "i", "I", "Ii", "_x", "INITIAL", "Timer_1", "cyc", "ms", "t", "hz",
        "fill", "Init_Value",
    ];

    private static readonly string[] Callees =
    [
        "TON", "TOF", "TP", "R_TRIG", "F_TRIG", "SR", "RS", "ABS", "MIN", "MAX", "PREV", "ROSE", "FELL", "ONCE",
        "HISTORICALLY", "HELD", "WITHIN", "ton", "Prev", "MY_BLOCK",
    ];

    private static readonly string[] ArgumentNames = ["IN", "PT", "CLK", "S1", "R", "S", "R1", "in", "Pt"];

    /// <summary>Written durations with their exact values: milliseconds, or cycles for the cycle units.</summary>
    private static readonly (string Text, Fraction? Milliseconds, Fraction? Cycles)[] Durations =
    [
        ("T#500ms", 500, null), ("T#1s200ms", 1200, null), ("TIME#1.5s", 1500, null), ("t#2m", 120_000, null),
        ("T#1h", 3_600_000, null), ("T#10us", new Fraction(1, 100), null), ("T#1_000ms", 1000, null),
        ("T#1d2h", 93_600_000, null), ("time#25h_15m", 90_900_000, null), ("2 ms", 2, null), ("0.5 s", 500, null),
        ("30 cyc", null, 30), ("1 cycle", null, 1), ("2.5 CYCLES", null, new Fraction(5, 2)),
    ];

    private static Gen<string> Name { get; } = Gen.Frequency(
        (3, Gen.OneOfConst(NamePool)),
        (1, Gen.Int[0, 999].Select(n => "N" + n.ToString(CultureInfo.InvariantCulture))));

    private static Gen<string?> Description { get; } = Gen.Frequency(
        (2, Gen.Const((string?)null)),
        (1, Gen.OneOfConst<string?>("", "Close coil", "quote \" inside", "two \"\" quotes", "per unit, 0..1.5", "Ünïcödé ıİ", "// not a comment", "(* nor this *)")));

    private static Gen<Fraction> UnsignedNumber { get; } =
        Gen.Select(Gen.Int[0, 100_000], Gen.Int[0, 3], (digits, decimals) => new Fraction(digits, (int)Math.Pow(10, decimals)));

    private static Gen<Fraction> SignedNumber { get; } = Gen.Select(UnsignedNumber, Gen.Bool, (n, negative) => negative ? -n : n);

    private static Gen<DurationSyntax> Duration { get; } = Gen.OneOfConst(Durations).Select(d => new DurationSyntax(d.Milliseconds, d.Cycles, d.Text, None));

    private static Gen<ExpressionSyntax> Literal { get; } = Gen.OneOf<ExpressionSyntax>(
        Gen.Bool.Select(b => (ExpressionSyntax)new BoolLiteralSyntax(b, None)),
        SignedNumber.Select(n => (ExpressionSyntax)Number(n)),
        Duration.Select(d => (ExpressionSyntax)new DurationLiteralSyntax(d, None)));

    // Declared after the generators they are built from: static initializers run in textual order.
    private static readonly Gen<ExpressionSyntax>[] ExpressionsByDepth = BuildExpressionGenerators();

    public static Gen<SchemeSyntax> Scheme { get; } = BuildScheme();

    private static NumberLiteralSyntax Number(Fraction value) => new(value, NumberText.TryFormat(value)!, None);

    private static Gen<ExpressionSyntax>[] BuildExpressionGenerators()
    {
        var leaf = Gen.Frequency(
            (4, Name.Select(n => (ExpressionSyntax)new NameSyntax(n, None))),
            (1, Gen.Bool.Select(b => (ExpressionSyntax)new BoolLiteralSyntax(b, None))),
            (1, UnsignedNumber.Select(n => (ExpressionSyntax)Number(n))),
            (1, Duration.Select(d => (ExpressionSyntax)new DurationLiteralSyntax(d, None))));
        var generators = new Gen<ExpressionSyntax>[MaxDepth + 1];
        generators[0] = leaf;
        for (var depth = 1; depth <= MaxDepth; depth++)
        {
            var inner = generators[depth - 1];
            var argument = Gen.Select(Gen.Frequency((2, Gen.Const((string?)null)), (1, Gen.OneOfConst(ArgumentNames).Select(n => (string?)n))), inner, (n, v) => new ArgumentSyntax(n, v, None));
            generators[depth] = Gen.Frequency(
                (2, leaf),
                (4, Gen.Select(Gen.Enum<BinaryOperator>(), inner, inner, (op, l, r) => (ExpressionSyntax)new BinarySyntax(op, l, r, None))),
                (2, Gen.Select(Gen.Enum<UnaryOperator>(), inner, (op, e) => (ExpressionSyntax)new UnarySyntax(op, e, None))),
                (2, Gen.Select(Gen.OneOfConst(Callees), argument.List[0, 3], (c, a) => (ExpressionSyntax)new CallSyntax(c, None, a, None))));
        }

        return generators;
    }

    private static Gen<SchemeSyntax> BuildScheme()
    {
        var expression = ExpressionsByDepth[MaxDepth];
        var input = Gen.Select(Name, Gen.Enum<ValueType>(), Gen.Frequency((2, Gen.Const((RangeSyntax?)null)), (1, Gen.Select(SignedNumber, SignedNumber, (l, h) => (RangeSyntax?)new RangeSyntax(l, h, None)))), Description)
            .Select((n, t, r, d) => new InputDeclarationSyntax(n, None, t, r, d, None));
        var setting = Gen.Select(Name, Gen.Enum<ValueType>(), Literal, Description)
            .Select((n, t, v, d) => new SettingDeclarationSyntax(n, None, t, v, d, None));
        var variable = Gen.Select(Name, Gen.Enum<VariableKind>(), Gen.Enum<ValueType>(), Gen.Frequency((2, Gen.Const((ExpressionSyntax?)null)), (1, Literal.Select(l => (ExpressionSyntax?)l))), Description)
            .Select((n, k, t, i, d) => new VariableDeclarationSyntax(n, None, k, t, i, d, None));
        var equation = Gen.Select(Name, expression, (t, e) => new EquationSyntax(t, None, e, None));
        var roleValue = Gen.OneOf<RoleValueSyntax>(
            Name.Select(n => (RoleValueSyntax)new NameRoleValueSyntax(n, None)),
            Duration.Select(d => (RoleValueSyntax)new DurationRoleValueSyntax(d, None)),
            Gen.Bool.Select(b => (RoleValueSyntax)new BoolRoleValueSyntax(b, None)));
        var role = Gen.Select(Name, roleValue.List[1, 3], (r, v) => new RoleBindingSyntax(r, None, v, None));
        var plantValue = Gen.OneOf<PlantValueSyntax>(
            Gen.Select(Duration, Duration, (l, h) => (PlantValueSyntax)new DurationRangePlantValueSyntax(l, h, None)),
            Duration.Select(d => (PlantValueSyntax)new DurationPlantValueSyntax(d, None)),
            Gen.Bool.Select(b => (PlantValueSyntax)new BoolPlantValueSyntax(b, None)),
            Name.Select(n => (PlantValueSyntax)new NamePlantValueSyntax(n, None)));
        var breakerModel = Gen.Frequency(
            (1, Gen.Const((BreakerModelSyntax?)null)),
            (1, Gen.Select(Name, plantValue, (k, v) => new PlantSettingSyntax(k, None, v, None)).List[0, 4].Select(s => (BreakerModelSyntax?)new BreakerModelSyntax(s, None))));
        var requirement = Gen.Select(Name, expression, (n, f) => new RequirementSyntax(n, None, f, None));
        var assumption = Gen.Select(Gen.Frequency((1, Gen.Const((string?)null)), (1, Name.Select(n => (string?)n))), expression, (n, f) => new AssumptionSyntax(n, f, None));
        var header = Gen.Select(Name, Description, UnsignedNumber.Where(f => !f.IsZero), Duration);
        var declarations = Gen.Select(input.List[0, 5], setting.List[0, 4], variable.List[0, 6]);
        var body = Gen.Select(equation.List[0, 8], role.List[0, 3], breakerModel, assumption.List[0, 3], requirement.List[0, 4]);
        return Gen.Select(header, declarations, body, (h, d, b) => new SchemeSyntax(
            h.Item1, h.Item2, h.Item3, h.Item4, d.Item1, d.Item2, d.Item3, b.Item1, b.Item2, b.Item3, b.Item4, b.Item5, None));
    }
}
