using LogicProof.Proof.Solving;

namespace LogicProof.Proof.Tests.Solving;

public sealed class Z3RuntimeTests
{
    [Fact]
    public void EnsureLoaded_WhenCalledFromManyThreads_LoadsOnceWithoutError()
    {
        Parallel.For(0, 16, _ => Z3Runtime.EnsureLoaded());

        Z3Runtime.EnsureLoaded();
    }

    [Fact]
    public void Version_AfterLoad_ReportsFourPartNativeVersion()
    {
        var version = Z3Runtime.Version;

        var parts = version.Split('.');
        Assert.Equal(4, parts.Length);
        Assert.All(parts, p => Assert.True(uint.TryParse(p, out _), version));
        Assert.Equal("4", parts[0]);
    }

    [Fact]
    public void CompatLibrary_OnLinux_IsCopiedNextToTestAssembly()
    {
        if (!OperatingSystem.IsLinux())
        {
            return;
        }

        Assert.True(File.Exists(Path.Combine(AppContext.BaseDirectory, Z3Runtime.CompatLibraryFileName)));
    }
}
