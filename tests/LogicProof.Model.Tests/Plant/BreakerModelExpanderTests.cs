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
    [InlineData("fails_to_close = T#6ms;", "T#6ms", RuleCodes.BreakerModelValueKind)]
    [InlineData("aux_contact_fault = CO;", "CO", RuleCodes.BreakerModelValueKind)]
    [InlineData("spring_recharge_time = T#9ms .. T#3ms;", "T#9ms .. T#3ms", RuleCodes.BreakerModelRangeInvalid)]
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

    [Theory]
    [InlineData("", RuleCodes.BreakerModelNeedsRole, "bind spring_charged")]
    [InlineData("spring_charged = SEEN_CLOSED;", RuleCodes.BreakerStatusNotInput, "SEEN_CLOSED")]
    public void Expand_WhenTheSpringIsModelledWithoutASpringInput_ReportsIt(string springRole, string code, string named)
    {
        var text = RuleHarness.Header + Body + Roles.Replace(" end", " " + springRole + " end", StringComparison.Ordinal)
            + "breaker_model\n  closing_time = T#6ms;\n  opening_time = T#4ms;\n  spring_recharge_time = T#20ms .. T#40ms;\nend\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        var error = Assert.Single(diagnostics);
        Assert.Equal(code, error.Code);
        Assert.Contains(named, error.Message, StringComparison.Ordinal);
        Assert.Null(expansion.Scheme);
    }

    [Fact]
    public void Expand_WhenEveryFailureOptionIsOn_DrivesTheSpringInputAndNamesTheOptions()
    {
        var text = RuleHarness.Header + Body.Replace("B52B : bool;", "B52B : bool; SPRING_LS : bool;", StringComparison.Ordinal)
            + Roles.Replace(" end", " spring_charged = SPRING_LS; end", StringComparison.Ordinal)
            + "breaker_model\n  closing_time = T#6ms;\n  opening_time = T#4ms;\n  fails_to_close = TRUE;\n  fails_to_trip = TRUE;\n"
            + "  spring_recharge_time = T#20ms .. T#40ms;\n  travel_contacts_free = TRUE;\n  aux_contact_fault = TRUE;\nend\n";

        var expansion = Expand(RuleHarness.Bind(text), out var diagnostics);

        Assert.Empty(diagnostics);
        Assert.Equal(["B52A", "B52B", "SPRING_LS"], expansion.ModelledStatuses);
        Assert.Equal(SymbolKind.Local, expansion.Scheme!.Symbols["SPRING_LS"].Kind);
        Assert.Equal(SymbolKind.Input, expansion.Scheme.Symbols["BKM_CLOSE_FAILS"].Kind);
        Assert.Equal(SymbolKind.Input, expansion.Scheme.Symbols["BKM_B_STUCK_VALUE"].Kind);
        Assert.Equal(LineOf(text, "spring_recharge_time"), expansion.Scheme.Assumptions.Single(a => a.Name == "BKM_RECHARGE_TIME_MAX").Syntax.Span.Line);
        Assert.Contains("may fail to close, may fail to trip, spring recharge T#20ms .. T#40ms, 52a/52b free during travel, 52a/52b may fail stuck", expansion.Summary, StringComparison.Ordinal);
    }

    [Fact]
    public void Expand_WhenNoFailureOptionIsWritten_WritesTheHealthyBreakerOnly()
    {
        var text = RuleHarness.Header + Body + Roles + "breaker_model closing_time = T#6ms; opening_time = T#4ms; trip_free = TRUE; end\n";

        var program = Expand(RuleHarness.Bind(text), out _).Program!.ToText();

        Assert.Contains("BKM_CLOSING := (NOT BKM_WAS_CLOSED AND NOT BKM_CLOSING AND NOT BKM_OPENING AND BKM_CLOSE_COIL AND NOT BKM_TRIP_COIL) OR (BKM_CLOSING AND NOT BKM_CLOSING_DONE AND NOT BKM_ABORT);", program, StringComparison.Ordinal);
        Assert.Contains("B52B := NOT BKM_CLOSED AND NOT BKM_CLOSING AND NOT BKM_OPENING;", program, StringComparison.Ordinal);
        Assert.DoesNotContain("FAILS", program, StringComparison.Ordinal);
        Assert.DoesNotContain("SPRING", program, StringComparison.Ordinal);
        Assert.DoesNotContain("IN_TRAVEL", program, StringComparison.Ordinal);
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
