namespace LogicProof.Language.Tests.Support;

/// <summary>Tests that time themselves or use much memory run alone, after the parallel ones.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class SequentialCollection
{
    public const string Name = "Sequential";
}
