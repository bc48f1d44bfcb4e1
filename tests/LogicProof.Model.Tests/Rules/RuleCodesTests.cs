using System.Reflection;
using LogicProof.Model.Rules;
using LogicProof.Model.Tests.Plant;

namespace LogicProof.Model.Tests.Rules;

public sealed class RuleCodesTests
{
    /// <summary>Codes checked by dedicated facts rather than the theories read below, and the internal ones no input can reach.</summary>
    private static readonly string[] CheckedElsewhere =
    [
        RuleCodes.RoleBoundTwice, // RoleBinderTests
        RuleCodes.RoleNameRepeated, // RoleBinderTests
        RuleCodes.UnknownRuleId, // RuleExpanderTests
        RuleCodes.RuleFormulaInvalid, // internal: a catalog formula that does not fit (RuleCatalogTests parse every one)
        RuleCodes.AssumptionReadsModelledStatus, // BreakerModelExpanderTests
        RuleCodes.CloseIntoFaultNeedsTripInput, // BreakerModelExpanderTests
        RuleCodes.BreakerProgramInvalid, // internal: the generated breaker does not parse or bind
        RuleCodes.BreakerTimeRounded, // BreakerModelExpanderTests
        RuleCodes.CloseIntoFaultDelayIgnored, // BreakerModelExpanderTests
        RuleCodes.CloseFailNotAboveClosingTime, // SetupWarningsTests
        RuleCodes.LockoutOperatedAtPowerUp, // SetupWarningsTests
    ];

    [Fact]
    public void Codes_WhenListed_AreUniqueAndInTheRulesRange()
    {
        var codes = AllCodes();

        Assert.Equal(codes.Count, codes.Distinct(StringComparer.Ordinal).Count());
        Assert.All(codes, code => Assert.Matches("^LP6[0-9]{3}$", code));
    }

    [Fact]
    public void Codes_WhenListed_EachHasATest()
    {
        var tested = TheoryCodes(typeof(RoleBinderTests), nameof(RoleBinderTests.Bind_WhenARoleIsWrong_ReportsItsCodeAtTheValue))
            .Concat(TheoryCodes(typeof(BreakerModelExpanderTests), nameof(BreakerModelExpanderTests.Expand_WhenAKeyIsWrong_ReportsItsCodeWhereItIsWritten)))
            .Concat(TheoryCodes(typeof(BreakerModelExpanderTests), nameof(BreakerModelExpanderTests.Expand_WhenATimeIsWrong_ReportsItsCodeAtTheValue)))
            .Concat(TheoryCodes(typeof(BreakerModelExpanderTests), nameof(BreakerModelExpanderTests.Expand_WhenTheRolesDoNotConnectTheBreaker_ReportsWhatIsMissing), column: 1))
            .Concat(CheckedElsewhere)
            .ToHashSet(StringComparer.Ordinal);

        Assert.All(AllCodes(), code => Assert.Contains(code, tested));
    }

    private static List<string> AllCodes() =>
        [.. typeof(RuleCodes).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.IsLiteral)
            .Select(f => (string)f.GetRawConstantValue()!)];

    /// <summary>The code column of a theory's rows: the last column unless <paramref name="column"/> says otherwise.</summary>
    private static IEnumerable<string> TheoryCodes(Type type, string method, int? column = null) =>
        type.GetMethod(method)!.GetCustomAttributes<InlineDataAttribute>()
            .SelectMany(a => a.GetData(null!))
            .Select(row => (string)row[column ?? row.Length - 1]);
}
