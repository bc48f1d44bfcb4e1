using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

/// <summary>The optional <c>breaker_model ... end</c> block: settings of a modelled circuit breaker.</summary>
public sealed record BreakerModelSyntax(IReadOnlyList<PlantSettingSyntax> Settings, SourceSpan Span);

public sealed record PlantSettingSyntax(string Key, SourceSpan KeySpan, PlantValueSyntax Value, SourceSpan Span);

public abstract record PlantValueSyntax(SourceSpan Span);

public sealed record DurationRangePlantValueSyntax(DurationSyntax Low, DurationSyntax High, SourceSpan Span) : PlantValueSyntax(Span);

public sealed record DurationPlantValueSyntax(DurationSyntax Duration, SourceSpan Span) : PlantValueSyntax(Span);

public sealed record BoolPlantValueSyntax(bool Value, SourceSpan Span) : PlantValueSyntax(Span);

public sealed record NamePlantValueSyntax(string Name, SourceSpan Span) : PlantValueSyntax(Span);
