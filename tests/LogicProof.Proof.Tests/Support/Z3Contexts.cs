using LogicProof.Proof.Solving;
using Microsoft.Z3;

namespace LogicProof.Proof.Tests.Support;

internal static class Z3Contexts
{
    public static Context Create()
    {
        Z3Runtime.EnsureLoaded();
        return new Context();
    }
}
