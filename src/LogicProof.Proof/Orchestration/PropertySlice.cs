using LogicProof.Model.Graph;
using LogicProof.Model.Scan;
using LogicProof.Proof.Results;

namespace LogicProof.Proof.Orchestration;

/// <summary>
/// A property's cone of influence, and the way back from it. The roots are the property cell and every assumption
/// cell, so no assumption is dropped: a violation on the slice is then a violation of the whole model, with no
/// condition on the inputs left out. Traces found on the slice are renumbered to the cells and slots of the model
/// that was given.
/// </summary>
internal sealed class PropertySlice
{
    private readonly ScanModel _original;
    private readonly int[] _originalCellOf;
    private readonly int[] _originalSlotOf;

    private PropertySlice(ScanModel original, ScanModel sliced, ModelProperty property, int[] originalCellOf, int[] originalSlotOf)
    {
        _original = original;
        Sliced = sliced;
        Property = property;
        _originalCellOf = originalCellOf;
        _originalSlotOf = originalSlotOf;
    }

    public ScanModel Sliced { get; }

    /// <summary>The property as a property of <see cref="Sliced"/>.</summary>
    public ModelProperty Property { get; }

    public static PropertySlice Whole(ScanModel model, ModelProperty property) =>
        new(model, model, property, [.. Enumerable.Range(0, model.Cells.Count)], [.. Enumerable.Range(0, model.StateSlots.Count)]);

    public static PropertySlice Cut(ScanModel model, ModelProperty property)
    {
        var sliced = ConeSlicer.Slice(model, [property.Cell, .. model.Assumptions.Select(a => a.Cell)]);

        // The slicer maps to the first model of a chain of slices; compare through the same keys.
        var cellOfKey = new Dictionary<int, int>();
        for (var c = 0; c < model.Cells.Count; c++)
        {
            cellOfKey[model.OriginalCells?[c] ?? c] = c;
        }

        var originalCellOf = Enumerable.Range(0, sliced.Cells.Count)
            .Select(c => cellOfKey[sliced.OriginalCells?[c] ?? c])
            .ToArray();
        var slicedProperty = property with { Cell = Array.IndexOf(originalCellOf, property.Cell) };
        if (slicedProperty.Cell < 0)
        {
            throw new InvalidOperationException($"The cone of '{property.Name}' does not contain its own cell.");
        }

        var originalSlotOf = sliced.StateSlots
            .Select(s => model.StateSlots.First(o => o.Kind == s.Kind && o.Name == s.Name && o.Cell == originalCellOf[s.Cell]).Index)
            .ToArray();
        return new PropertySlice(model, sliced, slicedProperty, originalCellOf, originalSlotOf);
    }

    /// <summary>The same trace with cell and slot indexes of the given (unsliced) model.</summary>
    public Counterexample ToOriginal(Counterexample trace) =>
        ReferenceEquals(_original, Sliced)
            ? trace
            : trace with
            {
                PowerUp = [.. trace.PowerUp.Select(Slot)],
                Steps = [.. trace.Steps.Select(s => s with
                {
                    Inputs = [.. s.Inputs.Select(Cell)],
                    Cells = [.. s.Cells.Select(Cell)],
                    Memories = [.. s.Memories.Select(Slot)],
                })],
            };

    private NamedValue Cell(NamedValue value) => value with { Index = _originalCellOf[value.Index] };

    private NamedValue Slot(NamedValue value) => value with { Index = _originalSlotOf[value.Index] };
}
