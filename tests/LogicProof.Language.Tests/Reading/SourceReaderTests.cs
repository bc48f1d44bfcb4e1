using System.Text;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Reading;

public sealed class SourceReaderTests : IDisposable
{
    private const string Valid = "scheme T;\nfrequency 60 Hz;\nscan 2 ms;\n";

    private readonly string _folder = Directory.CreateTempSubdirectory("logicproof-reading-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public void Load_WhenFileIsMissing_ReportsItWithoutThrowing()
    {
        var path = Path.Combine(_folder, "missing.lpl");

        var result = FrontEnd.Load(path);

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.FileUnreadable, error.Code);
        Assert.Equal(path, error.Span.File);
        Assert.Equal(0, error.Span.Line); // the whole file, not a place in it
        Assert.Contains("does not exist", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Load_WhenPathIsAFolder_ReportsItWithoutThrowing()
    {
        var result = FrontEnd.Load(_folder);

        Assert.Equal(LanguageCodes.FileUnreadable, Assert.Single(result.Diagnostics).Code);
    }

    [Fact]
    public void Load_WhenFileStartsWithUtf8ByteOrderMark_ReadsItAndCountsColumnsAfterIt()
    {
        var path = Write("bom.lpl", [0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes(Valid + "inputs\n  A : bool;\nend\n")]);

        var result = FrontEnd.Load(path);

        Assert.Empty(result.Diagnostics);
        Assert.Equal((5, 3), (result.Syntax!.Inputs[0].NameSpan.Line, result.Syntax.Inputs[0].NameSpan.Column));
    }

    [Fact]
    public void Load_WhenFileIsNotUtf8_ReportsTheFirstBadByteWithLineAndColumn()
    {
        // "ab" then 0xC3 0x28: a two-byte lead followed by a byte that cannot continue it.
        var path = Write("latin.lpl", [.. Encoding.UTF8.GetBytes(Valid + "// ab"), 0xC3, 0x28, (byte)'\n']);

        var result = FrontEnd.Load(path);

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.InvalidUtf8, error.Code);
        Assert.Equal((4, 6), (error.Span.Line, error.Span.Column));
        Assert.Contains("byte offset 43", error.Message, StringComparison.Ordinal);
        Assert.Null(result.Syntax);
    }

    [Fact]
    public void Load_WhenFileIsCutInsideAMultiByteCharacter_ReportsTheCutCharacter()
    {
        var path = Write("cut.lpl", [.. Encoding.UTF8.GetBytes(Valid + "// é"), 0xE2, 0x82]);

        var error = Assert.Single(FrontEnd.Load(path).Diagnostics);

        Assert.Equal(LanguageCodes.InvalidUtf8, error.Code);
        Assert.Equal((4, 5), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Load_WhenFileIsUtf16_SaysSo()
    {
        var path = Write("utf16.lpl", [.. Encoding.Unicode.GetPreamble(), .. Encoding.Unicode.GetBytes(Valid)]);

        var error = Assert.Single(FrontEnd.Load(path).Diagnostics);

        Assert.Equal(LanguageCodes.InvalidUtf8, error.Code);
        Assert.Contains("UTF-16", error.Message, StringComparison.Ordinal);
        Assert.Equal((1, 1), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Load_WhenFileContainsNulBytes_ReportsABinaryFileAtTheFirstOne()
    {
        var path = Write("binary.lpl", [.. Encoding.UTF8.GetBytes("scheme T;\nfr"), 0x00, 0x01, 0xFF, 0x00]);

        var result = FrontEnd.Load(path);

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.BinaryFile, error.Code);
        Assert.Equal((2, 3), (error.Span.Line, error.Span.Column));
        Assert.Null(result.Syntax);
    }

    [Fact]
    public void LoadText_WhenTextContainsANulCharacter_ReportsABinaryFile()
    {
        var result = FrontEnd.LoadText("x.lpl", "scheme\0T;");

        var error = Assert.Single(result.Diagnostics);
        Assert.Equal(LanguageCodes.BinaryFile, error.Code);
        Assert.Equal((1, 7), (error.Span.Line, error.Span.Column));
    }

    [Fact]
    public void Load_WhenFileIsValid_ReadsItLikeLoadText()
    {
        var path = Write("valid.lpl", Encoding.UTF8.GetBytes(Valid + "inputs\n  A : bool \"Größe ≥ 1\";\nend\n"));

        var result = FrontEnd.Load(path);

        Assert.Empty(result.Diagnostics);
        Assert.Equal("Größe ≥ 1", result.Syntax!.Inputs[0].Description);
        Assert.Equal(path, result.Source.Path);
        Assert.NotNull(Scheme.LoadValid(File.ReadAllText(path)).Scheme);
    }

    private string Write(string name, byte[] bytes)
    {
        var path = Path.Combine(_folder, name);
        File.WriteAllBytes(path, bytes);
        return path;
    }
}
