using System.Text;
using LogicProof.Model.Graph;

namespace LogicProof.Reports.Graph;

/// <summary>
/// The dependency graph in the DOT language of graph-drawing tools. Inputs are boxes, locals ellipses, outputs
/// double octagons, function-block call sites component shapes (labelled with kind and preset), formulas notes.
/// A same-scan read is a solid arrow; a last-scan read is dashed and labelled "last scan". Vertices and edges come
/// in the graph's order, so the text is the same for the same scheme.
/// </summary>
public static class DotGraphRenderer
{
    public static void Render(DependencyGraph graph, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(graph);
        ArgumentNullException.ThrowIfNull(writer);
        writer.Write("digraph ");
        writer.Write(Quote(graph.SchemeName));
        writer.Write(" {\n  rankdir=LR;\n");
        foreach (var vertex in graph.Vertices)
        {
            var label = vertex.Kind == DependencyVertexKind.FunctionBlock && vertex.Detail is not null
                ? vertex.Name + "\n" + vertex.Detail
                : vertex.Name + "\n" + KindText(vertex.Kind);
            writer.Write("  ");
            writer.Write(Quote(vertex.Name));
            writer.Write(" [shape=");
            writer.Write(Shape(vertex.Kind));
            writer.Write(", label=");
            writer.Write(Quote(label));
            writer.Write("];\n");
        }

        foreach (var edge in graph.Edges)
        {
            writer.Write("  ");
            writer.Write(Quote(edge.Source.Name));
            writer.Write(" -> ");
            writer.Write(Quote(edge.Target.Name));
            writer.Write(edge.Read == DependencyReadKind.LastScan ? " [style=dashed, label=\"last scan\"];\n" : ";\n");
        }

        writer.Write("}\n");
    }

    public static string Render(DependencyGraph graph)
    {
        using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        Render(graph, writer);
        return writer.ToString();
    }

    /// <summary>The kind as written in reports: input, local, output, function block, requirement, assumption.</summary>
    public static string KindText(DependencyVertexKind kind) => kind switch
    {
        DependencyVertexKind.Input => "input",
        DependencyVertexKind.Local => "local",
        DependencyVertexKind.Output => "output",
        DependencyVertexKind.FunctionBlock => "function block",
        DependencyVertexKind.Requirement => "requirement",
        DependencyVertexKind.Assumption => "assumption",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "unknown vertex kind"),
    };

    private static string Shape(DependencyVertexKind kind) => kind switch
    {
        DependencyVertexKind.Input => "box",
        DependencyVertexKind.Local => "ellipse",
        DependencyVertexKind.Output => "doubleoctagon",
        DependencyVertexKind.FunctionBlock => "component",
        _ => "note",
    };

    /// <summary>A DOT quoted string: backslash and double quote escaped, a line break as \n.</summary>
    private static string Quote(string text)
    {
        var builder = new StringBuilder(text.Length + 2).Append('"');
        foreach (var c in text)
        {
            switch (c)
            {
                case '"':
                    builder.Append("\\\"");
                    break;
                case '\\':
                    builder.Append("\\\\");
                    break;
                case '\n':
                    builder.Append("\\n");
                    break;
                case '\r':
                    break;
                default:
                    builder.Append(c);
                    break;
            }
        }

        return builder.Append('"').ToString();
    }
}
