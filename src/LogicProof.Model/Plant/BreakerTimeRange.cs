using LogicProof.Core.Text;
using LogicProof.Language.Syntax;

namespace LogicProof.Model.Plant;

/// <summary>
/// A time range of the breaker model, both ends included (<c>3 cyc .. 8 cyc</c>; a single duration is the range
/// from it to itself). <see cref="LowText"/> and <see cref="HighText"/> are how generated formulas write the ends:
/// the duration as written, or the name of the time setting it came from. <see cref="Span"/> is the key's line.
/// </summary>
public sealed record BreakerTimeRange(DurationSyntax Low, string LowText, DurationSyntax High, string HighText, SourceSpan Span);
