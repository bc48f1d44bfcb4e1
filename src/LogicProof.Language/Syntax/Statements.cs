using LogicProof.Core.Text;

namespace LogicProof.Language.Syntax;

/// <summary><c>NAME := expression;</c> evaluated once per scan in the order written.</summary>
public sealed record EquationSyntax(string Target, SourceSpan TargetSpan, ExpressionSyntax Expression, SourceSpan Span);

/// <summary><c>require NAME: formula;</c> must hold at every scan.</summary>
public sealed record RequirementSyntax(string Name, SourceSpan NameSpan, ExpressionSyntax Formula, SourceSpan Span);

/// <summary><c>assume formula;</c> restricts the input sequences considered.</summary>
public sealed record AssumptionSyntax(string? Name, ExpressionSyntax Formula, SourceSpan Span);
