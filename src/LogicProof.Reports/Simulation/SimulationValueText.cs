using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Simulation;

/// <summary>How a simulation value is written: bools as 1 and 0; reals exact, or rounded for the text table.</summary>
internal static class SimulationValueText
{
    /// <summary>For people: at most four decimals, a trailing <c>~</c> when rounded.</summary>
    public static string Display(SignalValue value) =>
        value.Type == SignalType.Bool ? Bit(value.Bool) : ExactNumberText.FormatForDisplay(value.Real);

    /// <summary>For programs: exact, a decimal or else a fraction p/q.</summary>
    public static string Exact(SignalValue value) =>
        value.Type == SignalType.Bool ? Bit(value.Bool) : ExactNumberText.FormatExact(value.Real);

    public static string Kind(SimulationColumnKind kind) => kind switch
    {
        SimulationColumnKind.Input => "input",
        SimulationColumnKind.Output => "output",
        _ => "shown",
    };

    public static string Type(SignalType type) => type == SignalType.Bool ? "bool" : "real";

    private static string Bit(bool value) => value ? "1" : "0";
}
