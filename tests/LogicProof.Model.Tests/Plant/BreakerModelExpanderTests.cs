using LogicProof.Core.Diagnostics;
using LogicProof.Language.Binding;
using LogicProof.Model.Plant;
using LogicProof.Model.Rules;
using LogicProof.Model.Scan;
using LogicProof.Model.Tests.Rules;

namespace LogicProof.Model.Tests.Plant;

public sealed class BreakerModelExpanderTests
{
    private const string Body = """
        inputs CMD : bool; TRIP_CMD : bool; B52A : bool; B52B : bool; end
        locals SEEN_CLOSED : bool; end
        outputs CO : bool; TO : bool; end
        logic SEEN_CLOSED := B52A; CO := CMD AND B52B; TO := TRIP_CMD; end

        """;

    private const string Roles = """
        roles close_output = CO; trip_output = TO; breaker_closed = B52A; breaker_open = B52B; trip_command = TRIP_CMD; end

        """;

    [Fact]
    public void Expand_WhenTheSchemeHasNoBreakerModel_ReturnsTheSameSchemeWithFreeStatus()
    {
        var scheme = RuleHarness.Bind(RuleHarness.Header + Body + Roles);

        var expansion = Expand(scheme, out var diagnostics);

        Assert.Same(scheme, expansion.Scheme);
        Assert.False(expansion.StatusModelled);
        Assert.Empty(diagnostics);
    }

