using LogicProof.Model.Tests.Rules;
using LogicProof.Model.Tests.Simulation;

namespace LogicProof.Model.Tests.Plant;

/// <summary>
/// The failure options of the breaker model in the simulator, with the checker's choices given as inputs. Scans are
/// 2 ms, one character per scan. Closing 6 .. 10 ms is 3 .. 5 scans of travel, opening 4 .. 6 ms 2 .. 3 scans, the
/// spring recharge 10 .. 20 ms 5 .. 10 scans (invented settings). The close output at scan 1 is seen by the breaker
/// at scan 2.
/// </summary>
public sealed class BreakerFailureModelTests
{
    private static string Scheme(string options, string springRole = "") => RuleHarness.Header + $"""
        inputs CMD : bool; TRIP_CMD : bool; B52A : bool; B52B : bool; SPRING_OK : bool; end
        locals SPRING_SEEN : bool; end
        outputs CO : bool; TO : bool; end
        logic CO := CMD; TO := TRIP_CMD; SPRING_SEEN := SPRING_OK; end
        breaker_model
          closing_time = T#6ms .. T#10ms;
          opening_time = T#4ms .. T#6ms;
          {options}
        end
        roles close_output = CO; trip_output = TO; breaker_closed = B52A; breaker_open = B52B; {springRole} end
        """;

    private static readonly string[] TravelAssumptions =
        ["BKM_CLOSING_TIME_MIN", "BKM_CLOSING_TIME_MAX", "BKM_OPENING_TIME_MIN", "BKM_OPENING_TIME_MAX"];

    [Theory]
    // The mechanism ignores the coil at scans 2 .. 4 and closes from scan 5 (3 scans of travel, 52a at 8); or it
    // ignores the coil for ever and the breaker stays open, which no travel-time assumption forbids.
    [InlineData("0011100000", 8, "0000000011", "1111100000")]
    [InlineData("1111111111", -1, "0000000000", "1111111111")]
    public void Close_WhenTheBreakerMayFailToClose_StartsOnlyWhenTheMechanismResponds(string fails, int done, string closed, string open)
    {
        var model = RuleHarness.Model(Scheme("fails_to_close = TRUE;"));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "0111111111",
            ["BKM_CLOSE_FAILS"] = fails,
            ["BKM_CLOSING_DONE"] = done < 0 ? "0" : Pulse(done, 10),
        };

        var waves = SimulationHarness.Run(model, inputs, ["B52A", "B52B", .. TravelAssumptions]);

