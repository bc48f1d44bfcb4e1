using LogicProof.Language.Binding;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>A formula that must hold at every scan: a requirement of the scheme or an applied built-in rule.</summary>
internal sealed record ReferenceProperty(string Name, BoundExpression Formula);
