namespace LogicProof.Model.Traces;

/// <summary>One CSV record of a trace file: its 1-based line and its cells, unquoted and trimmed.</summary>
internal sealed record TraceCsvRecord(int Line, IReadOnlyList<TraceCsvCell> Cells, bool SpansLines);

/// <summary>A cell's text and where it starts on its line (1-based column), for diagnostics.</summary>
internal sealed record TraceCsvCell(string Text, int Column, int Length);
