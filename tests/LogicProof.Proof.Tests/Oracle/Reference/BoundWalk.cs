using LogicProof.Language.Binding;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>Every node of a bound expression, parents before children (the reference's own walk).</summary>
internal static class BoundWalk
{
    public static IEnumerable<BoundExpression> Nodes(BoundExpression root)
    {
        yield return root;
        IEnumerable<BoundExpression> children = root switch
        {
            BoundUnary unary => [unary.Operand],
            BoundBinary binary => [binary.Left, binary.Right],
            BoundFunctionCall call => call.Arguments,
            BoundFunctionBlockCall block => block.Inputs,
            BoundTemporal temporal => [temporal.Operand],
            _ => [],
        };
        foreach (var node in children.SelectMany(Nodes))
        {
            yield return node;
        }
    }

    public static IEnumerable<string> VariablesRead(BoundExpression root) =>
        Nodes(root).OfType<BoundSymbolReference>()
            .Where(r => r.Symbol.Kind is SymbolKind.Local or SymbolKind.Output)
            .Select(r => r.Symbol.Name);
}
