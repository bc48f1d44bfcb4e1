using Fractions;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using LogicProof.Proof.Encoding;
using Microsoft.Z3;

namespace LogicProof.Proof.Tests.Support;

/// <summary>Moves concrete states and inputs between the simulator and solver terms, for agreement tests.</summary>
internal static class ConcreteScan
{
    public static SymbolicState ToTerms(ScanEncoder encoder, ScanState state)
    {
        var slots = encoder.Model.StateSlots.Select(slot => slot.Kind switch
        {
            StateSlotKind.TimerCounter => encoder.CounterConstant(state.GetCounter(slot.Index)),
            StateSlotKind.PreviousValue when slot.Type == SignalType.Real => RealTerms.Constant(encoder.Context, state.GetReal(slot.Index)),
            _ => (Expr)encoder.Context.MkBool(state.GetBool(slot.Index)),
        });
        return new SymbolicState([.. slots]);
    }

    public static SymbolicInputs ToTerms(ScanEncoder encoder, ScanInputs inputs) =>
        new(encoder.Model.Inputs.ToDictionary(
            c => c,
            c => encoder.Model.Cells[c].Type == SignalType.Real
                ? (Expr)RealTerms.Constant(encoder.Context, inputs.GetReal(c))
                : encoder.Context.MkBool(inputs.GetBool(c))));

    /// <summary>A closed term's value as text: TRUE/FALSE, a reduced fraction, or a whole number.</summary>
    public static string Value(Expr closedTerm)
    {
        var value = closedTerm.Simplify();
        return value switch
        {
            BoolExpr b when b.IsTrue => "TRUE",
            BoolExpr b when b.IsFalse => "FALSE",
            RatNum or IntNum => RealTerms.Read(value).ToString(),
            BitVecNum bits => bits.BigInteger.ToString(System.Globalization.CultureInfo.InvariantCulture),
            _ => throw new InvalidOperationException($"Not a value: {value}"),
        };
    }

    public static string CellValue(ScanModel model, ScanValues values, int cell) =>
        model.Cells[cell].Type == SignalType.Real
            ? values.GetReal(cell).Reduce().ToString()
            : values.GetBool(cell) ? "TRUE" : "FALSE";

    public static string SlotValue(ScanModel model, ScanState state, int slot)
    {
        var s = model.StateSlots[slot];
        return s.Kind switch
        {
            StateSlotKind.TimerCounter => state.GetCounter(slot).ToString(System.Globalization.CultureInfo.InvariantCulture),
            StateSlotKind.PreviousValue when s.Type == SignalType.Real => state.GetReal(slot).Reduce().ToString(),
            _ => state.GetBool(slot) ? "TRUE" : "FALSE",
        };
    }

    public static void Randomize(ScanModel model, ScanInputs inputs, Random random)
    {
        foreach (var cell in model.Inputs)
        {
            if (model.Cells[cell].Type == SignalType.Bool)
            {
                inputs.SetBool(cell, random.Next(2) == 0);
            }
            else
            {
                var (low, high) = model.Cells[cell].Range ?? (new Fraction(-3), new Fraction(3));
                inputs.SetReal(cell, low + ((high - low) * new Fraction(random.Next(9), 8)));
            }
        }
    }

    public static void Randomize(ScanModel model, ScanState state, Random random)
    {
        foreach (var slot in model.StateSlots)
        {
            switch (slot.Kind)
            {
                case StateSlotKind.TimerCounter:
                    state.SetCounter(slot.Index, random.Next(slot.CounterMax + 1));
                    break;
                case StateSlotKind.PreviousValue when slot.Type == SignalType.Real:
                    state.SetReal(slot.Index, new Fraction(random.Next(-12, 13), 4));
                    break;
                default:
                    state.SetBool(slot.Index, random.Next(2) == 0);
                    break;
            }
        }
    }
}
