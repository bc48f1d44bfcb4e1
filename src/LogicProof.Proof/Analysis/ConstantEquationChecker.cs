using LogicProof.Core.Diagnostics;
using LogicProof.Core.Threading;
using LogicProof.Model.Scan;
using LogicProof.Proof.Encoding;
using LogicProof.Proof.Engines;
using Microsoft.Z3;
using Z3Model = Microsoft.Z3.Model;

namespace LogicProof.Proof.Analysis;

/// <summary>
/// Finds equations whose value is the same at every scan of every input sequence the assumptions allow: such an
/// equation has no effect and usually hides a mistake (a permissive that can never be given, a reset that always
/// wins). Each bool variable written by an equation (or by the function block that is its whole right side) is a
/// candidate, except an equation that reads no cell at all (a literal constant written on purpose, such as a
/// disabled option).
/// <para>
/// The check is k-induction on "cell = v" for k up to <see cref="ConstantCheckOptions.InductionDepth"/>: the value v
/// is taken from some first scan; the base case asks whether the cell can differ from v in the first k steps from
/// power-up (accelerated steps), the step case whether k single scans with the cell at v can be followed by one
/// with another value. Only a candidate whose step case is unsatisfiable is reported, so a warning is a proof; a
/// candidate the solver cannot decide in time is not reported. Nothing is reported when no first scan satisfies the
/// assumptions (everything would be constant for a vacuous reason).
/// </para>
/// </summary>
public static class ConstantEquationChecker
{
    public static IReadOnlyList<Diagnostic> Check(
        ScanModel model, ConstantCheckOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        options ??= new ConstantCheckOptions();
        var candidates = Candidates(model);
        if (candidates.Count == 0)
        {
            return [];
        }

        return LargeStack.Run(() =>
        {
            using var session = new SolverSession(options.TimeLimit, cancellationToken);
            try
            {
                return Prove(session, model, candidates, options);
            }
            catch (Z3Exception) when (session.IsStopped)
            {
                return [];
            }
        });
    }

    private static List<ScanStep> Candidates(ScanModel model) =>
    [
        .. model.Steps
            .Take(model.EquationStepCount)
            .Where(step => model.Cells[step.Target] is { Kind: CellKind.Variable, Type: SignalType.Bool })
            .Where(step => step is not AssignStep assign || (ReadsSomeCell(assign.Value) && !IsHold(assign))),
    ];

    private static List<Diagnostic> Prove(SolverSession session, ScanModel model, List<ScanStep> candidates, ConstantCheckOptions options)
    {
        using var baseSolver = session.NewSolver();
        using var stepSolver = session.NewSolver();
        var forward = new Unrolling(
            new ScanEncoder(session.Context, model, UnrollingEncoding.For(accelerate: true)), baseSolver, "const.base", fromPowerUp: true, accelerate: true, []);
        forward.AddStep();
        if (session.Check(baseSolver) != Status.SATISFIABLE)
        {
            return [];
        }

        var first = baseSolver.Model;
        var open = new Dictionary<ScanStep, bool>(ReferenceEqualityComparer.Instance);
        foreach (var candidate in candidates)
        {
            open[candidate] = first.Eval(forward.CellAt(0, candidate.Target), true).IsTrue;
        }

        var depth = Math.Max(1, options.InductionDepth);

        // Base case: the cell equals its value in every one of the first `depth` steps from power-up.
        for (var k = 0; k < depth && open.Count > 0; k++)
        {
            if (k > 0)
            {
                forward.AddStep();
            }

            foreach (var (step, value) in open.ToList())
            {
                if (!open.ContainsKey(step))
                {
                    continue;
                }

                var differs = forward.Guard(Differs(forward, k, step.Target, value), "differs");
                var status = session.Check(baseSolver, differs);
                if (status == Status.SATISFIABLE)
                {
                    DropRefuted(open, forward, baseSolver.Model);
                }
                else if (status != Status.UNSATISFIABLE)
                {
                    open.Remove(step);
                }
            }
        }

        // Step case: depth k scans at the value, then one that differs; k grows only while candidates remain.
        var proved = new List<(ScanStep Step, bool Value, int Depth)>();
        var induction = new Unrolling(
            new ScanEncoder(session.Context, model, UnrollingEncoding.For(accelerate: false)), stepSolver, "const.step", fromPowerUp: false, accelerate: false, options.Lemmas);
        induction.AddStep();
        for (var k = 1; k <= depth && open.Count > 0; k++)
        {
            induction.AddStep();
            foreach (var (step, value) in open.ToList())
            {
                var window = Enumerable.Range(0, k)
                    .Select(j => session.Context.MkNot(Differs(induction, j, step.Target, value)))
                    .Append(Differs(induction, k, step.Target, value));
                var status = session.Check(stepSolver, induction.Guard(session.Context.MkAnd(window), "inductive"));
                if (status == Status.UNSATISFIABLE)
                {
                    proved.Add((step, value, k));
                    open.Remove(step);
                }
                else if (status != Status.SATISFIABLE)
                {
                    open.Remove(step);
                }
            }
        }

        return [.. proved.OrderBy(p => p.Step.Span.Offset).Select(p => Warning(model, p.Step, p.Value))];
    }

