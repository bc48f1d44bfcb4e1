using LogicProof.Model.Rules;

namespace LogicProof.Model.Tests.Rules;

public sealed class RuleTemplateTests
{
    private static readonly Dictionary<string, string> Bound = new(StringComparer.OrdinalIgnoreCase)
    {
        ["close_output"] = "CLOSE_OUT",
        ["trip_command"] = "(PROT_TRIP OR CS_TRIP)",
    };

    [Fact]
    public void Render_WhenEveryPlaceholderIsBound_ReplacesEach()
    {
        var text = RuleTemplate.Render("ROSE({close_output}) -> NOT {trip_command}", Bound.GetValueOrDefault);

        Assert.Equal("ROSE(CLOSE_OUT) -> NOT (PROT_TRIP OR CS_TRIP)", text);
    }

    [Fact]
    public void Render_WhenAnOptionalPartHasAnUnboundRole_DropsOnlyThatPart()
    {
        var text = RuleTemplate.Render("{close_output}[ AND NOT {lockout}][ AND NOT {trip_command}] -> TRUE", Bound.GetValueOrDefault);

        Assert.Equal("CLOSE_OUT AND NOT (PROT_TRIP OR CS_TRIP) -> TRUE", text);
    }

    [Fact]
    public void Render_WhenAMandatoryRoleIsUnbound_GivesNull()
    {
        Assert.Null(RuleTemplate.Render("{lockout} -> NOT {close_output}", Bound.GetValueOrDefault));
    }

    [Fact]
    public void Placeholders_WhenTemplateHasOptionalParts_ListsAllAndMandatoryOnlyOutsideBrackets()
    {
        const string template = "PREV({close_output})[ AND NOT {lockout}] -> {close_output}";

        Assert.Equal(["close_output", "lockout"], RuleTemplate.Placeholders(template));
        Assert.Equal(["close_output"], RuleTemplate.MandatoryPlaceholders(template));
    }

    [Theory]
    [InlineData("{close_output")]
    [InlineData("[ AND {close_output}")]
    public void Render_WhenTemplateIsMalformed_Throws(string template)
    {
        Assert.Throws<FormatException>(() => RuleTemplate.Render(template, Bound.GetValueOrDefault));
    }
}
