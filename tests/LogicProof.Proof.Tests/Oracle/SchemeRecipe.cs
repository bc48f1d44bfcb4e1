using System.Globalization;
using System.Text;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// A small random scheme, written as .lpl text from a list of choices (each choice a small number; an exhausted list
/// reads as zeros, and zero always picks the simplest option, so CsCheck's shrinking toward small numbers and short
/// lists gives small schemes). Inputs I1..In (bool), locals V1..Vm each written by one equation, equations in a
/// shuffled order (so reads before writes happen), right sides drawn from bool expressions, TON/TOF/TP with presets
/// of 1-4 scans at a 1 ms scan, R_TRIG/F_TRIG, SR/RS, and explicit seal-in loops, some with a declared power-up;
/// requirements over the past-time operators; an optional assumption. Invented demo data.
/// </summary>
internal sealed class SchemeRecipe
{
    private readonly byte[] _choices;
    private readonly int _inputs;
    private readonly int _locals;
    private readonly int _requirements;
    private readonly bool _assume;
    private int _next;

    public SchemeRecipe(int inputs, int locals, int requirements, bool assume, byte[] choices)
    {
        _inputs = inputs;
        _locals = locals;
        _requirements = requirements;
        _assume = assume;
        _choices = choices;
        Source = Write();
    }

    public string Source { get; }

    public override string ToString() => Source;

    private string Write()
    {
        var text = new StringBuilder();
        text.AppendLine("// Generated oracle scheme: Quillmere test bay (invented)");
        text.AppendLine("scheme GENERATED;");
        text.AppendLine("frequency 50 Hz;");
        text.AppendLine("scan 1 ms;");
        text.AppendLine("inputs");
        for (var i = 1; i <= _inputs; i++)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  I{i} : bool;");
        }

        text.AppendLine("end");
        var rightSides = Enumerable.Range(1, _locals).Select(RightSide).ToList();
        text.AppendLine("locals");
        for (var v = 1; v <= _locals; v++)
        {
            var init = Pick(4) switch
            {
                1 => " init TRUE",
                2 => " init FALSE",
                _ => string.Empty,
            };
            text.AppendLine(CultureInfo.InvariantCulture, $"  V{v} : bool{init};");
        }

        text.AppendLine("end");
        text.AppendLine("logic");
        foreach (var v in Order())
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  V{v} := {rightSides[v - 1]};");
        }

        text.AppendLine("end");
        for (var r = 1; r <= _requirements; r++)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"require R{r}: {Requirement()};");
        }

        if (_assume)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"assume {Formula(1)};");
        }

        return text.ToString();
    }

    /// <summary>The equations' order: as declared, then a few swaps of neighbours.</summary>
    private List<int> Order()
    {
        var order = Enumerable.Range(1, _locals).ToList();
        var swaps = Pick(4);
        for (var s = 0; s < swaps; s++)
        {
            var at = Pick(_locals - 1);
            (order[at], order[at + 1]) = (order[at + 1], order[at]);
        }

        return order;
    }

    private string RightSide(int variable)
    {
        var preset = $"T#{1 + Pick(4)}ms";
        return Pick(9) switch
        {
            1 => $"TON({Expression(1)}, {preset})",
            2 => $"TOF({Expression(1)}, {preset})",
            3 => $"TP({Expression(1)}, {preset})",
            4 => $"R_TRIG({Expression(1)})",
            5 => $"F_TRIG({Expression(1)})",
            6 => $"SR(S1 := {Expression(1)}, R := {Expression(1)})",
            7 => $"RS(S := {Expression(1)}, R1 := {Expression(1)})",
            8 => $"({Expression(1)} OR V{variable}) AND NOT {Leaf()}",
            _ => Expression(2),
        };
    }

    private string Expression(int depth) => depth == 0 ? Leaf() : Pick(6) switch
    {
        1 => $"NOT {Leaf()}",
        2 => $"({Expression(depth - 1)} AND {Expression(depth - 1)})",
        3 => $"({Expression(depth - 1)} OR {Expression(depth - 1)})",
        4 => $"({Expression(depth - 1)} XOR {Expression(depth - 1)})",
        _ => Leaf(),
    };

    private string Leaf()
    {
        var choice = Pick(_inputs + _locals + 1);
        return choice < _inputs ? $"I{choice + 1}"
            : choice < _inputs + _locals ? $"V{choice - _inputs + 1}"
            : Pick(2) == 0 ? "FALSE" : "TRUE";
    }

    private string Requirement() => Pick(3) switch
    {
        1 => Formula(2),
        _ => $"{Formula(1)} -> {Formula(1)}",
    };

    private string Formula(int depth)
    {
        if (depth == 0)
        {
            return Leaf();
        }

        var window = $"T#{1 + Pick(4)}ms";
        return Pick(14) switch
        {
            1 => $"NOT {Formula(depth - 1)}",
            2 => $"({Formula(depth - 1)} AND {Formula(depth - 1)})",
            3 => $"({Formula(depth - 1)} OR {Formula(depth - 1)})",
            4 => $"PREV({Formula(depth - 1)})",
            5 => $"ROSE({Formula(depth - 1)})",
            6 => $"FELL({Formula(depth - 1)})",
            7 => $"ONCE({Formula(depth - 1)})",
            8 => $"HISTORICALLY({Formula(depth - 1)})",
            9 => $"({Formula(depth - 1)} SINCE {Formula(depth - 1)})",
            10 => $"HELD({Formula(depth - 1)}, {window})",
            11 => $"WITHIN({Formula(depth - 1)}, {window})",
            12 => $"({Formula(depth - 1)} XOR {Formula(depth - 1)})",
            13 => $"({Formula(depth - 1)} -> {Formula(depth - 1)})",
            _ => Leaf(),
        };
    }

    private int Pick(int options) => options <= 1 ? 0 : _next < _choices.Length ? _choices[_next++] % options : 0;
}
