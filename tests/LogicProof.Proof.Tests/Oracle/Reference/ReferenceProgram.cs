using LogicProof.Core.Diagnostics;
using LogicProof.Language;
using LogicProof.Language.Binding;
using LogicProof.Model.Rules;

namespace LogicProof.Proof.Tests.Oracle.Reference;

/// <summary>
/// What the reference interpreter runs: the bound scheme (with the breaker added when the file has a breaker_model
/// block, as the rule setup returns it) and the properties to watch, the scheme's requirements then the applied
/// built-in rules, each a bound formula. Only the front end and the rule setup are shared with the product; both
/// give syntax trees, never the lowered model.
/// </summary>
internal sealed record ReferenceProgram(BoundScheme Scheme, IReadOnlyList<ReferenceProperty> Properties)
{
    /// <summary>The program of a scheme that must be free of errors; an error throws with the diagnostics.</summary>
    public static ReferenceProgram FromSource(string source, string path = "reference.lpl")
    {
        var front = FrontEnd.LoadText(path, source);
        var setup = front.Scheme is null ? null : RuleSetup.Prepare(front.Scheme);
        if (setup?.ModelScheme is not { } scheme)
        {
            var diagnostics = setup?.Diagnostics ?? front.Diagnostics;
            throw new InvalidOperationException(
                "the scheme has errors:" + Environment.NewLine
                + string.Join(Environment.NewLine, diagnostics.Select(d => DiagnosticFormatter.Format(d, null))) + Environment.NewLine + source);
        }

        var properties = scheme.Requirements.Select(r => new ReferenceProperty(r.Name, r.Formula))
            .Concat(setup.ExtraProperties.Select(p => new ReferenceProperty(p.Name, p.Formula)))
            .ToList();
        return new ReferenceProgram(scheme, properties);
    }
}
