using System.Globalization;
using Microsoft.Z3;

namespace LogicProof.Proof.Pdr;

/// <summary>
/// Runs one <see cref="HornSystem"/> through Z3's Fixedpoint with the Spacer engine and reads the answer. A time
/// limit is Spacer's own "timeout"; a cancelled query is interrupted by the <see cref="SpacerSession"/>, which Z3
/// reports as a "canceled" error: both become <see cref="SpacerOutcome.Unknown"/>, never a verdict.
/// </summary>
internal static class SpacerQuery
{
    public static SpacerAnswer Run(HornSystem system, SpacerSession session, TimeSpan? remaining)
    {
        var context = system.Encoder.Context;
        using var fixedpoint = context.MkFixedpoint();
        var parameters = context.MkParams()
            .Add("engine", "spacer")
            .Add("xform.slice", true)
            .Add("xform.inline_linear", true)
            .Add("xform.inline_eager", true);
        if (remaining is { } limit)
        {
            parameters.Add("timeout", (uint)Math.Clamp(Math.Ceiling(limit.TotalMilliseconds), 1, uint.MaxValue));
        }

        fixedpoint.Parameters = parameters;
        fixedpoint.RegisterRelation(system.Invariant);
        fixedpoint.AddRule(system.Init, context.MkSymbol("power_up"));
        fixedpoint.AddRule(system.Step, context.MkSymbol("scan"));

        Status status;
        try
        {
            status = session.Run(() => fixedpoint.Query(system.Query));
        }
        catch (Z3Exception e)
        {
            return new SpacerAnswer(SpacerOutcome.Unknown, null, e.Message);
        }

        return status switch
        {
            Status.UNSATISFIABLE => new SpacerAnswer(SpacerOutcome.Holds, ReadInvariant(system, fixedpoint), null),
            Status.SATISFIABLE => new SpacerAnswer(SpacerOutcome.Violated, null, null),
            _ => new SpacerAnswer(SpacerOutcome.Unknown, null, fixedpoint.GetReasonUnknown()),
        };
    }

    /// <summary>Spacer's inductive invariant (the interpretation of Inv), written over the slot names.</summary>
    private static string ReadInvariant(HornSystem system, Fixedpoint fixedpoint)
    {
        var context = system.Encoder.Context;
        var model = system.Encoder.Model;
        try
        {
            var cover = fixedpoint.GetCoverDelta(-1, system.Invariant);

            // The cover's free variables are the arguments of Inv; de Bruijn index i is argument i.
            var names = model.StateSlots
                .Select(s => context.MkConst(s.Name, system.Encoder.SlotSort(s.Index)))
                .ToArray();
            return InvariantText.Write(cover.SubstituteVars(names).Simplify());
        }
        catch (Z3Exception e)
        {
            return string.Create(CultureInfo.InvariantCulture, $"(the invariant could not be read: {e.Message})");
        }
    }
}
