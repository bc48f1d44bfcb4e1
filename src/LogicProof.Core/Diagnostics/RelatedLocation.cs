using LogicProof.Core.Text;

namespace LogicProof.Core.Diagnostics;

public sealed record RelatedLocation(string Message, SourceSpan Span);
