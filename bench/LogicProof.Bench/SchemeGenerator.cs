using System.Globalization;
using System.Text;

namespace LogicProof.Bench;

/// <summary>
/// Writes a synthetic but valid <c>.lpl</c> scheme of a chosen size, the same text for the same arguments
/// (fixed seed). A mix that resembles bay logic: plain AND/OR/NOT logic, TON/TOF/TP timers, SR/RS latches,
/// seal-in loops, R_TRIG/F_TRIG edges, comparisons of real measurements, and some reads of names written further
/// down (one-scan delays). The names are invented.
/// </summary>
internal static class SchemeGenerator
{
    public const int BoolInputs = 48;
    public const int RealInputs = 4;
    public const int Outputs = 8;

    public static string Generate(int equations, int seed)
    {
        var random = new Random(seed);
        var text = new StringBuilder(equations * 64);
        text.Append("scheme BENCH_").Append(Number(equations)).Append(" \"generated benchmark scheme (invented)\";\n");
        text.Append("frequency 60 Hz;\nscan 2 ms;\n\ninputs\n");
        for (var i = 0; i < BoolInputs; i++)
        {
            text.Append("    IN_").Append(Number(i)).Append(" : bool;\n");
        }

        for (var i = 0; i < RealInputs; i++)
        {
            text.Append("    MEAS_").Append(Number(i)).Append(" : real range -10 .. 10;\n");
        }

        text.Append("end\n\nlocals\n");
        for (var i = 0; i < equations - Outputs; i++)
        {
            text.Append("    V_").Append(Number(i)).Append(" : bool;\n");
        }

        text.Append("end\n\noutputs\n");
        for (var i = 0; i < Outputs; i++)
        {
            text.Append("    OUT_").Append(Number(i)).Append(" : bool;\n");
        }

        text.Append("end\n\nlogic\n");
        var locals = equations - Outputs;
        for (var i = 0; i < locals; i++)
        {
            text.Append("    V_").Append(Number(i)).Append(" := ").Append(Expression(random, i, locals)).Append(";\n");
        }

        for (var i = 0; i < Outputs; i++)
        {
            text.Append("    OUT_").Append(Number(i)).Append(" := ")
                .Append(Operand(random, locals, locals)).Append(" AND NOT ").Append(Operand(random, locals, locals)).Append(";\n");
        }

        text.Append("end\n");
        return text.ToString();
    }

    private static string Expression(Random random, int index, int locals)
    {
        var self = "V_" + Number(index);
        string A() => Operand(random, index, locals);
        var preset = Number(2 * random.Next(1, 200));
        return random.Next(100) switch
        {
            < 40 => $"({A()} AND NOT {A()}) OR ({A()} AND {A()})",
            < 48 => $"TON(IN := {A()} AND {A()}, PT := T#{preset}ms)",
            < 54 => $"TOF(IN := {A()}, PT := T#{preset}ms)",
            < 58 => $"TP(IN := {A()}, PT := T#{preset}ms)",
            < 64 => $"SR(S1 := {A()}, R := {A()})",
            < 70 => $"RS(S := {A()}, R1 := {A()} OR {A()})",
            < 78 => $"({A()} OR {self}) AND NOT {A()}",
            < 83 => $"R_TRIG(CLK := {A()})",
            < 86 => $"F_TRIG(CLK := {A()})",
            < 90 => $"ABS(MEAS_{Number(random.Next(RealInputs))} - MEAS_{Number(random.Next(RealInputs))}) <= 0.5 AND {A()}",
            < 93 => $"MEAS_{Number(random.Next(RealInputs))} + 0.25 > MEAS_{Number(random.Next(RealInputs))} XOR {A()}",
            _ => $"NOT ({A()} OR {A()}) XOR {A()}",
        };
    }

    /// <summary>An input, an earlier local (same scan) or, now and then, a later one (its previous-scan value).</summary>
    private static string Operand(Random random, int index, int locals)
    {
        var pick = random.Next(100);
        if (pick < 35 || index == 0)
        {
            return "IN_" + Number(random.Next(BoolInputs));
        }

        if (pick < 95)
        {
            var back = Math.Min(index, 1 + random.Next(Math.Min(index, 60)));
            return "V_" + Number(index - back);
        }

        return "V_" + Number(random.Next(locals));
    }

    private static string Number(int value) => value.ToString(CultureInfo.InvariantCulture);
}
