using Fractions;
using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// The value of every input cell for one scan, addressed by cell index: bool inputs through
/// <see cref="GetBool"/>/<see cref="SetBool"/>, real inputs through <see cref="GetReal"/>/<see cref="SetReal"/>.
/// A new instance holds FALSE and 0. Compact (a trace keeps one per row), cheap to clone, compared by value.
/// The simulator does not check real inputs against their declared range: whoever builds the inputs does (the
/// trace reader rejects out-of-range values; solver models respect the ranges by construction).
/// </summary>
public sealed class ScanInputs : IEquatable<ScanInputs>
{
    private readonly InputLayout _layout;
    private readonly bool[] _bools;
    private readonly Fraction[] _reals;

    public ScanInputs(ScanModel model)
        : this(new InputLayout(model ?? throw new ArgumentNullException(nameof(model))))
    {
    }

    private ScanInputs(InputLayout layout)
    {
        _layout = layout;
        _bools = new bool[layout.BoolCells.Length];
        _reals = new Fraction[layout.RealCells.Length];
        Array.Fill(_reals, Fraction.Zero);
    }

    private ScanInputs(ScanInputs source)
    {
        _layout = source._layout;
        _bools = (bool[])source._bools.Clone();
        _reals = (Fraction[])source._reals.Clone();
    }

    /// <summary>The input cells, in the model's input order.</summary>
    public IReadOnlyList<int> Cells => _layout.Model.Inputs;

    public bool GetBool(int cell) => _bools[_layout.Position(cell, SignalType.Bool)];

    public void SetBool(int cell, bool value) => _bools[_layout.Position(cell, SignalType.Bool)] = value;

    public Fraction GetReal(int cell) => _reals[_layout.Position(cell, SignalType.Real)];

    public void SetReal(int cell, Fraction value) => _reals[_layout.Position(cell, SignalType.Real)] = value;

    public ScanInputs Clone() => new(this);

    /// <summary>Whether the input <paramref name="cell"/> has the same value here and in <paramref name="other"/>.</summary>
    public bool SameValue(ScanInputs other, int cell)
    {
        RequireSameModel(other);
        return _layout.Model.Cells[cell].Type == SignalType.Bool
            ? GetBool(cell) == other.GetBool(cell)
            : GetReal(cell).CompareTo(other.GetReal(cell)) == 0;
    }

    public bool Equals(ScanInputs? other) =>
        other is not null
        && ReferenceEquals(_layout.Model, other._layout.Model)
        && _bools.AsSpan().SequenceEqual(other._bools)
        && _reals.AsSpan().SequenceEqual(other._reals);

    public override bool Equals(object? obj) => obj is ScanInputs other && Equals(other);

    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.AddBytes(System.Runtime.InteropServices.MemoryMarshal.AsBytes(_bools.AsSpan()));
        foreach (var real in _reals)
        {
            hash.Add(real.GetHashCode());
        }

        return hash.ToHashCode();
    }

    /// <summary>Copies the inputs into the cells of one scan's values; the first thing a scan does.</summary>
    internal void CopyInto(bool[] cellBools, Fraction[] cellReals)
    {
        var boolCells = _layout.BoolCells;
        for (var i = 0; i < boolCells.Length; i++)
        {
            cellBools[boolCells[i]] = _bools[i];
        }

        var realCells = _layout.RealCells;
        for (var i = 0; i < realCells.Length; i++)
        {
            cellReals[realCells[i]] = _reals[i];
        }
    }

    internal bool BelongsTo(ScanModel model) => ReferenceEquals(_layout.Model, model);

    private void RequireSameModel(ScanInputs other)
    {
        if (!ReferenceEquals(_layout.Model, other._layout.Model))
        {
            throw new ArgumentException("the two input vectors belong to different models.", nameof(other));
        }
    }

    /// <summary>Where each input cell's value lives; shared by an instance and all its clones.</summary>
    private sealed class InputLayout
    {
        private readonly int[] _positionOfCell;

        public InputLayout(ScanModel model)
        {
            Model = model;
            _positionOfCell = new int[model.Cells.Count];
            Array.Fill(_positionOfCell, -1);
            var bools = new List<int>();
            var reals = new List<int>();
            foreach (var cell in model.Inputs)
            {
                var list = model.Cells[cell].Type == SignalType.Bool ? bools : reals;
                _positionOfCell[cell] = list.Count;
                list.Add(cell);
            }

            BoolCells = [.. bools];
            RealCells = [.. reals];
        }

        public ScanModel Model { get; }

        public int[] BoolCells { get; }

        public int[] RealCells { get; }

        public int Position(int cell, SignalType type)
        {
            var position = (uint)cell < (uint)_positionOfCell.Length ? _positionOfCell[cell] : -1;
            if (position < 0 || Model.Cells[cell].Type != type)
            {
                throw new ArgumentOutOfRangeException(nameof(cell), cell, $"not a {type.ToString().ToLowerInvariant()} input cell of this model.");
            }

            return position;
        }
    }
}
