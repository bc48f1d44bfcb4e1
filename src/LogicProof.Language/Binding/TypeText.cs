using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>Type names as written in the language, for messages.</summary>
internal static class TypeText
{
    public static string Of(ValueType type) => type switch
    {
        ValueType.Bool => "bool",
        ValueType.Real => "real",
        _ => "time",
    };
}