    private static BoolExpr Differs(Unrolling unrolling, int step, int cell, bool value)
    {
        var term = unrolling.CellAt(step, cell);
        return value ? unrolling.Context.MkNot(term) : term;
    }

    /// <summary>A model that shows one candidate differing from its value usually shows others too.</summary>
    private static void DropRefuted(Dictionary<ScanStep, bool> open, Unrolling unrolling, Z3Model solution)
    {
        foreach (var (step, value) in open.ToList())
        {
            for (var k = 0; k < unrolling.Count; k++)
            {
                if (solution.Eval(unrolling.CellAt(k, step.Target), true).IsTrue != value)
                {
                    open.Remove(step);
                    break;
                }
            }
        }
    }

    private static Diagnostic Warning(ScanModel model, ScanStep step, bool value)
    {
        var name = model.Cells[step.Target].Name;
        var text = value ? "TRUE" : "FALSE";
        return new Diagnostic(
            ProofCodes.ConstantEquation,
            Severity.Warning,
            $"'{name}' is {text} at every scan for every input sequence, so its equation has no effect; check the terms it combines",
            step.Span);
    }

    private static bool IsHold(AssignStep step) =>
        step.Value is CellReadExpression { Timing: ReadTiming.Previous } read && read.Cell == step.Target;

    private static bool ReadsSomeCell(ScanExpression expression) => expression switch
    {
        CellReadExpression => true,
        NotExpression not => ReadsSomeCell(not.Operand),
        AndExpression and => and.Operands.Any(ReadsSomeCell),
        OrExpression or => or.Operands.Any(ReadsSomeCell),
        XorExpression xor => ReadsSomeCell(xor.Left) || ReadsSomeCell(xor.Right),
        ImpliesExpression implies => ReadsSomeCell(implies.Left) || ReadsSomeCell(implies.Right),
        CompareExpression compare => ReadsSomeCell(compare.Left) || ReadsSomeCell(compare.Right),
        AddExpression add => ReadsSomeCell(add.Left) || ReadsSomeCell(add.Right),
        SubtractExpression subtract => ReadsSomeCell(subtract.Left) || ReadsSomeCell(subtract.Right),
        NegateExpression negate => ReadsSomeCell(negate.Operand),
        ScaleExpression scale => ReadsSomeCell(scale.Operand),
        AbsExpression abs => ReadsSomeCell(abs.Operand),
        MinExpression min => ReadsSomeCell(min.Left) || ReadsSomeCell(min.Right),
        MaxExpression max => ReadsSomeCell(max.Left) || ReadsSomeCell(max.Right),
        _ => false,
    };
}
