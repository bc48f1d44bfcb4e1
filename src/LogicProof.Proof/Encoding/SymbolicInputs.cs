using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>The solver term of every input cell at one step: Bool or Real. Indexed by cell index.</summary>
public sealed class SymbolicInputs
{
    private readonly IReadOnlyDictionary<int, Expr> _byCell;

    public SymbolicInputs(IReadOnlyDictionary<int, Expr> byCell)
    {
        _byCell = byCell;
    }

    public IEnumerable<int> Cells => _byCell.Keys;

    public Expr this[int cell] => _byCell.TryGetValue(cell, out var value)
        ? value
        : throw new InvalidOperationException($"Cell {cell} is not an input of the model.");
}
