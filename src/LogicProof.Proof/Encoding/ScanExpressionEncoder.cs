using LogicProof.Model.Scan;
using Microsoft.Z3;

namespace LogicProof.Proof.Encoding;

/// <summary>
/// Translates the expressions of one scan. A current read takes the cell's term already computed in this scan; a
/// previous read takes the cell's PreviousValue slot of the start state. Results are cached per expression node
/// (by reference), so a sub-expression shared in the model is translated once; Z3 shares identical terms itself.
/// </summary>
internal sealed class ScanExpressionEncoder
{
    private readonly Context _context;
    private readonly Func<int, Expr> _currentCell;
    private readonly Func<int, Expr> _previousCell;
    private readonly Dictionary<ScanExpression, Expr> _cache = new(ReferenceEqualityComparer.Instance);

    public ScanExpressionEncoder(Context context, Func<int, Expr> currentCell, Func<int, Expr> previousCell)
    {
        _context = context;
        _currentCell = currentCell;
        _previousCell = previousCell;
    }

    public BoolExpr Bool(ScanExpression expression) => Encode(expression) as BoolExpr
        ?? throw new InvalidOperationException("A bool expression was expected.");

    public ArithExpr Real(ScanExpression expression) => Encode(expression) as ArithExpr
        ?? throw new InvalidOperationException("A real expression was expected.");

    public Expr Encode(ScanExpression expression)
    {
        if (_cache.TryGetValue(expression, out var cached))
        {
            return cached;
        }

        var term = Translate(expression);
        _cache[expression] = term;
        return term;
    }

    private Expr Translate(ScanExpression expression) => expression switch
    {
        BoolConstantExpression b => _context.MkBool(b.Value),
        RealConstantExpression r => RealTerms.Constant(_context, r.Value),
        CellReadExpression read => read.Timing == ReadTiming.Current ? _currentCell(read.Cell) : _previousCell(read.Cell),
        NotExpression not => _context.MkNot(Bool(not.Operand)),
        AndExpression and => and.Operands.Count == 0 ? _context.MkTrue() : _context.MkAnd(and.Operands.Select(Bool)),
        OrExpression or => or.Operands.Count == 0 ? _context.MkFalse() : _context.MkOr(or.Operands.Select(Bool)),
        XorExpression xor => _context.MkXor(Bool(xor.Left), Bool(xor.Right)),
        ImpliesExpression implies => _context.MkImplies(Bool(implies.Left), Bool(implies.Right)),
        CompareExpression compare => Compare(compare),
        AddExpression add => _context.MkAdd(Real(add.Left), Real(add.Right)),
        SubtractExpression subtract => _context.MkSub(Real(subtract.Left), Real(subtract.Right)),
        NegateExpression negate => _context.MkUnaryMinus(Real(negate.Operand)),
        ScaleExpression scale => _context.MkMul(RealTerms.Constant(_context, scale.Factor), Real(scale.Operand)),
        AbsExpression abs => Abs(Real(abs.Operand)),
        MinExpression min => MinOrMax(Real(min.Left), Real(min.Right), takeSmaller: true),
        MaxExpression max => MinOrMax(Real(max.Left), Real(max.Right), takeSmaller: false),
        _ => throw new InvalidOperationException($"Unsupported scan expression {expression.GetType().Name}."),
    };

    private BoolExpr Compare(CompareExpression compare)
    {
        if (compare.Left.Type == SignalType.Bool || compare.Right.Type == SignalType.Bool)
        {
            var equal = _context.MkEq(Bool(compare.Left), Bool(compare.Right));
            return compare.Operator switch
            {
                CompareOperator.Equal => equal,
                CompareOperator.NotEqual => _context.MkNot(equal),
                _ => throw new InvalidOperationException($"Bools compare only with = and <>, not {compare.Operator}."),
            };
        }

        var left = Real(compare.Left);
        var right = Real(compare.Right);
        return compare.Operator switch
        {
            CompareOperator.Equal => _context.MkEq(left, right),
            CompareOperator.NotEqual => _context.MkNot(_context.MkEq(left, right)),
            CompareOperator.Less => _context.MkLt(left, right),
            CompareOperator.LessOrEqual => _context.MkLe(left, right),
            CompareOperator.Greater => _context.MkGt(left, right),
            CompareOperator.GreaterOrEqual => _context.MkGe(left, right),
            _ => throw new InvalidOperationException($"Unknown comparison {compare.Operator}."),
        };
    }

    private ArithExpr Abs(ArithExpr value) =>
        (ArithExpr)_context.MkITE(_context.MkGe(value, _context.MkReal(0)), value, _context.MkUnaryMinus(value));

    private ArithExpr MinOrMax(ArithExpr left, ArithExpr right, bool takeSmaller) =>
        (ArithExpr)_context.MkITE(
            takeSmaller ? _context.MkLe(left, right) : _context.MkGe(left, right),
            left,
            right);
}
