namespace LogicProof.Proof.Tests.Oracle;

/// <summary>
/// One scan of some interpreter of a scheme over a finite input alphabet, for <see cref="BreadthFirstExplorer"/>:
/// the power-up states, the input vectors (numbered 0 to <see cref="InputVectorCount"/> - 1) and the step itself.
/// States must compare by value.
/// </summary>
internal interface IScanStepper<TState>
    where TState : notnull
{
    int PropertyCount { get; }

    int InputVectorCount { get; }

    IEnumerable<TState> PowerUpStates();

    /// <summary>One scan from <paramref name="state"/> (left unchanged); fills each property's value and returns whether every assumption holds.</summary>
    bool Step(TState state, int inputVector, bool[] properties, out TState next);

    string DescribeInputs(int inputVector);
}
