using System.Text.Json;
using LogicProof.Core.Text;
using LogicProof.Reports.Exports;

namespace LogicProof.Reports.Check;

/// <summary>
/// SARIF locations: the artifact as a URI relative to the working directory (forward slashes, each segment
/// percent-encoded; an absolute <c>file:</c> URI when the file is on another root), and the region's start line
/// and column when the span has them.
/// </summary>
internal static class SarifLocations
{
    public static string ArtifactUri(string path, string workingDirectory)
    {
        string full;
        string relative;
        try
        {
            full = Path.GetFullPath(path, Path.GetFullPath(workingDirectory));
            relative = Path.GetRelativePath(Path.GetFullPath(workingDirectory), full);
        }
        catch (Exception exception) when (exception is ArgumentException or NotSupportedException or PathTooLongException)
        {
            return Uri.EscapeDataString(path.Replace('\\', '/')).Replace("%2F", "/", StringComparison.Ordinal);
        }

        if (Path.IsPathRooted(relative))
        {
            return new Uri(full).AbsoluteUri;
        }

        return string.Join('/', relative.Split(Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar).Select(Uri.EscapeDataString));
    }

    /// <summary>Writes a location object, or nothing when the span names no file.</summary>
    public static void Write(Utf8JsonWriter json, SourceSpan span, string workingDirectory, string? message = null)
    {
        json.WriteStartObject();
        json.WriteStartObject("physicalLocation");
        json.WriteStartObject("artifactLocation");
        JsonOutput.String(json, "uri", ArtifactUri(span.File, workingDirectory));
        json.WriteEndObject();
        if (!span.IsNone)
        {
            json.WriteStartObject("region");
            json.WriteNumber("startLine", span.Line);
            json.WriteNumber("startColumn", Math.Max(span.Column, 1));
            json.WriteEndObject();
        }

        json.WriteEndObject();
        if (message is not null)
        {
            json.WriteStartObject("message");
            JsonOutput.String(json, "text", message);
            json.WriteEndObject();
        }

        json.WriteEndObject();
    }

    public static bool HasFile(SourceSpan span) => span.File.Length > 0;
}
