using Microsoft.Z3;
using Z3Model = Microsoft.Z3.Model;

namespace LogicProof.Proof.Engines;

/// <summary>
/// Makes an accelerated counterexample as short in scans as it can be with a given number of steps: among the
/// traces that satisfy the query (a violation first reached at the failing step) it finds one whose strides before
/// the failing step add up to the least number of scans, by binary search on a bound on that sum, each bound passed
/// as an assumption literal. If the time runs out during the search, the shortest trace found so far is kept (it is
/// still a valid violation).
/// </summary>
internal static class ScanShortener
{
    /// <summary>The least sum found, searched between <paramref name="atLeast"/> and the sum in <paramref name="found"/>.</summary>
    public static Z3Model Shorten(
        SolverSession session, Unrolling unrolling, IReadOnlyList<BoolExpr> query, int failingStep, Z3Model found, long atLeast)
    {
        if (!unrolling.Accelerated || failingStep == 0)
        {
            return found;
        }

        var atMost = unrolling.ScansBeforeAtMost(failingStep);
        var best = found;
        var bestTotal = TraceExtractor.ScansBefore(unrolling, found, failingStep);
        var lowest = Math.Max(atLeast, failingStep);
        while (lowest < bestTotal)
        {
            var middle = lowest + ((bestTotal - lowest) / 2);
            var status = session.Check(unrolling.Solver, [.. query, unrolling.Guard(atMost(middle), "scans")]);
            if (status == Status.SATISFIABLE)
            {
                best = unrolling.Solver.Model;
                bestTotal = TraceExtractor.ScansBefore(unrolling, best, failingStep);
            }
            else if (status == Status.UNSATISFIABLE)
            {
                lowest = middle + 1;
            }
            else
            {
                break;
            }
        }

        return best;
    }
}
