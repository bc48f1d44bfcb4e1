using System.Text;
using System.Text.Json;

namespace LogicProof.Model.SyncCheck;

/// <summary>A finished calculation: which one, the formula it used, its inputs in the units used, and the result.</summary>
public sealed record SyncCalcResult(
    string Calculation,
    string Formula,
    IReadOnlyList<SyncCalcQuantity> Inputs,
    SyncCalcQuantity Result)
{
    public IReadOnlyList<string> ToTextLines(int significantDigits = SyncCheckNumber.DefaultSignificantDigits) =>
    [
        $"formula: {Formula}",
        $"inputs: {string.Join(", ", Inputs.Select(input => input.ToText(significantDigits)))}",
        $"result: {Result.ToText(significantDigits)}",
    ];

    /// <summary>Numbers keep every digit here: rounding is for people, and a program reading this can round itself.</summary>
    public string ToJson()
    {
        using var stream = new MemoryStream();
        using (var writer = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            writer.WriteStartObject();
            writer.WriteString("calculation", Calculation);
            writer.WriteString("formula", Formula);
            writer.WriteStartArray("inputs");
            foreach (var input in Inputs)
            {
                WriteQuantity(writer, input);
            }

            writer.WriteEndArray();
            writer.WritePropertyName("result");
            WriteQuantity(writer, Result);
            writer.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void WriteQuantity(Utf8JsonWriter writer, SyncCalcQuantity quantity)
    {
        writer.WriteStartObject();
        writer.WriteString("symbol", quantity.Symbol);
        writer.WriteNumber("value", quantity.Value);
        writer.WriteString("unit", quantity.Unit);
        if (quantity.Given is not null)
        {
            writer.WriteString("given", quantity.Given);
        }

        writer.WriteEndObject();
    }
}
