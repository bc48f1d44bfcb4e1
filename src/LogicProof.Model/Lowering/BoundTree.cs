using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;

namespace LogicProof.Model.Lowering;

/// <summary>
/// Stack-safe walks over bound expressions (a 1 MB equation is a tree hundreds of thousands of nodes deep).
/// Children are visited left to right, as written.
/// </summary>
internal static class BoundTree
{
    public static void AddChildren(BoundExpression expression, List<BoundExpression> into)
    {
        switch (expression)
        {
            case BoundUnary unary:
                into.Add(unary.Operand);
                break;
            case BoundBinary binary:
                into.Add(binary.Left);
                into.Add(binary.Right);
                break;
            case BoundFunctionCall call:
                into.AddRange(call.Arguments);
                break;
            case BoundFunctionBlockCall block:
                into.AddRange(block.Inputs);
                break;
            case BoundTemporal temporal:
                into.Add(temporal.Operand);
                break;
        }
    }

    /// <summary>Every node, parents before children, left to right.</summary>
    public static IEnumerable<BoundExpression> PreOrder(BoundExpression root)
    {
        var stack = new Stack<BoundExpression>();
        var children = new List<BoundExpression>();
        stack.Push(root);
        while (stack.Count > 0)
        {
            var node = stack.Pop();
            yield return node;
            children.Clear();
            AddChildren(node, children);
            for (var i = children.Count - 1; i >= 0; i--)
            {
                stack.Push(children[i]);
            }
        }
    }

    /// <summary>Every node, children before parents, left to right: the order in which a scan evaluates them.</summary>
    public static IEnumerable<BoundExpression> PostOrder(BoundExpression root)
    {
        var stack = new Stack<(BoundExpression Node, bool Expanded)>();
        var children = new List<BoundExpression>();
        stack.Push((root, false));
        while (stack.Count > 0)
        {
            var (node, expanded) = stack.Pop();
            if (expanded)
            {
                yield return node;
                continue;
            }

            stack.Push((node, true));
            children.Clear();
            AddChildren(node, children);
            for (var i = children.Count - 1; i >= 0; i--)
            {
                stack.Push((children[i], false));
            }
        }
    }

    /// <summary>
    /// True for the nodes that become an instance with its own memory and a numbered hidden name
    /// (<c>X.TON#1</c>, <c>R.ONCE#2</c>): function-block calls, past-time operators and SINCE.
    /// </summary>
    private static bool IsNumberedInstance(BoundExpression expression) =>
        expression is BoundFunctionBlockCall or BoundTemporal
        || expression is BoundBinary { Operator: BinaryOperator.Since };

    /// <summary>Instances numbered 1, 2, ... in evaluation order (inner first, left to right), keyed by node identity.</summary>
    public static Dictionary<BoundExpression, int> NumberInstances(BoundExpression root)
    {
        var numbers = new Dictionary<BoundExpression, int>(ReferenceEqualityComparer.Instance);
        foreach (var node in PostOrder(root))
        {
            if (IsNumberedInstance(node))
            {
                numbers.Add(node, numbers.Count + 1);
            }
        }

        return numbers;
    }

    /// <summary>The standard name of a function block, as used in hidden names and reports.</summary>
    public static string BlockName(FunctionBlockKind kind) => kind switch
    {
        FunctionBlockKind.Ton => "TON",
        FunctionBlockKind.Tof => "TOF",
        FunctionBlockKind.Tp => "TP",
        FunctionBlockKind.RTrig => "R_TRIG",
        FunctionBlockKind.FTrig => "F_TRIG",
        FunctionBlockKind.Sr => "SR",
        FunctionBlockKind.Rs => "RS",
        _ => throw new InvalidOperationException($"unknown function block kind {kind}"),
    };

    public static string TemporalName(TemporalOperator op) => op switch
    {
        TemporalOperator.Prev => "PREV",
        TemporalOperator.Rose => "ROSE",
        TemporalOperator.Fell => "FELL",
        TemporalOperator.Once => "ONCE",
        TemporalOperator.Historically => "HISTORICALLY",
        TemporalOperator.Held => "HELD",
        TemporalOperator.Within => "WITHIN",
        _ => throw new InvalidOperationException($"unknown past-time operator {op}"),
    };
}
