using LogicProof.Language.Printing;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Printing;

public class RoundTripTests
{
    public static TheoryData<string> SchemeFiles()
    {
        var data = new TheoryData<string>();
        foreach (var file in TestFiles.Examples().Concat(TestFiles.Samples()))
        {
            data.Add(file);
        }

        return data;
    }

    [Fact]
    public void Examples_WhenRepositoryIsChecked_ContainSchemeFiles()
    {
        Assert.NotEmpty(TestFiles.Examples());
        Assert.True(TestFiles.Samples().Count >= 2);
    }

    [Theory]
    [MemberData(nameof(SchemeFiles))]
    public void PrintThenParse_WhenFileIsValid_GivesTheSameTree(string file)
    {
        var original = FrontEnd.Load(file);
        Assert.True(original.Syntax is not null && !original.HasErrors, file + "\n" + Scheme.Describe(original.Diagnostics));

        var printed = SchemePrinter.Print(original.Syntax!);
        var reparsed = FrontEnd.LoadText(file + " (printed)", printed);

        Assert.True(reparsed.Syntax is not null && !reparsed.HasErrors, printed + "\n" + Scheme.Describe(reparsed.Diagnostics));
        Assert.Null(SyntaxComparer.FirstDifference(original.Syntax!, reparsed.Syntax!));
        Assert.Equal(printed, SchemePrinter.Print(reparsed.Syntax!));
    }
}
