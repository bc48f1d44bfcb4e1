using LogicProof.Core.Text;

namespace LogicProof.Model.Plant;

/// <summary>
/// An equation (<see cref="Name"/> is its target) or a named assumption of the breaker model, as text in the
/// language; <see cref="Span"/> is the breaker_model line it comes from, where its diagnostics point.
/// </summary>
public sealed record BreakerProgramStatement(string Name, string Formula, SourceSpan Span);
