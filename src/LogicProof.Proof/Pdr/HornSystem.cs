using LogicProof.Model.Scan;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Lemmas;
using Microsoft.Z3;

namespace LogicProof.Proof.Pdr;

/// <summary>
/// A property of a scan model as constrained Horn clauses over one invariant predicate Inv(state), with counters as
/// Int (Spacer's interpolation works over linear arithmetic):
/// <list type="number">
/// <item>Init: every power-up state (known slots fixed, unknown latches free, counters in range) satisfies Inv.</item>
/// <item>Step: from a state in Inv, inputs within range, a step whose assumptions and property both hold (with
/// acceleration, any allowed stride) leads to a state in Inv.</item>
/// <item>Query: a state in Inv and inputs within range under which the assumptions hold and the property is FALSE.</item>
/// </list>
/// The query is satisfiable exactly when BMC finds a violation at some depth: BMC asks for a path whose every step
/// satisfies the assumptions and whose last step falsifies the property, and a shortest such path has the property
/// TRUE before its last step, which is why the step clause may require it (it only makes Inv smaller). Acceleration
/// changes only how many steps a path takes, not which states it reaches (see <see cref="TimeAcceleration"/>).
/// Lemmas, being invariants of those reachable states, are conjoined to the step and the query.
/// </summary>
internal sealed class HornSystem
{
    public HornSystem(ScanEncoder encoder, ModelProperty property, IReadOnlyList<Lemma> lemmas, bool accelerate)
    {
        Encoder = encoder;
        var context = encoder.Context;
        var model = encoder.Model;
        Invariant = context.MkFuncDecl("Inv", [.. model.StateSlots.Select(s => encoder.SlotSort(s.Index))], context.BoolSort);

        var powerUp = encoder.NewState("init");
        Init = Forall(
            context,
            [.. powerUp.Slots],
            context.MkImplies(
                context.MkAnd(encoder.InitialCondition(powerUp), encoder.StateRange(powerUp)),
                Holds(powerUp)));

        var start = encoder.NewState("s");
        var inputs = encoder.NewInputs("i");
        var stride = accelerate ? encoder.NewStride("m") : null;
        var step = encoder.EncodeStep(start, inputs, stride);
        var known = context.MkAnd(
            [
                Holds(start),
                encoder.StateRange(start),
                encoder.InputRange(inputs),
                encoder.AssumptionsHold(step.Scan),
                .. lemmas.Select(l => encoder.EncodeLemma(l, start)),
            ]);
        var bound = start.Slots.Concat(inputs.Cells.Select(c => inputs[c])).ToList();
        if (stride is not null)
        {
            bound.Add(stride);
        }

        Step = Forall(
            context,
            [.. bound],
            context.MkImplies(
                context.MkAnd(known, step.Allowed, step.Scan.BoolCell(property.Cell)),
                Holds(step.Next)));

        var queryBound = start.Slots.Concat(inputs.Cells.Select(c => inputs[c])).ToArray();
        var violation = context.MkAnd(known, context.MkNot(step.Scan.BoolCell(property.Cell)));
        Query = queryBound.Length == 0 ? violation : context.MkExists(queryBound, violation);
    }

    public ScanEncoder Encoder { get; }

    /// <summary>The predicate Inv over the state slots, in slot order.</summary>
    public FuncDecl Invariant { get; }

    public BoolExpr Init { get; }

    public BoolExpr Step { get; }

    public BoolExpr Query { get; }

    /// <summary>A closed rule; Z3 rejects a quantifier without bound variables (a model without state or inputs).</summary>
    private static BoolExpr Forall(Context context, Expr[] bound, BoolExpr body) =>
        bound.Length == 0 ? body : context.MkForall(bound, body);

    private BoolExpr Holds(SymbolicState state) => (BoolExpr)Invariant.Apply([.. state.Slots]);
}
