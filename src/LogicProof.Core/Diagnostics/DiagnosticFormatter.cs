using System.Text;
using LogicProof.Core.Text;

namespace LogicProof.Core.Diagnostics;

/// <summary>
/// Formats a diagnostic as "file:line:column: severity CODE: message", then the source line and a caret under
/// the column, the way compilers do, so the reader sees the place without opening the file.
/// </summary>
public static class DiagnosticFormatter
{
    private const int MaxExcerptLength = 160;

    public static string Format(Diagnostic diagnostic, SourceText? source)
    {
        var builder = new StringBuilder();
        var severity = diagnostic.Severity switch
        {
            Severity.Error => "error",
            Severity.Warning => "warning",
            _ => "note",
        };
        builder.Append(diagnostic.Span.IsNone ? diagnostic.Span.File : diagnostic.Span.ToString());
        if (builder.Length > 0)
        {
            builder.Append(": ");
        }

        builder.Append(severity).Append(' ').Append(diagnostic.Code).Append(": ").Append(diagnostic.Message);
        AppendExcerpt(builder, diagnostic.Span, source);
        foreach (var related in diagnostic.Related)
        {
            builder.AppendLine().Append("  ").Append(related.Span).Append(": ").Append(related.Message);
            AppendExcerpt(builder, related.Span, source);
        }

        return builder.ToString();
    }

    private static void AppendExcerpt(StringBuilder builder, SourceSpan span, SourceText? source)
    {
        if (source is null || span.IsNone || span.File != source.Path)
        {
            return;
        }

        var line = source.Line(span.Line);
        var column = span.Column - 1;
        var start = 0;
        if (line.Length > MaxExcerptLength)
        {
            start = Math.Clamp(column - (MaxExcerptLength / 2), 0, line.Length - MaxExcerptLength);
            line = line.Substring(start, MaxExcerptLength);
        }

        var printable = new StringBuilder(line.Length);
        foreach (var c in line)
        {
            printable.Append(c == '\t' ? ' ' : char.IsControl(c) ? '?' : c);
        }

        var caretColumn = Math.Clamp(column - start, 0, printable.Length);
        var caretLength = Math.Clamp(span.Length, 1, Math.Max(1, printable.Length - caretColumn));
        builder.AppendLine().Append("    | ").Append(printable);
        builder.AppendLine().Append("    | ").Append(' ', caretColumn).Append('^', caretLength);
    }
}
