using System.Reflection;
using LogicProof.Language.Tests.Binding;
using LogicProof.Language.Tests.Parsing;

namespace LogicProof.Language.Tests;

public class LanguageCodesTests
{
    /// <summary>Codes checked by dedicated facts rather than the two file-driven theories.</summary>
    private static readonly string[] CheckedElsewhere =
    [
        LanguageCodes.FileUnreadable, // Reading.SourceReaderTests
        LanguageCodes.InvalidUtf8, // Reading.SourceReaderTests
        LanguageCodes.BinaryFile, // Reading.SourceReaderTests
        LanguageCodes.NestingTooDeep, // Parsing.RobustnessTests
    ];

    [Fact]
    public void Codes_WhenListed_AreUniqueAndInTheLanguageRanges()
    {
        var codes = AllCodes();

        Assert.Equal(codes.Count, codes.Distinct(StringComparer.Ordinal).Count());
        Assert.All(codes, code => Assert.Matches("^LP[12][0-9]{3}$", code));
    }

    [Fact]
    public void Codes_WhenListed_EachHasATestOnABadFile()
    {
        var tested = TheoryCodes(typeof(SyntaxDiagnosticTests), nameof(SyntaxDiagnosticTests.Load_WhenTextIsMalformed_ReportsTheCodeAtThePlace))
            .Concat(TheoryCodes(typeof(BinderDiagnosticTests), nameof(BinderDiagnosticTests.Load_WhenNamesOrTypesAreWrong_ReportsTheCodeAtThePlace)))
            .Concat(CheckedElsewhere)
            .ToHashSet(StringComparer.Ordinal);

        Assert.All(AllCodes(), code => Assert.Contains(code, tested));
    }

    private static List<string> AllCodes() =>
        typeof(LanguageCodes).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.IsLiteral)
            .Select(f => (string)f.GetRawConstantValue()!)
            .ToList();

    private static IEnumerable<string> TheoryCodes(Type type, string method) =>
        type.GetMethod(method)!.GetCustomAttributes<InlineDataAttribute>()
            .SelectMany(a => a.GetData(null!))
            .Select(row => (string)row[0]);
}
