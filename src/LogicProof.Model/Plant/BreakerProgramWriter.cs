namespace LogicProof.Model.Plant;

/// <summary>
/// Writes the breaker model in the language. The breaker has four positions: open at rest, closing, closed at rest,
/// opening (CLOSING and OPENING TRUE during travel, CLOSED TRUE at rest closed). Scan by scan:
/// <list type="bullet">
/// <item>The breaker sees the coil outputs of the last scan (CLOSE_COIL and TRIP_COIL, copied at the end of every
/// scan and FALSE at power-up: the relay's outputs were de-energised before it started), so travel starts the
/// scan after an output is energised.</item>
/// <item>Open at rest and the close coil seen: closing starts (with trip_free, not while the trip coil is seen too).
/// The travel ends at a scan the checker chooses (CLOSING_DONE); the assumptions make the travel last at least the
/// shortest and at most the longest closing_time, counted in whole scans and rounded up as a timer preset is.
/// A travel of m scans that starts at scan s gives 52a at scan s + m.</item>
/// <item>Closed at rest and the trip coil seen: opening starts, and ends within opening_time the same way.</item>
/// <item>With trip_free, the trip coil seen during closing aborts the close: the breaker goes straight to opening.
/// Without it, the close completes and the breaker opens afterwards.</item>
/// <item>52a is TRUE exactly when closed at rest; 52b exactly when open at rest; during travel both are FALSE.</item>
/// <item>At power-up the breaker is open or closed at rest, as the checker chooses (POWER_UP_CLOSED).</item>
/// <item>With close_into_fault, the breaker closes onto a fault: the protection trip command is TRUE at some scan
/// from the shortest to the longest close_into_fault_delay after the breaker closed, unless it opened before. At
/// other times the command stays free.</item>
/// </list>
/// Failure options, each off unless written (common practice failure modes of a circuit breaker and its auxiliary
/// switch, from memory):
/// <list type="bullet">
/// <item>fails_to_close: at any scan the checker may choose that the mechanism ignores the close coil
/// (CLOSE_FAILS: a stuck latch or an open close coil), so a close may never come and the close-fail path runs.</item>
/// <item>fails_to_trip: likewise for the trip coil (TRIP_FAILS), also during a trip-free abort, so the breaker may
/// stay closed and the breaker-failure path runs.</item>
/// <item>spring_recharge_time: the closing spring (SPRING, driving the spring_charged input) is discharged by the
/// start of every close and recharged by its motor within the range; a close starts only on a charged spring (the
/// spring limit switch blocks the close coil). At power-up the checker chooses charged or recharging; a recharge
/// under way since power-up may end at any scan up to the longest time (the restart may have come mid-recharge).</item>
/// <item>travel_contacts_free: during travel 52a and 52b each take the value the checker chooses at that scan
/// (A_IN_TRAVEL, B_IN_TRAVEL): auxiliary contacts switch at points of the travel that differ from one breaker to
/// the next, so both may be TRUE or both FALSE.</item>
/// <item>aux_contact_fault: 52a (and likewise 52b) may fail at any scan (A_FAILS) and from then on reads the value
/// chosen at that scan (A_STUCK_VALUE), whatever the breaker does: a broken linkage or an open wire.</item>
/// </list>
/// Every assumption can always be met by some choice of the free inputs, so it never cuts off the scheme's own
/// behaviour. All names start with the prefix, which is chosen so that no name of the scheme starts with it.
/// </summary>
internal static class BreakerProgramWriter
{
    public static BreakerProgram Write(BreakerModelSettings settings, BreakerConnections scheme, string prefix)
    {
        string N(string suffix) => prefix + suffix;
        var block = settings.Span;
        var closing = settings.ClosingTime.Span;
        var opening = settings.OpeningTime.Span;
        var tripFree = settings.TripFree;
        var spring = settings.SpringRechargeTime;

        var inputs = new List<BreakerProgramDeclaration>
        {
            new(N("POWER_UP_CLOSED"), "breaker model: the breaker is closed when the relay powers up (the checker chooses)", block),
            new(N("CLOSING_DONE"), "breaker model: the closing travel ends at this scan (the checker chooses, within closing_time)", closing),
            new(N("OPENING_DONE"), "breaker model: the opening travel ends at this scan (the checker chooses, within opening_time)", opening),
        };
        if (settings.FailsToClose)
        {
            inputs.Add(new(N("CLOSE_FAILS"), "breaker model: the mechanism ignores the close coil at this scan (fails to close; the checker chooses)", block));
        }

        if (settings.FailsToTrip)
        {
            inputs.Add(new(N("TRIP_FAILS"), "breaker model: the mechanism ignores the trip coil at this scan (fails to trip; the checker chooses)", block));
        }

        if (spring is not null)
        {
            inputs.Add(new(N("POWER_UP_CHARGED"), "breaker model: the closing spring is charged when the relay powers up (the checker chooses)", spring.Span));
            inputs.Add(new(N("RECHARGE_DONE"), "breaker model: the spring recharge ends at this scan (the checker chooses, within spring_recharge_time)", spring.Span));
        }

        var locals = new List<BreakerProgramDeclaration>
        {
            new(N("STARTED"), "breaker model: FALSE during the first scan only", block),
            new(N("CLOSE_COIL"), $"breaker model: {scheme.CloseOutput} at the end of the last scan", block),
            new(N("TRIP_COIL"), $"breaker model: {scheme.TripOutput} at the end of the last scan", block),
            new(N("WAS_CLOSED"), "breaker model: closed at rest at the end of the last scan (at the first scan, the power-up position)", block),
        };
        if (tripFree)
        {
            locals.Add(new(N("ABORT"), "breaker model: the trip coil seen during closing travel aborts the close (trip-free)", block));
        }

        locals.AddRange(
        [
            new(N("CLOSE_COMPLETES"), "breaker model: the closing travel ends at this scan, breaker closed", closing),
            new(N("OPEN_COMPLETES"), "breaker model: the opening travel ends at this scan, breaker open", opening),
            new(N("CLOSED"), "breaker model: main contacts closed, at rest", block),
            new(N("CLOSING"), "breaker model: closing travel", closing),
            new(N("OPENING"), "breaker model: opening travel", opening),
        ]);
        if (spring is not null)
        {
            locals.AddRange(
            [
                new(N("WAS_CHARGED"), "breaker model: the spring was charged at the end of the last scan (at the first scan, the power-up state)", spring.Span),
                new(N("CLOSE_STARTS"), "breaker model: the closing travel starts at this scan and discharges the spring", closing),
                new(N("RECHARGE_COMPLETES"), "breaker model: the spring recharge ends at this scan", spring.Span),
                new(N("SPRING"), "breaker model: the closing spring is charged", spring.Span),
            ]);
        }

        // The trip coil as the mechanism obeys it; the close start as the mechanism obeys it.
        var tripActs = settings.FailsToTrip ? $"({N("TRIP_COIL")} AND NOT {N("TRIP_FAILS")})" : N("TRIP_COIL");
        var abortTerm = tripFree ? $" AND NOT {N("ABORT")}" : string.Empty;
        var closeStart = $"NOT {N("WAS_CLOSED")} AND NOT {N("CLOSING")} AND NOT {N("OPENING")} AND {N("CLOSE_COIL")}"
                         + (tripFree ? $" AND NOT {N("TRIP_COIL")}" : string.Empty)
                         + (spring is not null ? $" AND {N("WAS_CHARGED")}" : string.Empty)
                         + (settings.FailsToClose ? $" AND NOT {N("CLOSE_FAILS")}" : string.Empty);
        var first = new List<BreakerProgramStatement>
        {
            new(N("WAS_CLOSED"), $"(NOT {N("STARTED")} AND {N("POWER_UP_CLOSED")}) OR ({N("STARTED")} AND {N("CLOSED")})", block),
        };
        if (spring is not null)
        {
            first.Add(new(N("WAS_CHARGED"), $"(NOT {N("STARTED")} AND {N("POWER_UP_CHARGED")}) OR ({N("STARTED")} AND {N("SPRING")})", spring.Span));
        }

        if (tripFree)
        {
            first.Add(new(N("ABORT"), $"{N("CLOSING")} AND {tripActs}", block));
        }

        first.AddRange(
        [
            new(N("CLOSE_COMPLETES"), $"{N("CLOSING")} AND {N("CLOSING_DONE")}{abortTerm}", closing),
            new(N("OPEN_COMPLETES"), $"{N("OPENING")} AND {N("OPENING_DONE")}", opening),
            new(N("CLOSED"), $"({N("WAS_CLOSED")} AND NOT {tripActs}) OR {N("CLOSE_COMPLETES")}", block),
        ]);
        if (spring is not null)
        {
            // Written before CLOSING and OPENING, so it reads their values of the last scan, as the inline term does.
            first.Add(new(N("CLOSE_STARTS"), closeStart, closing));
            closeStart = N("CLOSE_STARTS");
        }
        else
        {
            closeStart = $"({closeStart})";
        }

        first.AddRange(
        [
            new(N("CLOSING"), $"{closeStart} OR ({N("CLOSING")} AND NOT {N("CLOSING_DONE")}{abortTerm})", closing),
            new(
                N("OPENING"),
                $"({N("WAS_CLOSED")} AND {tripActs})" + (tripFree ? $" OR {N("ABORT")}" : string.Empty)
                + $" OR ({N("OPENING")} AND NOT {N("OPENING_DONE")})",
                opening),
        ]);
        if (spring is not null)
        {
            first.Add(new(N("RECHARGE_COMPLETES"), $"NOT {N("WAS_CHARGED")} AND {N("RECHARGE_DONE")}", spring.Span));
            first.Add(new(N("SPRING"), $"({N("WAS_CHARGED")} AND NOT {N("CLOSE_STARTS")}) OR {N("RECHARGE_COMPLETES")}", spring.Span));
        }

        first.Add(new(N("STARTED"), "TRUE", block));
        var driven = new List<string>();
        var contacts = new BreakerContactWriter(settings, prefix, inputs, locals, first);
        if (scheme.ClosedStatus is { } closedStatus)
        {
            contacts.Drive(closedStatus, "A", "52a", N("CLOSED"));
            driven.Add(closedStatus);
        }

        if (scheme.OpenStatus is { } openStatus)
        {
            contacts.Drive(openStatus, "B", "52b", $"NOT {N("CLOSED")} AND NOT {N("CLOSING")} AND NOT {N("OPENING")}");
            driven.Add(openStatus);
        }

        if (spring is not null && scheme.SpringStatus is { } springStatus)
        {
            first.Add(new(springStatus, N("SPRING"), spring.Span));
            driven.Add(springStatus);
        }

        var last = new List<BreakerProgramStatement>
        {
            new(N("CLOSE_COIL"), scheme.CloseOutput, block),
            new(N("TRIP_COIL"), scheme.TripOutput, block),
        };

        var assumptions = new List<BreakerProgramStatement>
        {
            new(N("CLOSING_TIME_MIN"), $"{N("CLOSE_COMPLETES")} -> HELD({N("CLOSING")} OR {N("CLOSE_COMPLETES")}, {settings.ClosingTime.LowText})", closing),
            new(N("CLOSING_TIME_MAX"), $"NOT HELD({N("CLOSING")}, {settings.ClosingTime.HighText})", closing),
            new(N("OPENING_TIME_MIN"), $"{N("OPEN_COMPLETES")} -> HELD({N("OPENING")} OR {N("OPEN_COMPLETES")}, {settings.OpeningTime.LowText})", opening),
            new(N("OPENING_TIME_MAX"), $"NOT HELD({N("OPENING")}, {settings.OpeningTime.HighText})", opening),
        };
        if (spring is not null)
        {
            // As for travel, with "not charged" in the place of the travel; HISTORICALLY lets a recharge that was
            // already under way at power-up end early.
            var recharging = $"NOT {N("SPRING")} OR {N("RECHARGE_COMPLETES")}";
            assumptions.Add(new(
                N("RECHARGE_TIME_MIN"),
                $"{N("RECHARGE_COMPLETES")} -> (HELD({recharging}, {spring.LowText}) OR HISTORICALLY({recharging}))",
                spring.Span));
            assumptions.Add(new(N("RECHARGE_TIME_MAX"), $"NOT HELD(NOT {N("SPRING")}, {spring.HighText})", spring.Span));
        }

        if (settings.CloseIntoFaultDelay is { } delay && scheme.ProtectionTrip is { } protection)
        {
            assumptions.Add(new(
                N("CLOSE_INTO_FAULT"),
                $"HELD({N("CLOSED")}, {delay.HighText}) -> ({N("CLOSED")} SINCE ({protection} AND HELD({N("CLOSED")}, {delay.LowText})))",
                delay.Span));
        }

        return new BreakerProgram(prefix, inputs, locals, first, last, assumptions, driven);
    }
}
