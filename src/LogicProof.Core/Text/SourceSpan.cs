namespace LogicProof.Core.Text;

/// <summary>A range of source text: file, 0-based offset and length, and the 1-based line and column of its start.</summary>
public readonly record struct SourceSpan(string File, int Offset, int Length, int Line, int Column)
{
    public static SourceSpan None { get; } = new(string.Empty, 0, 0, 0, 0);

    public bool IsNone => Line == 0;

    public override string ToString() => IsNone ? File : $"{File}:{Line}:{Column}";
}
