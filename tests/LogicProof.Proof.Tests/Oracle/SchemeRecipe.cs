using System.Globalization;
using System.Text;
using Fractions;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// A small random scheme, written as .lpl text from a list of choices (each choice a small number; an exhausted list
/// reads as zeros, and zero always picks the simplest option, so CsCheck's shrinking toward small numbers and short
/// lists gives small schemes). Inputs I1..In (bool), locals V1..Vm each written by one equation, equations in a
/// shuffled order (so reads before writes happen), right sides drawn from bool expressions, TON/TOF/TP with presets
/// of 1-4 scans at a 1 ms scan, R_TRIG/F_TRIG, SR/RS, and explicit seal-in loops, some with a declared power-up;
/// requirements over the past-time operators; an optional assumption. With real inputs X1..Xk, each is restricted by an
/// assumption to the small domain {0, 0.5, 1} (<see cref="RealDomains"/>, the explorer's alphabet), a real local W1
/// may compute from them, and comparisons (with + - * / by constants, ABS, MIN, MAX, and PREV in formulas) become
/// leaves. Invented demo data.
/// </summary>
internal sealed class SchemeRecipe
{
    private readonly byte[] _choices;
    private static readonly Fraction[] Domain = [Fraction.Zero, new(1, 2), Fraction.One];

    private readonly int _inputs;
    private readonly int _reals;
    private readonly int _locals;
    private readonly int _requirements;
    private readonly bool _assume;
    private int _next;

    public SchemeRecipe(int inputs, int locals, int requirements, bool assume, byte[] choices, int reals = 0)
    {
        _inputs = inputs;
        _reals = reals;
        _locals = locals;
        _requirements = requirements;
        _assume = assume;
        _choices = choices;
        Source = Write();
    }

    public string Source { get; }

    /// <summary>The values each real input can take (the assumptions allow exactly these).</summary>
    public IReadOnlyDictionary<string, Fraction[]> RealDomains =>
        Enumerable.Range(1, _reals).ToDictionary(x => $"X{x}", _ => Domain);

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

        for (var x = 1; x <= _reals; x++)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  X{x} : real;");
        }

        text.AppendLine("end");
        var realLocal = _reals > 0 ? RealLocal() : null;
        var rightSides = Enumerable.Range(1, _locals).Select(RightSide).ToList();
        text.AppendLine("locals");
        if (realLocal is not null)
        {
            text.AppendLine("  W1 : real;");
        }

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
        var realFirst = Pick(2) == 0;
        if (realLocal is not null && realFirst)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  W1 := {realLocal};");
        }

        foreach (var v in Order())
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  V{v} := {rightSides[v - 1]};");
        }

        if (realLocal is not null && !realFirst)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"  W1 := {realLocal};");
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

        for (var x = 1; x <= _reals; x++)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"assume X{x} = 0 OR X{x} = 0.5 OR X{x} = 1;");
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
        var choice = Pick(_inputs + _locals + 1 + (_reals > 0 ? 1 : 0));
        return choice < _inputs ? $"I{choice + 1}"
            : choice < _inputs + _locals ? $"V{choice - _inputs + 1}"
            : choice > _inputs + _locals ? $"({Comparison()})"
            : Pick(2) == 0 ? "FALSE" : "TRUE";
    }

    /// <summary>W1 reads real inputs only: a real loop would have infinitely many values.</summary>
    private string RealLocal() => Pick(3) switch
    {
        1 => $"(X1 + X{1 + Pick(_reals)}) / 2",
        2 => $"MAX(X1, 0.5) - X{1 + Pick(_reals)}",
        _ => $"-X1 + X{1 + Pick(_reals)} * 2",
    };

    /// <summary>A real input, or the real local W1 when there is one.</summary>
    private string Real() => _reals > 0 && Pick(_reals + 1) is var x && x < _reals ? $"X{x + 1}" : "W1";

    private string Comparison() => Pick(6) switch
    {
        1 => $"{Real()} + {Real()} > 1",
        2 => $"ABS({Real()} - {Real()}) <= 0.5",
        3 => $"MAX({Real()}, {Real()}) = 1",
        4 => $"{Real()} * 2 - {Real()} < 1",
        5 => $"MIN({Real()}, 0.5) <> {Real()}",
        _ => $"{Real()} >= 0.5",
    };

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
        return Pick(_reals > 0 ? 15 : 14) switch
        {
            14 => $"(PREV({Real()}) < {Real()})",
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
