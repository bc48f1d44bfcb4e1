using System.Buffers;
using System.Globalization;
using System.Text;
using System.Text.Unicode;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;

namespace LogicProof.Language.Reading;

/// <summary>
/// Reads a scheme file as strict UTF-8 (a UTF-8 byte order mark is skipped). A file that cannot be read, a binary
/// file (a NUL byte) and bytes that are not UTF-8 each give one diagnostic instead of an exception; the line and
/// column of a bad byte are those of the text decoded before it.
/// </summary>
internal static class SourceReader
{
    private static readonly byte[] Utf8Bom = [0xEF, 0xBB, 0xBF];

    public static SourceText Read(string path, DiagnosticBag diagnostics)
    {
        byte[] bytes;
        try
        {
            bytes = File.ReadAllBytes(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException
                                       or NotSupportedException or System.Security.SecurityException)
        {
            var reason = ex switch
            {
                FileNotFoundException or DirectoryNotFoundException => "the file does not exist",
                UnauthorizedAccessException when Directory.Exists(path) => "it is a folder, not a file",
                UnauthorizedAccessException => "permission denied",
                ArgumentException => "the path is not valid",
                _ => ex.Message,
            };
            var source = new SourceText(path, string.Empty);
            diagnostics.Error(LanguageCodes.FileUnreadable, $"cannot read the file: {reason}", new SourceSpan(path, 0, 0, 0, 0));
            return source;
        }

        return Decode(path, bytes, diagnostics);
    }

    /// <summary>Checks that text handed over as a string has no NUL character (a sign of a binary file).</summary>
    public static void CheckText(SourceText source, DiagnosticBag diagnostics)
    {
        var nul = source.Content.IndexOf('\0', StringComparison.Ordinal);
        if (nul >= 0)
        {
            diagnostics.Error(
                LanguageCodes.BinaryFile,
                "the text contains a NUL character: it looks like a binary file, not a scheme",
                source.Span(nul, 1));
        }
    }

    private static SourceText Decode(string path, ReadOnlySpan<byte> bytes, DiagnosticBag diagnostics)
    {
        if (bytes.StartsWith(Utf8Bom))
        {
            bytes = bytes[Utf8Bom.Length..];
        }
        else if (bytes.StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || bytes.StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF]))
        {
            var utf16 = new SourceText(path, string.Empty);
            diagnostics.Error(
                LanguageCodes.InvalidUtf8,
                "the file is UTF-16 (it starts with a UTF-16 byte order mark); save it as UTF-8",
                utf16.Span(0, 0));
            return utf16;
        }

        var lenient = Encoding.UTF8.GetString(bytes);
        var source = new SourceText(path, lenient);
        var nul = bytes.IndexOf((byte)0);
        var invalid = FirstInvalidUtf8Byte(bytes);
        if (nul >= 0 && (invalid < 0 || nul < invalid))
        {
            diagnostics.Error(
                LanguageCodes.BinaryFile,
                string.Create(CultureInfo.InvariantCulture, $"the file contains a NUL byte at byte offset {nul}: it looks like a binary file, not a scheme"),
                source.Span(Encoding.UTF8.GetCharCount(bytes[..nul]), 1));
        }
        else if (invalid >= 0)
        {
            diagnostics.Error(
                LanguageCodes.InvalidUtf8,
                string.Create(CultureInfo.InvariantCulture, $"the file is not valid UTF-8: byte 0x{bytes[invalid]:X2} at byte offset {invalid} cannot be decoded; save the file as UTF-8"),
                source.Span(Encoding.UTF8.GetCharCount(bytes[..invalid]), 1));
        }

        return source;
    }

    private static int FirstInvalidUtf8Byte(ReadOnlySpan<byte> bytes)
    {
        var buffer = ArrayPool<char>.Shared.Rent(Math.Min(Math.Max(bytes.Length, 1), 1 << 16));
        try
        {
            var consumed = 0;
            while (consumed < bytes.Length)
            {
                var status = Utf8.ToUtf16(bytes[consumed..], buffer, out var read, out _, replaceInvalidSequences: false);
                consumed += read;
                switch (status)
                {
                    case OperationStatus.Done:
                        return -1;
                    case OperationStatus.InvalidData:
                    case OperationStatus.NeedMoreData:
                        return consumed;
                }
            }

            return -1;
        }
        finally
        {
            ArrayPool<char>.Shared.Return(buffer);
        }
    }
}
