using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// One ordinary scan, symbolically: the term of every cell (indexed by cell; inputs are the input terms) and the
/// term of every state slot at the end of the scan (<see cref="Next"/>), all over the state at the start of the
/// scan and that scan's inputs.
/// </summary>
public sealed class SymbolicScan
{
    private readonly IReadOnlyList<Expr?> _cells;

    public SymbolicScan(SymbolicState start, SymbolicInputs inputs, IReadOnlyList<Expr?> cells, SymbolicState next)
    {
        Start = start;
        Inputs = inputs;
        _cells = cells;
        Next = next;
    }

    public SymbolicState Start { get; }

    public SymbolicInputs Inputs { get; }

    public SymbolicState Next { get; }

    public int CellCount => _cells.Count;

    /// <summary>The term of a cell in this scan; every cell of a well-formed model has one.</summary>
    public Expr Cell(int cell) => _cells[cell]
        ?? throw new InvalidOperationException($"Cell {cell} is neither an input nor written by a step of the model.");

    public bool HasCell(int cell) => _cells[cell] is not null;

    public BoolExpr BoolCell(int cell) => Cell(cell) as BoolExpr
        ?? throw new InvalidOperationException($"Cell {cell} is not a bool cell.");
}
