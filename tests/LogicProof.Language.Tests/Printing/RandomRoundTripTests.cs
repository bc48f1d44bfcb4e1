using CsCheck;
using LogicProof.Language.Printing;
using LogicProof.Language.Tests.Support;

namespace LogicProof.Language.Tests.Printing;

public class RandomRoundTripTests
{
    [Fact]
    public void PrintThenParse_WhenSchemeIsRandom_GivesTheSameTreeAndTheSameText()
    {
        SchemeGenerator.Scheme.Sample(
            scheme =>
            {
                var printed = SchemePrinter.Print(scheme);
                var reparsed = FrontEnd.LoadText("random.lpl", printed);
                var syntaxErrors = reparsed.Diagnostics.Where(d => d.Code.StartsWith("LP1", StringComparison.Ordinal)).ToList();

                Assert.True(reparsed.Syntax is not null && syntaxErrors.Count == 0, printed + "\n" + Scheme.Describe(syntaxErrors));
                Assert.Null(SyntaxComparer.FirstDifference(scheme, reparsed.Syntax!));
                Assert.Equal(printed, SchemePrinter.Print(reparsed.Syntax!));
            },
            iter: 400,
            threads: 1,
            print: s => s is null ? "(none)" : SchemePrinter.Print(s));
    }
}
