using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using LogicProof.Core.Text;
using LogicProof.Model.Graph;

namespace LogicProof.Reports.Graph;

/// <summary>
/// The dependency graph as JSON, indented, in the graph's order:
/// <code>
/// {
///   "scheme": "QM7",
///   "vertices": [
///     {"name": "CLOSE_CMD", "kind": "input", "line": 5, "column": 3, "detail": "close command"},
///     {"name": "FAIL.TON#1", "kind": "function block", "line": 12, "column": 11, "detail": "TON T#500ms"}
///   ],
///   "edges": [
///     {"from": "CLOSE_CMD", "to": "SEAL", "read": "same scan", "line": 11, "column": 3}
///   ]
/// }
/// </code>
/// <c>read</c> is "same scan" or "last scan"; line and column (1-based) are where the vertex is declared or
/// called, and where the reading equation is written; <c>detail</c> is left out when there is none.
/// </summary>
public static class JsonGraphRenderer
{
    public static void Render(DependencyGraph graph, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(graph);
        ArgumentNullException.ThrowIfNull(writer);
        using var buffer = new MemoryStream();
        var options = new JsonWriterOptions
        {
            Indented = true,
            NewLine = "\n",
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        };
        using (var json = new Utf8JsonWriter(buffer, options))
        {
            json.WriteStartObject();
            json.WriteString("scheme", graph.SchemeName);
            json.WriteStartArray("vertices");
            foreach (var vertex in graph.Vertices)
            {
                json.WriteStartObject();
                json.WriteString("name", vertex.Name);
                json.WriteString("kind", DotGraphRenderer.KindText(vertex.Kind));
                WritePlace(json, vertex.Span);
                if (vertex.Detail is not null)
                {
                    json.WriteString("detail", vertex.Detail);
                }

                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteStartArray("edges");
            foreach (var edge in graph.Edges)
            {
                json.WriteStartObject();
                json.WriteString("from", edge.Source.Name);
                json.WriteString("to", edge.Target.Name);
                json.WriteString("read", edge.Read == DependencyReadKind.LastScan ? "last scan" : "same scan");
                WritePlace(json, edge.Span);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        writer.Write(Encoding.UTF8.GetString(buffer.ToArray()));
        writer.Write('\n');
    }

    public static string Render(DependencyGraph graph)
    {
        using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        Render(graph, writer);
        return writer.ToString();
    }

    private static void WritePlace(Utf8JsonWriter json, SourceSpan span)
    {
        json.WriteNumber("line", span.Line);
        json.WriteNumber("column", span.Column);
    }
}
