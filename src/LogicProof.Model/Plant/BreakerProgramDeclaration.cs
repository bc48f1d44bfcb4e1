using LogicProof.Core.Text;

namespace LogicProof.Model.Plant;

/// <summary>A bool input or local the breaker model adds to the scheme (locals start FALSE), with its description.</summary>
public sealed record BreakerProgramDeclaration(string Name, string Description, SourceSpan Span);
