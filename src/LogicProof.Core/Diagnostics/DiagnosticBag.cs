using System.Collections;
using LogicProof.Core.Text;

namespace LogicProof.Core.Diagnostics;

/// <summary>Collects diagnostics in the order found; every error of a file is kept, not only the first.</summary>
public sealed class DiagnosticBag : IEnumerable<Diagnostic>
{
    private readonly List<Diagnostic> _items = [];

    public bool HasErrors => _items.Exists(d => d.IsError);

    public int Count => _items.Count;

    public void Add(Diagnostic diagnostic) => _items.Add(diagnostic);

    public void AddRange(IEnumerable<Diagnostic> diagnostics) => _items.AddRange(diagnostics);

    public Diagnostic Error(string code, string message, SourceSpan span) =>
        Record(new Diagnostic(code, Severity.Error, message, span));

    /// <summary>An error that also names one other place involved, such as the first declaration of a duplicate.</summary>
    public Diagnostic Error(string code, string message, SourceSpan span, RelatedLocation related) =>
        Record(new Diagnostic(code, Severity.Error, message, span) { Related = [related] });

    public Diagnostic Warning(string code, string message, SourceSpan span) =>
        Record(new Diagnostic(code, Severity.Warning, message, span));

    public Diagnostic Info(string code, string message, SourceSpan span) =>
        Record(new Diagnostic(code, Severity.Info, message, span));

    public IReadOnlyList<Diagnostic> ToList() => [.. _items];

    public IEnumerator<Diagnostic> GetEnumerator() => _items.GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    private Diagnostic Record(Diagnostic diagnostic)
    {
        _items.Add(diagnostic);
        return diagnostic;
    }
}
