using LogicProof.Model.Tests.Rules;
using LogicProof.Model.Tests.Simulation;

namespace LogicProof.Model.Tests.Plant;

/// <summary>
/// The breaker model in the simulator: a close and a trip, with the checker's choices (when the travel ends) given
/// as inputs, and 52a/52b and the travel-time assumptions read back. Scans are 2 ms; waveforms have one character
/// per scan. Closing 6 .. 10 ms is 3 .. 5 scans of travel, opening 4 .. 6 ms is 2 .. 3 scans (invented settings).
/// </summary>
public sealed class BreakerModelTimingTests
{
    private static string Scheme(string tripFree, string extra = "") => RuleHarness.Header + $"""
        inputs CMD : bool; TRIP_CMD : bool; B52A : bool; B52B : bool; end
        outputs CO : bool; TO : bool; end
        logic CO := CMD; TO := TRIP_CMD; end
        breaker_model
          closing_time = T#6ms .. T#10ms;
          opening_time = T#4ms .. T#6ms;
          trip_free = {tripFree};
          {extra}
        end
        roles close_output = CO; trip_output = TO; breaker_closed = B52A; breaker_open = B52B; trip_command = TRIP_CMD; end
        """;

    [Theory]
    // The close output is on at scan 1; the breaker sees it at scan 2 and travels m scans, so 52a is TRUE from 2 + m.
    // The trip output is on at scan 10; the breaker starts opening at 11 and 52b is TRUE from 11 + m'.
    [InlineData(3, 2, "0000011111100000", "1100000000000111")]
    [InlineData(4, 2, "0000001111100000", "1100000000000111")]
    [InlineData(5, 3, "0000000111100000", "1100000000000011")]
    public void CloseAndTrip_WhenTravelEndsWithinTheRanges_Drive52aAnd52bAndMeetEveryAssumption(
        int closingScans, int openingScans, string closed, string open)
    {
        var model = RuleHarness.Model(Scheme("FALSE"));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "0100000000000000",
            ["TRIP_CMD"] = "0000000000100000",
            ["BKM_CLOSING_DONE"] = Pulse(2 + closingScans, 16),
            ["BKM_OPENING_DONE"] = Pulse(11 + openingScans, 16),
        };

        var waves = SimulationHarness.Run(model, inputs, ["B52A", "B52B", .. Assumptions]);

        Assert.Equal(closed, waves["B52A"]);
        Assert.Equal(open, waves["B52B"]);
        Assert.All(Assumptions, a => Assert.Equal(new string('1', 16), waves[a]));
    }

    [Fact]
    public void Close_WhenTravelEndsBeforeTheShortestClosingTime_BreaksTheMinimumAssumptionAtThatScan()
    {
        var model = RuleHarness.Model(Scheme("FALSE"));

        var waves = SimulationHarness.Run(model, new Dictionary<string, string> { ["CMD"] = "01000000", ["BKM_CLOSING_DONE"] = Pulse(4, 8) }, "B52A", "BKM_CLOSING_TIME_MIN");

        Assert.Equal("00001111", waves["B52A"]);
        Assert.Equal("11110111", waves["BKM_CLOSING_TIME_MIN"]);
    }

    [Fact]
    public void Close_WhenTravelLastsBeyondTheLongestClosingTime_BreaksTheMaximumAssumptionFromThen()
    {
        var model = RuleHarness.Model(Scheme("FALSE"));

        var waves = SimulationHarness.Run(model, new Dictionary<string, string> { ["CMD"] = "0100000000" }, "B52A", "B52B", "BKM_CLOSING_TIME_MAX");

        // Travel from scan 2: five scans (2..6) are allowed, the sixth (scan 7) is not.
        Assert.Equal("0000000000", waves["B52A"]);
        Assert.Equal("1100000000", waves["B52B"]);
        Assert.Equal("1111111000", waves["BKM_CLOSING_TIME_MAX"]);
    }

    [Theory]
    // Trip at scan 3, seen at scan 4 during the closing travel. Trip-free: the close is aborted and the breaker opens
    // (52b from scan 6 with two scans of opening travel). Not trip-free: the close completes at scan 5 and stays.
    [InlineData("TRUE", "0000000000", "1100001111")]
    [InlineData("FALSE", "0000011111", "1100000000")]
    public void TripDuringClosing_WhenTripFreeOrNot_AbortsOrCompletesTheClose(string tripFree, string closed, string open)
    {
        var model = RuleHarness.Model(Scheme(tripFree));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "0100000000",
            ["TRIP_CMD"] = "0001000000",
            ["BKM_CLOSING_DONE"] = Pulse(5, 10),
            ["BKM_OPENING_DONE"] = Pulse(6, 10),
        };

        var waves = SimulationHarness.Run(model, inputs, ["B52A", "B52B", .. Assumptions]);

        Assert.Equal(closed, waves["B52A"]);
        Assert.Equal(open, waves["B52B"]);
        Assert.All(Assumptions, a => Assert.Equal(new string('1', 10), waves[a]));
    }

    [Fact]
    public void PowerUp_WhenTheCheckerChoosesClosed_StartsWith52aAnd52bOfAClosedBreaker()
    {
        var model = RuleHarness.Model(Scheme("FALSE"));

        var waves = SimulationHarness.Run(model, new Dictionary<string, string> { ["BKM_POWER_UP_CLOSED"] = "1000" }, "B52A", "B52B");

        Assert.Equal("1111", waves["B52A"]);
        Assert.Equal("0000", waves["B52B"]);
    }

    [Theory]
    // The breaker is closed from scan 5; the fault's protection trip must come 1 .. 2 scans (2 .. 4 ms) after that.
    [InlineData("0000000000", "1111111000")]
    [InlineData("0000001000", "1111111111")]
    [InlineData("0000000100", "1111111111")]
    public void CloseIntoFault_WhenTheProtectionTripComesOrNot_ConstrainsOnlyTheWindowAfterTheClose(string trip, string assumption)
    {
        var model = RuleHarness.Model(Scheme("FALSE", "close_into_fault = TRUE;\n  close_into_fault_delay = T#2ms .. T#4ms;"));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "0100000000",
            ["TRIP_CMD"] = trip,
            ["BKM_CLOSING_DONE"] = Pulse(5, 10),
            ["BKM_OPENING_DONE"] = "0000000000",
        };

        var waves = SimulationHarness.Run(model, inputs, "BKM_CLOSE_INTO_FAULT");

        Assert.Equal(assumption, waves["BKM_CLOSE_INTO_FAULT"]);
    }

    private static readonly string[] Assumptions =
        ["BKM_CLOSING_TIME_MIN", "BKM_CLOSING_TIME_MAX", "BKM_OPENING_TIME_MIN", "BKM_OPENING_TIME_MAX"];

    private static string Pulse(int scan, int length) => new string('0', scan) + "1" + new string('0', length - scan - 1);
}
