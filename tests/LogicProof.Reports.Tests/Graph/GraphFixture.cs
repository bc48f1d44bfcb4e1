using LogicProof.Language;
using LogicProof.Model.Graph;

namespace LogicProof.Reports.Tests.Graph;

internal static class GraphFixture
{
    // A small seal-in with a close-fail timer (demo data).
    public const string Scheme = """"
        scheme QM7_SEAL "seal-in";
        frequency 60 Hz;
        scan 2 ms;
        inputs
          CMD : bool "close ""command""";
          CLOSED : bool;
        end
        locals FAIL : bool; end
        outputs CLOSE : bool; end
        logic
          CLOSE := (CMD OR CLOSE) AND NOT CLOSED AND NOT FAIL;
          FAIL := TON(CLOSE, T#500ms);
        end
        require ENDS: NOT HELD(CLOSE, T#600ms);
        """";

    public static DependencyGraph Build(bool includeFormulas = false)
    {
        var front = FrontEnd.LoadText("seal.lpl", Scheme);
        Assert.False(front.HasErrors, string.Join("\n", front.Diagnostics.Select(d => d.Message)));
        return DependencyGraph.Build(front.Scheme!, includeFormulas);
    }
}
