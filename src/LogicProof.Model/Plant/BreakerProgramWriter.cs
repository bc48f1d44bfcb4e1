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

        var inputs = new List<BreakerProgramDeclaration>
        {
            new(N("POWER_UP_CLOSED"), "breaker model: the breaker is closed when the relay powers up (the checker chooses)", block),
            new(N("CLOSING_DONE"), "breaker model: the closing travel ends at this scan (the checker chooses, within closing_time)", closing),
            new(N("OPENING_DONE"), "breaker model: the opening travel ends at this scan (the checker chooses, within opening_time)", opening),
        };
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

        var abortTerm = tripFree ? $" AND NOT {N("ABORT")}" : string.Empty;
        var first = new List<BreakerProgramStatement>
        {
            new(N("WAS_CLOSED"), $"(NOT {N("STARTED")} AND {N("POWER_UP_CLOSED")}) OR ({N("STARTED")} AND {N("CLOSED")})", block),
        };
        if (tripFree)
        {
            first.Add(new(N("ABORT"), $"{N("CLOSING")} AND {N("TRIP_COIL")}", block));
        }

        first.AddRange(
        [
            new(N("CLOSE_COMPLETES"), $"{N("CLOSING")} AND {N("CLOSING_DONE")}{abortTerm}", closing),
            new(N("OPEN_COMPLETES"), $"{N("OPENING")} AND {N("OPENING_DONE")}", opening),
            new(N("CLOSED"), $"({N("WAS_CLOSED")} AND NOT {N("TRIP_COIL")}) OR {N("CLOSE_COMPLETES")}", block),
            new(
                N("CLOSING"),
                $"(NOT {N("WAS_CLOSED")} AND NOT {N("CLOSING")} AND NOT {N("OPENING")} AND {N("CLOSE_COIL")}"
                + (tripFree ? $" AND NOT {N("TRIP_COIL")})" : ")")
                + $" OR ({N("CLOSING")} AND NOT {N("CLOSING_DONE")}{abortTerm})",
                closing),
            new(
                N("OPENING"),
                $"({N("WAS_CLOSED")} AND {N("TRIP_COIL")})" + (tripFree ? $" OR {N("ABORT")}" : string.Empty)
                + $" OR ({N("OPENING")} AND NOT {N("OPENING_DONE")})",
                opening),
            new(N("STARTED"), "TRUE", block),
        ]);
        var driven = new List<string>();
        if (scheme.ClosedStatus is { } closedStatus)
        {
            first.Add(new(closedStatus, N("CLOSED"), block));
            driven.Add(closedStatus);
        }

        if (scheme.OpenStatus is { } openStatus)
        {
            first.Add(new(openStatus, $"NOT {N("CLOSED")} AND NOT {N("CLOSING")} AND NOT {N("OPENING")}", block));
            driven.Add(openStatus);
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
