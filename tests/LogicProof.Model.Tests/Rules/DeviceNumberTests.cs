using System.Text.RegularExpressions;
using LogicProof.Model.Rules;

namespace LogicProof.Model.Tests.Rules;

public sealed partial class DeviceNumberTests
{
    // IEEE C37.2, standard device function numbers (from memory): 25 synchronizing or synchronism-check device,
    // 52 ac circuit breaker (52a/52b its auxiliary contacts), 63 pressure switch, 79 ac reclosing relay,
    // 86 lockout relay, 94 tripping or trip-free relay.
    private static readonly Dictionary<string, string[]> MeaningOf = new()
    {
        ["25"] = ["synchronism"],
        ["52"] = ["breaker"],
        ["63"] = ["gas", "pressure"],
        ["79"] = ["reclos"],
        ["86"] = ["lockout"],
        ["94"] = ["trip", "pumping"],
    };

    [Fact]
    public void RoleAndRuleTexts_WhenTheyCiteDeviceNumbers_UseIeeeC372Numbers()
    {
        var texts = RoleCatalog.All.Select(r => r.Description)
            .Concat(RuleCatalog.All.SelectMany(r => new[] { r.Statement, r.Reason, r.DesignNote ?? string.Empty }));
        var cited = 0;
        foreach (var text in texts)
        {
            foreach (Match match in DeviceNumber().Matches(text))
            {
                var number = match.Groups["number"].Value;
                Assert.True(MeaningOf.TryGetValue(number, out var words), $"'{number}' in \"{text}\" is not a device number these texts may use");
                Assert.True(
                    words.Any(w => text.Contains(w, StringComparison.OrdinalIgnoreCase)),
                    $"device {number} in \"{text}\" is not used for its IEEE C37.2 function ({string.Join(" / ", words)})");
                cited++;
            }
        }

        // Every device the roles refer to is cited somewhere.
        Assert.True(cited >= MeaningOf.Count, $"only {cited} device numbers cited");
    }

    [Fact]
    public void RoleDescriptions_WhenRolesMapToDevices_NameTheRightDevice()
    {
        // IEEE C37.2, standard device function numbers (from memory).
        Assert.StartsWith("86 lockout", RoleCatalog.Find(RoleNames.Lockout)!.Description, StringComparison.Ordinal);
        Assert.StartsWith("52a", RoleCatalog.Find(RoleNames.BreakerClosed)!.Description, StringComparison.Ordinal);
        Assert.StartsWith("52b", RoleCatalog.Find(RoleNames.BreakerOpen)!.Description, StringComparison.Ordinal);
        Assert.StartsWith("25 synchronism", RoleCatalog.Find(RoleNames.SyncPermissive)!.Description, StringComparison.Ordinal);
        Assert.StartsWith("63 pressure switch", RoleCatalog.Find(RoleNames.LowGas)!.Description, StringComparison.Ordinal);
        Assert.Contains("79 reclosing relay", RoleCatalog.Find(RoleNames.CloseCommand)!.Description, StringComparison.Ordinal);
        Assert.Contains("94 tripping", RoleCatalog.Find(RoleNames.TripOutput)!.Description, StringComparison.Ordinal);
    }

    [GeneratedRegex(@"\b(?<number>\d{2})[ab]?\b")]
    private static partial Regex DeviceNumber();
}
