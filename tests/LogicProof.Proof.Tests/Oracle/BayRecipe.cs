using System.Globalization;
using System.Text;
using Fractions;

namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// A small random close-and-trip bay, written as .lpl text from a list of choices (as <see cref="SchemeRecipe"/>: an
/// exhausted list reads as zeros, and zero picks the fuller, more careful option, so shrinking gives the plain bay).
/// Roles bind the built-in close-supervision rules; every term of the close logic may be left out, so some rules
/// hold and some fail. Optional: a lockout latch (SR or RS, with or without power-up), a synchronism permissive from
/// a real voltage restricted by an assumption to {0, 0.5, 1}, a low-gas input with either low-gas policy, and a
/// breaker_model with travel times of one or two scans (sometimes closing onto a fault). Invented: Quillmere test bay.
/// </summary>
internal sealed class BayRecipe
{
    private static readonly Fraction[] VoltageDomain = [Fraction.Zero, new(1, 2), Fraction.One];

    private readonly byte[] _choices;
    private int _next;

    public BayRecipe(bool lockout, bool sync, bool gas, bool breaker, byte[] choices)
    {
        _choices = choices;
        Source = Write(lockout, sync, gas, breaker);
        RealDomains = sync ? new Dictionary<string, Fraction[]> { ["LINE_V"] = VoltageDomain } : new Dictionary<string, Fraction[]>();
    }

    public string Source { get; }

    public IReadOnlyDictionary<string, Fraction[]> RealDomains { get; }

    public override string ToString() => Source;

    private string Write(bool lockout, bool sync, bool gas, bool breaker)
    {
        var text = new StringBuilder();
        text.AppendLine("// Generated oracle bay: Quillmere test bay (invented)");
        text.AppendLine("scheme GENERATED_BAY;");
        text.AppendLine("frequency 50 Hz;");
        text.AppendLine("scan 1 ms;");
        text.AppendLine("inputs");
        text.AppendLine("  CMD : bool; TRIP_CMD : bool; B52A : bool; B52B : bool;");
        text.AppendLine(lockout ? "  RESET : bool;" : string.Empty);
        text.AppendLine(sync ? "  LINE_V : real;" : string.Empty);
        text.AppendLine(gas ? "  LOW_GAS : bool;" : string.Empty);
        text.AppendLine("end");
        text.AppendLine("locals");
        text.AppendLine(CultureInfo.InvariantCulture, $"  START : bool; SEAL : bool{Init()}; FAIL : bool; ANTI_PUMP : bool{Init()};");
        text.AppendLine(sync ? "  SYNC : bool;" : string.Empty);
        text.AppendLine("end");
        text.AppendLine("outputs");
        text.AppendLine("  CLOSE_OUT : bool; TRIP_OUT : bool;");
        text.AppendLine(lockout ? $"  LOCKOUT : bool{Init()};" : string.Empty);
        text.AppendLine("end");

        var equations = new List<string>();
        if (lockout)
        {
            equations.Add(Pick(2) == 0 ? "LOCKOUT := SR(S1 := TRIP_CMD AND NOT B52A, R := RESET);" : "LOCKOUT := RS(S := TRIP_CMD AND NOT B52A, R1 := RESET);");
        }

        if (sync)
        {
            equations.Add(Pick(2) == 0 ? "SYNC := TON(LINE_V >= 0.5, T#1ms);" : "SYNC := ABS(LINE_V - 1) <= 0.5;");
        }

        var tripOnLowGas = Pick(2) == 0;
        var trip = $"TRIP_CMD{Term(lockout ? " OR LOCKOUT" : string.Empty)}{(gas && tripOnLowGas ? Term(" OR LOW_GAS") : string.Empty)}{Term(string.Empty, " AND B52A")}";
        equations.Add($"TRIP_OUT := {(gas && !tripOnLowGas ? $"({trip}){Term(" AND NOT LOW_GAS")}" : trip)};");
        var start = "START := CMD" + Term(" AND B52B") + Term(" AND NOT B52A") + Term(" AND NOT TRIP_OUT") + Term(" AND NOT ANTI_PUMP")
            + (lockout ? Term(" AND NOT LOCKOUT") : string.Empty) + (sync ? Term(" AND SYNC") : string.Empty)
            + (gas ? Term(" AND NOT LOW_GAS") : string.Empty) + ";";
        equations.Add(start);
        equations.Add("SEAL := (START OR SEAL)" + Term(" AND NOT B52A") + Term(" AND NOT TRIP_OUT") + Term(" AND NOT FAIL") + ";");
        equations.Add($"FAIL := TON(SEAL, T#{1 + Pick(3)}ms);");
        equations.Add("CLOSE_OUT := SEAL" + Term(" AND NOT FAIL") + Term(" AND NOT TRIP_OUT") + ";");
        equations.Add("ANTI_PUMP := (ANTI_PUMP OR CLOSE_OUT)" + Term(" AND CMD") + ";");
        for (var swaps = Pick(3); swaps > 0; swaps--)
        {
            var at = Pick(equations.Count - 1);
            (equations[at], equations[at + 1]) = (equations[at + 1], equations[at]);
        }

        text.AppendLine("logic");
        equations.ForEach(e => text.AppendLine("  " + e));
        text.AppendLine("end");

        if (breaker)
        {
            var fault = Pick(3) == 2 ? $" close_into_fault = TRUE; close_into_fault_delay = T#1ms .. T#{1 + Pick(2)}ms;" : string.Empty;
            text.AppendLine(CultureInfo.InvariantCulture, $"breaker_model closing_time = T#1ms .. T#{1 + Pick(2)}ms; opening_time = T#1ms .. T#{1 + Pick(2)}ms; trip_free = {(Pick(2) == 0 ? "TRUE" : "FALSE")};{fault} end");
        }

        if (sync)
        {
            text.AppendLine("assume LINE_V = 0 OR LINE_V = 0.5 OR LINE_V = 1;");
        }

        if (Pick(3) == 1)
        {
            text.AppendLine("require SEAL_NEEDS_COMMAND: SEAL -> ONCE(CMD);");
        }

        text.AppendLine("roles");
        text.AppendLine("  close_output = CLOSE_OUT; close_command = CMD; trip_command = TRIP_CMD; trip_output = TRIP_OUT;");
        text.AppendLine("  breaker_closed = B52A; breaker_open = B52B;");
        text.AppendLine(CultureInfo.InvariantCulture, $"  close_fail_time = T#{1 + Pick(3)}ms;");
        text.AppendLine(lockout ? "  lockout = LOCKOUT; lockout_reset_local = RESET;" : string.Empty);
        text.AppendLine(sync ? "  sync_permissive = SYNC;" : string.Empty);
        text.AppendLine(gas ? $"  low_gas = LOW_GAS; low_gas_policy = {(tripOnLowGas ? "trip" : "block_trip")};" : string.Empty);
        text.AppendLine("end");
        return text.ToString();
    }

    /// <summary>The term, or one time in four the alternative (usually nothing: a missing interlock).</summary>
    private string Term(string term, string instead = "") => Pick(4) == 3 ? instead : term;

    private string Init() => Pick(3) switch
    {
        1 => " init TRUE",
        2 => string.Empty,
        _ => " init FALSE",
    };

    private int Pick(int options) => options <= 1 ? 0 : _next < _choices.Length ? _choices[_next++] % options : 0;
}