    [Fact]
    public void Expand_WhenTheBreakerIsModelled_TurnsTheStatusInputsIntoDrivenLocals()
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model\n  closing_time = T#6ms .. T#10ms;\n  opening_time = T#4ms;\nend\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        Assert.Empty(diagnostics);
        Assert.True(expansion.StatusModelled);
        Assert.Equal(["B52A", "B52B"], expansion.ModelledStatuses);
        var symbols = expansion.Scheme!.Symbols;
        Assert.Equal(SymbolKind.Local, symbols["B52A"].Kind);
        Assert.Equal(SymbolKind.Local, symbols["B52B"].Kind);
        Assert.Equal(SymbolKind.Input, symbols["BKM_CLOSING_DONE"].Kind);
        Assert.Equal("B52A", expansion.Scheme.Equations.Single(e => e.Target.Name == "B52A").Target.Name);
        Assert.Equal(0, expansion.Scheme.Equations.Single(e => e.Target.Name == "BKM_WAS_CLOSED").Index);
        Assert.Equal("BKM_TRIP_COIL", expansion.Scheme.Equations[^1].Target.Name);
        Assert.Contains("B52A := BKM_CLOSED;", expansion.Program!.ToText(), StringComparison.Ordinal);
        Assert.Contains("assume BKM_OPENING_TIME_MAX: NOT HELD(BKM_OPENING, T#4ms);", expansion.Program.ToText(), StringComparison.Ordinal);
        Assert.Contains("driven by the breaker model", expansion.Summary, StringComparison.Ordinal);
    }

    [Fact]
    public void Expand_WhenTheBreakerIsModelled_PointsGeneratedCodeAtTheBreakerModelLines()
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model\n  closing_time = T#6ms .. T#10ms;\n  opening_time = T#4ms;\nend\n";
        var closingLine = LineOf(text, "closing_time");

        var model = RuleHarness.Model(text);

        Assert.Equal(closingLine, model.Cells.Single(c => c.Name == "BKM_CLOSING").Span.Line);
        Assert.Equal(closingLine, model.Assumptions.Single(a => a.Name == "BKM_CLOSING_TIME_MAX").Span.Line);
        Assert.Equal(CellKind.Variable, model.Cells.Single(c => c.Name == "B52A").Kind);
        Assert.DoesNotContain(model.StateSlots, slot => slot.PowerUp is UnknownPowerUp);
    }

    [Fact]
    public void Expand_WhenASchemeNameUsesTheGeneratedPrefix_ChoosesAnotherPrefix()
    {
        var text = RuleHarness.Header + Body.Replace("TRIP_CMD : bool;", "TRIP_CMD : bool; BKM_SPARE : bool;", StringComparison.Ordinal)
            + Roles + "breaker_model closing_time = T#6ms; opening_time = T#4ms; end\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        Assert.Empty(diagnostics);
        Assert.Equal("BKM2_", expansion.Program!.Prefix);
        Assert.True(expansion.Scheme!.Symbols.ContainsKey("BKM2_CLOSED"));
    }

    [Theory]
    [InlineData("closing_tme = T#6ms;", "closing_tme", RuleCodes.UnknownBreakerModelKey)]
    [InlineData("trip_free = T#6ms;", "T#6ms", RuleCodes.BreakerModelValueKind)]
    [InlineData("opening_time = T#4ms;", "opening_time", RuleCodes.BreakerModelKeyTwice)]
    [InlineData("close_into_fault = TRUE;", "close_into_fault = TRUE;", RuleCodes.BreakerModelKeyMissing)]
    public void Expand_WhenAKeyIsWrong_ReportsItsCodeWhereItIsWritten(string line, string offending, string code)
    {
        var (text, offendingLine) = WithBlock("closing_time = T#6ms;\n  opening_time = T#4ms;", line);

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        var error = Assert.Single(diagnostics);
        Assert.Equal(code, error.Code);
        Assert.Equal(offendingLine, error.Span.Line);
        Assert.Equal(line.IndexOf(offending, StringComparison.Ordinal) + 3, error.Span.Column); // indented by two spaces
        Assert.Null(expansion.Scheme);
        Assert.False(expansion.StatusModelled);
    }

    [Theory]
    [InlineData("closing_time = TRUE;", "TRUE", RuleCodes.BreakerModelValueKind)]
    [InlineData("closing_time = T#10ms .. T#6ms;", "T#10ms .. T#6ms", RuleCodes.BreakerModelRangeInvalid)]
    [InlineData("closing_time = 0 ms;", "0 ms", RuleCodes.BreakerModelRangeInvalid)]
    [InlineData("closing_time = CMD;", "CMD", RuleCodes.BreakerModelValueKind)]
    public void Expand_WhenATimeIsWrong_ReportsItsCodeAtTheValue(string line, string offending, string code)
    {
        var (text, offendingLine) = WithBlock("opening_time = T#4ms;", line);

        Expand(RuleHarness.Bind(text), out var diagnostics);

        var error = Assert.Single(diagnostics);
        Assert.Equal(code, error.Code);
        Assert.Equal(offendingLine, error.Span.Line);
        Assert.Equal(line.IndexOf(offending, StringComparison.Ordinal) + 3, error.Span.Column);
    }

    [Fact]
    public void Expand_WhenClosingTimeIsMissing_ReportsItAtTheBlock()
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model\n  opening_time = T#4ms;\nend\n";

        Expand(RuleHarness.Bind(text), out var diagnostics);

        var error = Assert.Single(diagnostics);
        Assert.Equal(RuleCodes.BreakerModelKeyMissing, error.Code);
        Assert.Equal(LineOf(text, "breaker_model"), error.Span.Line);
        Assert.Contains("closing_time", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("roles trip_output = TO; breaker_closed = B52A; end", RuleCodes.BreakerModelNeedsRole, "close_output")]
    [InlineData("roles close_output = CO; trip_output = TO; end", RuleCodes.BreakerModelNeedsRole, "breaker_closed")]
    [InlineData("roles close_output = CO; trip_output = TO; breaker_closed = SEEN_CLOSED; end", RuleCodes.BreakerStatusNotInput, "SEEN_CLOSED")]
    [InlineData("roles close_output = CO; trip_output = TO; breaker_closed = B52A; breaker_open = B52A; end", RuleCodes.BreakerModelNeedsRole, "both name 'B52A'")]
    public void Expand_WhenTheRolesDoNotConnectTheBreaker_ReportsWhatIsMissing(string roles, string code, string named)
    {
        var text = RuleHarness.Header + Body + roles + "\nbreaker_model closing_time = T#6ms; opening_time = T#4ms; end\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        var error = Assert.Single(diagnostics);
        Assert.Equal(code, error.Code);
        Assert.Contains(named, error.Message, StringComparison.Ordinal);
        Assert.Null(expansion.Scheme);
    }

    [Fact]
    public void Expand_WhenCloseIntoFaultHasNoProtectionTripInput_ReportsItAtTheDelay()
    {
        var text = RuleHarness.Header + Body
            + "roles close_output = CO; trip_output = TO; breaker_closed = B52A; trip_command = SEEN_CLOSED; end\n"
            + "breaker_model\n  closing_time = T#6ms;\n  opening_time = T#4ms;\n  close_into_fault = TRUE;\n  close_into_fault_delay = T#2ms .. T#4ms;\nend\n";

        Expand(RuleHarness.Bind(text), out var diagnostics);

        var error = Assert.Single(diagnostics);
        Assert.Equal(RuleCodes.CloseIntoFaultNeedsTripInput, error.Code);
        Assert.Equal(LineOf(text, "close_into_fault_delay"), error.Span.Line);
    }

    [Fact]
    public void Expand_WhenTravelTimesAreNotWholeScans_WarnsForEachRoundedEnd()
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model\n  closing_time = T#5ms .. T#9ms;\n  opening_time = T#4ms;\nend\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        Assert.True(expansion.StatusModelled);
        Assert.Equal(2, diagnostics.Count(d => d.Code == RuleCodes.BreakerTimeRounded && d.Severity == Severity.Warning));
        Assert.Contains(diagnostics, d => d.Message.Contains("T#5ms is 2.5 scans", StringComparison.Ordinal) && d.Message.Contains("uses 3 scans", StringComparison.Ordinal));
    }

    [Fact]
    public void Expand_WhenAnAssumptionReadsAModelledStatus_WarnsAtTheAssumption()
    {
        var text = RuleHarness.Header + Body + Roles + "assume CONTACTS_AGREE: B52B = NOT B52A;\n"
            + "breaker_model closing_time = T#6ms; opening_time = T#4ms; end\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        var warning = Assert.Single(diagnostics);
        Assert.Equal(RuleCodes.AssumptionReadsModelledStatus, warning.Code);
        Assert.Equal(LineOf(text, "assume CONTACTS_AGREE"), warning.Span.Line);
        Assert.True(expansion.StatusModelled);
    }

    [Fact]
    public void Expand_WhenCloseIntoFaultIsOffButADelayIsGiven_WarnsThatItIsIgnored()
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model closing_time = T#6ms; opening_time = T#4ms; close_into_fault_delay = T#2ms; end\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        Assert.Equal(RuleCodes.CloseIntoFaultDelayIgnored, Assert.Single(diagnostics).Code);
        Assert.DoesNotContain(expansion.Program!.Assumptions, a => a.Name.EndsWith("CLOSE_INTO_FAULT", StringComparison.Ordinal));
    }

    private static BreakerModelExpansion Expand(BoundScheme scheme, out IReadOnlyList<Diagnostic> diagnostics)
    {
        var bag = new DiagnosticBag();
        var roles = RoleBinder.Bind(scheme, bag);
        var expansion = BreakerModelExpander.Expand(scheme, roles, bag);
        diagnostics = bag.ToList();
        return expansion;
    }

    /// <summary>A scheme whose breaker_model block has <paramref name="lines"/> and then <paramref name="last"/>, and the line number of the latter.</summary>
    private static (string Text, int LastLine) WithBlock(string lines, string last)
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model\n  " + lines + "\n  " + last + "\nend\n";
        return (text, LineOf(text, "\nend\n"));
    }

    private static int LineOf(string text, string fragment) => text[..text.IndexOf(fragment, StringComparison.Ordinal)].Count(c => c == '\n') + 1;
}
