using LogicProof.Core.Text;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>
/// A declared name. Names are case-insensitive as in IEC 61131-3 (compared ordinally, never by culture);
/// <see cref="Name"/> keeps the declared spelling for display.
/// </summary>
public sealed record Symbol(string Name, SymbolKind Kind, ValueType Type, SourceSpan DeclarationSpan, string? Description)
{
    /// <summary>Inputs only: the declared range of a real input, if any.</summary>
    public RangeSyntax? Range { get; init; }

    /// <summary>Locals and outputs only: the declared power-up value, if any.</summary>
    public BoundConstant? PowerUp { get; init; }

    /// <summary>Locals and outputs only: declared <c>init retained</c> (non-volatile, IEC 61131-3 RETAIN); <see cref="PowerUp"/> is then null.</summary>
    public bool Retained { get; init; }

    /// <summary>Settings only: the setting's value.</summary>
    public BoundConstant? SettingValue { get; init; }
}
