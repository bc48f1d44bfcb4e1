using LogicProof.Model.Graph;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Graph;

public sealed class DependencyGraphTests
{
    // A small close circuit (demo data): the seal-in reads itself and the fail timer at the last scan.
    internal const string Bay = Header + """
        inputs CMD : bool; CLOSED : bool; TRIP : bool; SPARE : bool; GAS_LOW : bool; end
        locals PERMIT : bool; SEAL : bool; FAIL : bool; ALARM : bool; end
        outputs CLOSE : bool; TRIP_OUT : bool; end
        logic
          PERMIT := NOT CLOSED AND NOT TRIP_OUT;
          SEAL := (R_TRIG(CMD) AND PERMIT OR SEAL) AND NOT FAIL;
          CLOSE := SEAL AND NOT CLOSED;
          FAIL := TON(CLOSE, T#500ms);
          TRIP_OUT := TRIP;
          ALARM := GAS_LOW;
        end
        """;

    [Fact]
    public void Build_Always_HasInputsVariablesThenCallSitesAsVertices()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        Assert.Equal(
            ["CMD", "CLOSED", "TRIP", "SPARE", "GAS_LOW", "PERMIT", "SEAL", "FAIL", "ALARM", "CLOSE", "TRIP_OUT", "SEAL.R_TRIG#1", "FAIL.TON#1"],
            graph.Vertices.Select(v => v.Name));
        Assert.Equal(DependencyVertexKind.Output, graph.Find("close")!.Kind);
        Assert.Equal(DependencyVertexKind.FunctionBlock, graph.Find("FAIL.TON#1")!.Kind);
        Assert.Equal("TON T#500ms", graph.Find("FAIL.TON#1")!.Detail);
    }

    [Fact]
    public void Build_Always_LabelsEachReadWithTheTimingTheModelUses()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        string Label(string from, string to) =>
            string.Join(",", graph.Edges.Where(e => e.Source.Name == from && e.Target.Name == to).Select(e => e.Read));

        Assert.Equal("LastScan", Label("TRIP_OUT", "PERMIT"));
        Assert.Equal("SameScan", Label("PERMIT", "SEAL"));
        Assert.Equal("LastScan", Label("SEAL", "SEAL"));
        Assert.Equal("LastScan", Label("FAIL", "SEAL"));
        Assert.Equal("SameScan", Label("CMD", "SEAL.R_TRIG#1"));
        Assert.Equal("SameScan", Label("SEAL.R_TRIG#1", "SEAL"));
        Assert.Equal("SameScan", Label("CLOSE", "FAIL.TON#1"));
        Assert.Equal("SameScan", Label("FAIL.TON#1", "FAIL"));
        var seal = graph.Edges.First(e => e.Target.Name == "SEAL");
        Assert.Equal((9, 3), (seal.Span.Line, seal.Span.Column));
    }

    [Fact]
    public void ConeOfInfluence_WhenCloseOutput_IsExactlyWhatCanAffectIt()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        var cone = graph.ConeNames("CLOSE");

        // Everything that reaches CLOSE through equations, blocks and last-scan reads; not SPARE, GAS_LOW or ALARM.
        Assert.Equal(
            ["CMD", "CLOSED", "TRIP", "PERMIT", "SEAL", "FAIL", "CLOSE", "TRIP_OUT", "SEAL.R_TRIG#1", "FAIL.TON#1"],
            cone);
    }

    [Fact]
    public void ConeOfInfluence_WhenNameHasNoReads_IsTheNameAlone()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        Assert.Equal(["SPARE"], graph.ConeNames("spare"));
        Assert.Equal(["TRIP", "TRIP_OUT"], graph.ConeNames("TRIP_OUT"));
    }

    [Fact]
    public void ConeOfInfluence_WhenNameIsUnknown_Throws()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        Assert.Null(graph.Find("NOPE"));
        Assert.Throws<ArgumentException>(() => graph.ConeOfInfluence("NOPE"));
    }

    [Fact]
    public void Cone_Always_KeepsTheConeVerticesAndTheEdgesAmongThem()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        var cone = graph.Cone("TRIP_OUT");

        Assert.Equal(["TRIP", "TRIP_OUT"], cone.Vertices.Select(v => v.Name));
        var edge = Assert.Single(cone.Edges);
        Assert.Equal(("TRIP", "TRIP_OUT", DependencyReadKind.SameScan), (edge.Source.Name, edge.Target.Name, edge.Read));
    }

    [Fact]
    public void FeedbackLoops_Always_ListsEachStronglyConnectedComponentWithACycle()
    {
        var graph = DependencyGraph.Build(BindScheme(Bay));

        var loops = graph.FeedbackLoops();

        var loop = Assert.Single(loops);
        Assert.Equal(["SEAL", "FAIL", "CLOSE", "FAIL.TON#1"], loop.Select(v => v.Name));
    }

    [Fact]
    public void Build_WhenFormulasAsked_AddsRequirementsAndAssumptionsReadingThisScan()
    {
        var scheme = BindScheme(Bay + "\nrequire NO_CLOSE_ON_TRIP: HELD(CLOSE, T#20ms) -> NOT TRIP_OUT;\nassume NOT (CMD AND TRIP);\n");

        var without = DependencyGraph.Build(scheme);
        var with = DependencyGraph.Build(scheme, includeFormulas: true);

        Assert.Null(without.Find("NO_CLOSE_ON_TRIP"));
        Assert.Equal(DependencyVertexKind.Requirement, with.Find("NO_CLOSE_ON_TRIP")!.Kind);
        Assert.Equal(DependencyVertexKind.Assumption, with.Find("assume#1")!.Kind);
        Assert.All(with.ReadsBy(with.Find("NO_CLOSE_ON_TRIP")!), e => Assert.Equal(DependencyReadKind.SameScan, e.Read));
        Assert.Equal(["CLOSE", "TRIP_OUT"], with.ReadsBy(with.Find("NO_CLOSE_ON_TRIP")!).Select(e => e.Source.Name).Order());
    }
}