        Assert.Equal(closed, waves["B52A"]);
        Assert.Equal(open, waves["B52B"]);
        Assert.All(TravelAssumptions, a => Assert.Equal(new string('1', 10), waves[a]));
    }

    [Theory]
    // Closed at power-up. A trip seen at scan 2 only, ignored: the breaker stays closed. A standing trip ignored at
    // scans 2 .. 4: opening from scan 5, 52b at 7 after two scans of travel.
    [InlineData("0100000000", "0010000000", -1, "1111111111", "0000000000")]
    [InlineData("0111111111", "0011100000", 7, "1111100000", "0000000111")]
    public void Trip_WhenTheBreakerMayFailToTrip_OpensOnlyWhenTheMechanismResponds(string trip, string fails, int done, string closed, string open)
    {
        var model = RuleHarness.Model(Scheme("fails_to_trip = TRUE;"));
        var inputs = new Dictionary<string, string>
        {
            ["BKM_POWER_UP_CLOSED"] = "1",
            ["TRIP_CMD"] = trip,
            ["BKM_TRIP_FAILS"] = fails,
            ["BKM_OPENING_DONE"] = done < 0 ? "0" : Pulse(done, 10),
        };

        var waves = SimulationHarness.Run(model, inputs, ["B52A", "B52B", .. TravelAssumptions]);

        Assert.Equal(closed, waves["B52A"]);
        Assert.Equal(open, waves["B52B"]);
        Assert.All(TravelAssumptions, a => Assert.Equal(new string('1', 10), waves[a]));
    }

    [Theory]
    // Charged at power-up; the close starts at scan 2 and discharges the spring. A recharge of 5 scans (10 ms, the
    // shortest) meets the assumption; one of 4 scans breaks it at the scan it ends.
    [InlineData(7, "1100000111111111", "1111111111111111")]
    [InlineData(6, "1100001111111111", "1111110111111111")]
    public void Spring_WhenACloseStarts_IsDischargedAndRechargedWithinTheRechargeTime(int rechargeDone, string spring, string minimum)
    {
        var model = RuleHarness.Model(Scheme("spring_recharge_time = T#10ms .. T#20ms;", "spring_charged = SPRING_OK;"));
        var inputs = new Dictionary<string, string>
        {
            ["BKM_POWER_UP_CHARGED"] = "1",
            ["CMD"] = "0100000000000000",
            ["BKM_CLOSING_DONE"] = Pulse(5, 16),
            ["BKM_RECHARGE_DONE"] = Pulse(rechargeDone, 16),
        };

        var waves = SimulationHarness.Run(model, inputs, "SPRING_OK", "B52A", "BKM_RECHARGE_TIME_MIN", "BKM_RECHARGE_TIME_MAX");

        Assert.Equal(spring, waves["SPRING_OK"]);
        Assert.Equal("0000011111111111", waves["B52A"]);
        Assert.Equal(minimum, waves["BKM_RECHARGE_TIME_MIN"]);
        Assert.Equal(new string('1', 16), waves["BKM_RECHARGE_TIME_MAX"]);
    }

    [Fact]
    public void Spring_WhenUnchargedAtPowerUp_HoldsTheStandingCloseUntilRechargedAndMayEndEarly()
    {
        var model = RuleHarness.Model(Scheme("spring_recharge_time = T#10ms .. T#20ms;", "spring_charged = SPRING_OK;"));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "011111111111",
            ["BKM_RECHARGE_DONE"] = Pulse(4, 12),
            ["BKM_CLOSING_DONE"] = Pulse(8, 12),
        };

        var waves = SimulationHarness.Run(model, inputs, "SPRING_OK", "B52A", "BKM_RECHARGE_TIME_MIN", "BKM_RECHARGE_TIME_MAX");

        // Recharged at scan 4 (a recharge under way at the restart may end before the shortest time); the close coil,
        // on since scan 1, starts the travel at scan 5, which discharges the spring again; 52a after 3 scans.
        Assert.Equal("000010000000", waves["SPRING_OK"]);
        Assert.Equal("000000001111", waves["B52A"]);
        Assert.Equal(new string('1', 12), waves["BKM_RECHARGE_TIME_MIN"]);
        Assert.Equal(new string('1', 12), waves["BKM_RECHARGE_TIME_MAX"]);
    }

    [Fact]
    public void Contacts_WhenFreeDuringTravel_MayBothReadClosedWhileTheBreakerMoves()
    {
        var model = RuleHarness.Model(Scheme("travel_contacts_free = TRUE;"));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "0100000000",
            ["BKM_CLOSING_DONE"] = Pulse(5, 10),
            ["BKM_A_IN_TRAVEL"] = "0011000000",
            ["BKM_B_IN_TRAVEL"] = "0001100000",
        };

        var waves = SimulationHarness.Run(model, inputs, "B52A", "B52B");

        // Travel at scans 2 .. 4; at rest the contacts are exact again.
        Assert.Equal("0011011111", waves["B52A"]);
        Assert.Equal("1101100000", waves["B52B"]);
    }

    [Theory]
    // 52a fails at scan 1 stuck open (the value chosen then; later choices are ignored): it never reports the close.
    // 52b fails at power-up stuck closed: with the breaker closed both contacts read TRUE.
    [InlineData("BKM_A", "0100000000", "1011111111", "0000000000", "1100000000")]
    [InlineData("BKM_B", "1000000000", "1000000000", "0000011111", "1111111111")]
    public void Contacts_WhenAnAuxiliaryContactFails_StayAtTheValueChosenWhenItFailed(string contact, string fails, string value, string closed, string open)
    {
        var model = RuleHarness.Model(Scheme("aux_contact_fault = TRUE;"));
        var inputs = new Dictionary<string, string>
        {
            ["CMD"] = "0100000000",
            ["BKM_CLOSING_DONE"] = Pulse(5, 10),
            [contact + "_FAILS"] = fails,
            [contact + "_STUCK_VALUE"] = value,
        };

        var waves = SimulationHarness.Run(model, inputs, "B52A", "B52B");

        Assert.Equal(closed, waves["B52A"]);
        Assert.Equal(open, waves["B52B"]);
    }

    private static string Pulse(int scan, int length) => new string('0', scan) + "1" + new string('0', length - scan - 1);
}
