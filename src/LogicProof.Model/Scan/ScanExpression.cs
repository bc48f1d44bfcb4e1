using Fractions;

namespace LogicProof.Model.Scan;

/// <summary>
/// A side-effect-free expression evaluated within one scan. It reads cells either as already computed in this
/// scan (<see cref="ReadTiming.Current"/>: an input, or a cell whose step ran earlier in this scan) or as they were
/// at the end of the previous scan (<see cref="ReadTiming.Previous"/>: the cell's state slot).
/// Real arithmetic is linear: <see cref="ScaleExpression"/> multiplies by a constant.
/// </summary>
public abstract record ScanExpression(SignalType Type);

public enum ReadTiming
{
    Current,
    Previous,
}

public sealed record BoolConstantExpression(bool Value) : ScanExpression(SignalType.Bool);

public sealed record RealConstantExpression(Fraction Value) : ScanExpression(SignalType.Real);

/// <summary>Reads a cell. A <see cref="ReadTiming.Previous"/> read has a state slot of kind <see cref="StateSlotKind.PreviousValue"/>.</summary>
public sealed record CellReadExpression(int Cell, ReadTiming Timing, SignalType CellType) : ScanExpression(CellType);

public sealed record NotExpression(ScanExpression Operand) : ScanExpression(SignalType.Bool);

public sealed record AndExpression(IReadOnlyList<ScanExpression> Operands) : ScanExpression(SignalType.Bool);

public sealed record OrExpression(IReadOnlyList<ScanExpression> Operands) : ScanExpression(SignalType.Bool);

public sealed record XorExpression(ScanExpression Left, ScanExpression Right) : ScanExpression(SignalType.Bool);

public sealed record ImpliesExpression(ScanExpression Left, ScanExpression Right) : ScanExpression(SignalType.Bool);

public enum CompareOperator
{
    Equal,
    NotEqual,
    Less,
    LessOrEqual,
    Greater,
    GreaterOrEqual,
}

/// <summary>Compares two reals, or two bools (Equal and NotEqual only).</summary>
public sealed record CompareExpression(CompareOperator Operator, ScanExpression Left, ScanExpression Right)
    : ScanExpression(SignalType.Bool);

public sealed record AddExpression(ScanExpression Left, ScanExpression Right) : ScanExpression(SignalType.Real);

public sealed record SubtractExpression(ScanExpression Left, ScanExpression Right) : ScanExpression(SignalType.Real);

public sealed record NegateExpression(ScanExpression Operand) : ScanExpression(SignalType.Real);

public sealed record ScaleExpression(Fraction Factor, ScanExpression Operand) : ScanExpression(SignalType.Real);

public sealed record AbsExpression(ScanExpression Operand) : ScanExpression(SignalType.Real);

public sealed record MinExpression(ScanExpression Left, ScanExpression Right) : ScanExpression(SignalType.Real);

public sealed record MaxExpression(ScanExpression Left, ScanExpression Right) : ScanExpression(SignalType.Real);
