using System.Globalization;
using Fractions;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>The reference interpreter as a stepper over an <see cref="InputAlphabet"/>: the oracle's verdicts come from here.</summary>
internal sealed class ReferenceStepper : IScanStepper<ReferenceState>
{
    private readonly ReferenceInterpreter _interpreter;
    private readonly List<ReferenceInputs> _vectors = [];

    public ReferenceStepper(ReferenceInterpreter interpreter, IReadOnlyDictionary<string, Fraction[]>? realDomains = null)
    {
        _interpreter = interpreter;
        var inputs = interpreter.Inputs;
        var domains = inputs.Select(input => InputAlphabet.Domain(input.Name, input.Type == ValueType.Bool, realDomains)).ToList();
        foreach (var values in InputAlphabet.Vectors(domains))
        {
            _vectors.Add(new ReferenceInputs([.. values.Select(v => !v.IsZero)], values));
        }
    }

    public int PropertyCount => _interpreter.Properties.Count;

    public int InputVectorCount => _vectors.Count;

    public IEnumerable<ReferenceState> PowerUpStates() => _interpreter.PowerUpStates();

    public bool Step(ReferenceState state, int inputVector, bool[] properties, out ReferenceState next) =>
        _interpreter.Step(state, _vectors[inputVector], properties, out next);

    public string DescribeInputs(int inputVector)
    {
        var vector = _vectors[inputVector];
        return string.Join(" ", _interpreter.Inputs.Select((input, i) => input.Type == ValueType.Bool
            ? $"{input.Name}={(vector.Bools[i] ? 1 : 0)}"
            : $"{input.Name}={vector.Reals[i].ToString(CultureInfo.InvariantCulture)}"));
    }
}
