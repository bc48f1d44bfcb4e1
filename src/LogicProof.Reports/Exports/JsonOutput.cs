using System.Buffers;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Fractions;
using LogicProof.Core.Text;
using LogicProof.Model.Simulation;
using LogicProof.Reports.Check;

namespace LogicProof.Reports.Exports;

/// <summary>
/// The JSON conventions of every report: two-space indentation, <c>\n</c> line ends, characters left readable
/// (only what JSON requires is escaped), exact numbers as strings, and a source place as file, line and column.
/// </summary>
internal static class JsonOutput
{
    public static void Write(TextWriter writer, Action<Utf8JsonWriter> write)
    {
        var buffer = new ArrayBufferWriter<byte>();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions
        {
            Indented = true,
            IndentSize = 2,
            NewLine = "\n",
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        }))
        {
            write(json);
        }

        writer.Write(Encoding.UTF8.GetString(buffer.WrittenSpan));
        writer.Write('\n');
    }

    public static void Exact(Utf8JsonWriter json, string name, Fraction value) =>
        json.WriteString(name, ExactNumberText.FormatExact(value));

    /// <summary>A duration as exact milliseconds.</summary>
    public static void Milliseconds(Utf8JsonWriter json, string name, TimeSpan duration) =>
        Exact(json, name, new Fraction(duration.Ticks, TimeSpan.TicksPerMillisecond));

    /// <summary>Writes a string property; a lone surrogate, which JSON text cannot carry, becomes U+FFFD.</summary>
    public static void String(Utf8JsonWriter json, string name, string value) => json.WriteString(name, Clean(value));

    public static void StringValue(Utf8JsonWriter json, string value) => json.WriteStringValue(Clean(value));

    public static string Clean(string text) => CharacterReplacement.Replace(text, static _ => true, '\uFFFD');

    public static void Place(Utf8JsonWriter json, SourceSpan span)
    {
        String(json, "file", span.File);
        json.WriteNumber("line", span.Line);
        json.WriteNumber("column", span.Column);
    }

    public static void OptionalString(Utf8JsonWriter json, string name, string? value)
    {
        if (value is null)
        {
            json.WriteNull(name);
        }
        else
        {
            String(json, name, value);
        }
    }
}
