namespace LogicProof.Language.Binding;

/// <summary>
/// The names that can be called: the IEC 61131-3 timer, edge-detection and bistable function blocks with their
/// formal inputs in the standard's order (cited from memory), the functions ABS, MIN and MAX, and the past-time
/// operators of formulas. Names are case-insensitive.
/// </summary>
internal static class BuiltinCallables
{
    public static readonly IReadOnlyDictionary<string, (FunctionBlockKind Kind, string[] Inputs)> FunctionBlocks =
        new Dictionary<string, (FunctionBlockKind, string[])>(StringComparer.OrdinalIgnoreCase)
        {
            ["TON"] = (FunctionBlockKind.Ton, ["IN", "PT"]),
            ["TOF"] = (FunctionBlockKind.Tof, ["IN", "PT"]),
            ["TP"] = (FunctionBlockKind.Tp, ["IN", "PT"]),
            ["R_TRIG"] = (FunctionBlockKind.RTrig, ["CLK"]),
            ["F_TRIG"] = (FunctionBlockKind.FTrig, ["CLK"]),
            ["SR"] = (FunctionBlockKind.Sr, ["S1", "R"]),
            ["RS"] = (FunctionBlockKind.Rs, ["S", "R1"]),
        };

    public static readonly IReadOnlyDictionary<string, BuiltinFunction> Functions =
        new Dictionary<string, BuiltinFunction>(StringComparer.OrdinalIgnoreCase)
        {
            ["ABS"] = BuiltinFunction.Abs,
            ["MIN"] = BuiltinFunction.Min,
            ["MAX"] = BuiltinFunction.Max,
        };

    public static readonly IReadOnlyDictionary<string, TemporalOperator> TemporalOperators =
        new Dictionary<string, TemporalOperator>(StringComparer.OrdinalIgnoreCase)
        {
            ["PREV"] = TemporalOperator.Prev,
            ["ROSE"] = TemporalOperator.Rose,
            ["FELL"] = TemporalOperator.Fell,
            ["ONCE"] = TemporalOperator.Once,
            ["HISTORICALLY"] = TemporalOperator.Historically,
            ["HELD"] = TemporalOperator.Held,
            ["WITHIN"] = TemporalOperator.Within,
        };

    /// <summary>The index of the preset among a timer's inputs (TON, TOF, TP); other blocks have none.</summary>
    public const int PresetIndex = 1;

    public static bool HasPreset(FunctionBlockKind kind) => kind is FunctionBlockKind.Ton or FunctionBlockKind.Tof or FunctionBlockKind.Tp;

    public static bool IsBuiltin(string name) =>
        FunctionBlocks.ContainsKey(name) || Functions.ContainsKey(name) || TemporalOperators.ContainsKey(name);

    /// <summary>"a function block", "a function" or "a past-time operator", for messages.</summary>
    public static string KindOf(string name) =>
        FunctionBlocks.ContainsKey(name) ? "a function block" : Functions.ContainsKey(name) ? "a function" : "a past-time operator";

    public static string ListAll() =>
        "function blocks " + string.Join(", ", FunctionBlocks.Keys) + "; functions " + string.Join(", ", Functions.Keys)
        + "; past-time operators (in require and assume only) " + string.Join(", ", TemporalOperators.Keys);
}
