using LogicProof.Core.Diagnostics;
using LogicProof.Core.Threading;
using LogicProof.Language.Syntax;
using ValueType = LogicProof.Language.Syntax.ValueType;

namespace LogicProof.Language.Binding;

/// <summary>
/// Binds a formula that is not written in the scheme (a built-in rule applied through the roles, or an assumption
/// of the breaker model) against a bound scheme's names, exactly as a <c>require</c> formula is bound: the formula
/// must be bool, and past-time operators, SINCE and <c>-&gt;</c> are allowed. Returns null after reporting an
/// error. Runs on a large stack like the scheme binder.
/// </summary>
public static class FormulaBinder
{
    public static BoundExpression? Bind(BoundScheme scheme, ExpressionSyntax formula, DiagnosticBag diagnostics, string role = "the formula")
    {
        ArgumentNullException.ThrowIfNull(scheme);
        ArgumentNullException.ThrowIfNull(formula);
        ArgumentNullException.ThrowIfNull(diagnostics);
        return LargeStack.Run(() => new ExpressionBinder(scheme.Symbols, diagnostics).BindAs(formula, ValueType.Bool, inFormula: true, role));
    }
}
