using System.Reflection;
using LogicProof.Proof.Solving;
using Microsoft.Z3;

namespace LogicProof.Proof.Tests.Solving;

internal static class Z3TestContext
{
    private static readonly PropertyInfo NativeContextProperty =
        typeof(Context).GetProperty("nCtx", BindingFlags.Instance | BindingFlags.NonPublic)
        ?? throw new InvalidOperationException("Microsoft.Z3.Context has no nCtx property.");

    public static Context Create()
    {
        Z3Runtime.EnsureLoaded();
        return new Context();
    }

    public static IntPtr NativeHandle(Context context) => (IntPtr)NativeContextProperty.GetValue(context)!;
}
