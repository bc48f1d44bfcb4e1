using System.Globalization;
using System.Text;

namespace LogicProof.Bench;

/// <summary>
/// Generates a scheme of N independent breaker bays (invented names), each with the close-supervision shape:
/// an 86 lockout latch, a synchronism-check qualifier timer, a close seal-in with a close-fail timer, a 94
/// anti-pumping latch, a trip seal with an off-delay, trip-circuit supervision and a few alarms; and six
/// requirements per bay. Bays share nothing, so cone-of-influence slicing should keep the growth linear.
/// </summary>
public static class BaySchemeGenerator
{
    public static string Generate(int bays)
    {
        var text = new StringBuilder();
        text.AppendLine(CultureInfo.InvariantCulture, $"// Quillmere 115 kV substation, {bays} generated bays (fictional)");
        text.AppendLine("scheme GENERATED_BAYS;\nfrequency 60 Hz;\nscan 2 ms;\n");
        for (var b = 1; b <= bays; b++)
        {
            text.Append(Bay(b));
        }

        return text.ToString();
    }

    private static string Bay(int b)
    {
        string N(string name) => $"{name}_{b}";
        return $$"""
            inputs
              {{N("CS_CLOSE")}} : bool; {{N("REMOTE_CLOSE")}} : bool; {{N("PROT_TRIP")}} : bool; {{N("LO_TRIP")}} : bool;
              {{N("RESET_86")}} : bool; {{N("BRK_52A")}} : bool; {{N("BRK_52B")}} : bool; {{N("GAS_LOW_63")}} : bool;
              {{N("SPRING_OK")}} : bool; {{N("SYNC_IN")}} : bool; {{N("DEAD_LINE")}} : bool; {{N("TCS_OK")}} : bool;
              {{N("LINE_V")}} : real range 0 .. 1.5;
            end
            locals
              {{N("LO86")}} : bool init FALSE; {{N("SYNC_25")}} : bool; {{N("DEAD_OK")}} : bool; {{N("LINE_LIVE")}} : bool;
              {{N("PERMIT")}} : bool; {{N("CMD")}} : bool; {{N("START")}} : bool; {{N("SEAL")}} : bool init FALSE;
              {{N("FAIL")}} : bool init FALSE; {{N("AP94")}} : bool init TRUE; {{N("TRIP_REQ")}} : bool; {{N("TRIP_HOLD")}} : bool;
              {{N("TCS_ALARM_T")}} : bool; {{N("GAS_ALARM")}} : bool; {{N("SPRING_ALARM")}} : bool; {{N("DISAGREE")}} : bool;
              {{N("DISAGREE_T")}} : bool; {{N("CMD_EDGE")}} : bool; {{N("CLOSE_COUNT_PULSE")}} : bool;
            end
            outputs
              {{N("CLOSE_OUT")}} : bool; {{N("TRIP_OUT")}} : bool; {{N("TCS_ALARM")}} : bool; {{N("STATUS_ALARM")}} : bool;
            end
            logic
              {{N("LINE_LIVE")}} := {{N("LINE_V")}} > 0.8;
              {{N("LO86")}} := SR(S1 := {{N("LO_TRIP")}}, R := {{N("RESET_86")}} AND NOT {{N("LO_TRIP")}});
              {{N("SYNC_25")}} := TON(IN := {{N("SYNC_IN")}} AND {{N("LINE_LIVE")}}, PT := T#100ms);
              {{N("DEAD_OK")}} := {{N("DEAD_LINE")}} AND NOT {{N("LINE_LIVE")}};
              {{N("PERMIT")}} := ({{N("SYNC_25")}} OR {{N("DEAD_OK")}}) AND NOT {{N("GAS_LOW_63")}} AND {{N("SPRING_OK")}} AND {{N("BRK_52B")}} AND NOT {{N("BRK_52A")}};
              {{N("CMD")}} := {{N("CS_CLOSE")}} OR {{N("REMOTE_CLOSE")}};
              {{N("CMD_EDGE")}} := R_TRIG(CLK := {{N("CMD")}});
              {{N("TRIP_REQ")}} := {{N("PROT_TRIP")}} OR {{N("LO86")}};
              {{N("START")}} := {{N("CMD")}} AND {{N("PERMIT")}} AND NOT {{N("AP94")}} AND NOT {{N("LO86")}} AND NOT {{N("TRIP_REQ")}};
              {{N("SEAL")}} := ({{N("START")}} OR {{N("SEAL")}}) AND NOT {{N("BRK_52A")}} AND NOT {{N("TRIP_REQ")}} AND NOT {{N("FAIL")}} AND NOT {{N("LO86")}};
              {{N("FAIL")}} := TON(IN := {{N("SEAL")}}, PT := T#500ms);
              {{N("CLOSE_OUT")}} := {{N("SEAL")}} AND NOT {{N("FAIL")}} AND NOT {{N("TRIP_REQ")}};
              {{N("CLOSE_COUNT_PULSE")}} := TP(IN := {{N("CLOSE_OUT")}}, PT := T#20ms);
              {{N("AP94")}} := ({{N("AP94")}} OR {{N("CLOSE_OUT")}}) AND {{N("CMD")}};
              {{N("TRIP_HOLD")}} := TOF(IN := {{N("TRIP_REQ")}} AND {{N("BRK_52A")}}, PT := T#100ms);
              {{N("TRIP_OUT")}} := ({{N("TRIP_REQ")}} AND {{N("BRK_52A")}}) OR ({{N("TRIP_HOLD")}} AND NOT {{N("BRK_52B")}});
              {{N("TCS_ALARM_T")}} := TON(IN := NOT {{N("TCS_OK")}} AND {{N("BRK_52A")}}, PT := T#400ms);
              {{N("TCS_ALARM")}} := {{N("TCS_ALARM_T")}};
              {{N("GAS_ALARM")}} := TON(IN := {{N("GAS_LOW_63")}}, PT := T#1s);
              {{N("SPRING_ALARM")}} := TON(IN := NOT {{N("SPRING_OK")}} AND NOT {{N("BRK_52A")}}, PT := T#10s);
              {{N("DISAGREE")}} := {{N("BRK_52A")}} = {{N("BRK_52B")}};
              {{N("DISAGREE_T")}} := TON(IN := {{N("DISAGREE")}}, PT := T#200ms);
              {{N("STATUS_ALARM")}} := {{N("DISAGREE_T")}} OR {{N("GAS_ALARM")}} OR {{N("SPRING_ALARM")}};
            end
            require {{N("NO_CLOSE_IN_LOCKOUT")}}: {{N("LO86")}} -> NOT {{N("CLOSE_OUT")}};
            require {{N("TRIP_WINS")}}: NOT ({{N("CLOSE_OUT")}} AND {{N("TRIP_OUT")}});
            require {{N("CLOSE_ONLY_WHEN_OPEN")}}: ROSE({{N("CLOSE_OUT")}}) -> {{N("BRK_52B")}};
            require {{N("CLOSE_NOT_HELD_ON")}}: NOT HELD({{N("CLOSE_OUT")}}, T#500ms);
            require {{N("NO_PUMPING")}}: ROSE({{N("CLOSE_OUT")}}) -> NOT PREV({{N("CMD")}} SINCE ({{N("CLOSE_OUT")}} AND {{N("CMD")}}));
            require {{N("TCS_ALARM_IN_TIME")}}: HELD(NOT {{N("TCS_OK")}} AND {{N("BRK_52A")}}, T#400ms) -> {{N("TCS_ALARM")}};

            """;
    }
}
