using System.Runtime.CompilerServices;
using LogicProof.Language;
using LogicProof.Model.Rules;

namespace LogicProof.Model.Tests.Rules;

public sealed class ExampleRolesTests
{
    [Fact]
    public void Prepare_WhenRunOnEveryExampleScheme_BindsItsRolesAndBreakerModelWithoutError()
    {
        var examples = Directory.GetFiles(Path.Combine(RepositoryRoot(), "examples"), "*.lpl", SearchOption.AllDirectories);
        Assert.NotEmpty(examples);
        foreach (var path in examples)
        {
            var front = FrontEnd.Load(path);
            if (front.Scheme is not { } scheme)
            {
                Assert.Fail($"{path}:{Environment.NewLine}{RuleHarness.Describe(front.Diagnostics)}");
                return;
            }

            var setup = RuleSetup.Prepare(scheme);

            Assert.True(!setup.HasErrors, $"{path}:{Environment.NewLine}{RuleHarness.Describe(setup.Diagnostics)}");
            Assert.NotEmpty(setup.Rules.Applied);
        }
    }

    private static string RepositoryRoot([CallerFilePath] string thisFile = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(thisFile)!, "..", "..", ".."));
}
