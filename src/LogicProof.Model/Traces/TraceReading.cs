using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Model.Traces;

/// <summary>One reading of a trace file; the rules are documented on <see cref="InputTraceReader"/>.</summary>
internal sealed class TraceReading(SourceText source, ScanModel model)
{
    private readonly DiagnosticBag _diagnostics = new();
    private readonly int[] _lineStarts = LineStarts(source.Content);
    private readonly List<InputTraceRow> _rows = [];
    private int[] _cellOfColumn = [];
    private Fraction? _endMs;
    private int _endLine;

    public InputTraceResult Read()
    {
        var records = TraceCsvScanner.Scan(source.Content);
        foreach (var record in records.Where(record => record.SpansLines))
        {
            Error(TraceCodes.MultiLineCell, "a quoted cell spans several lines; close the quote on the same line.", record.Line, 1, 1);
        }

        if (records.Count == 0)
        {
            Error(TraceCodes.MissingTimeColumn, $"the input trace is empty: expected a header line starting with '{InputTraceReader.TimeColumnName}'.", 1, 1, 1);
            return new InputTraceResult(null, _diagnostics.ToList());
        }

        var initial = InputTrace.DefaultInputs(model);
        if (ReadHeader(records[0]))
        {
            var current = initial;
            foreach (var record in records.Skip(1).Where(record => !record.SpansLines))
            {
                current = ReadRow(record, current);
            }

            if (_rows.Count == 0 && _endMs is null)
            {
                Error(TraceCodes.NoRows, "the input trace has a header but no rows.", records[0].Line, 1, 1);
            }

            WarnAboutRowsNoScanSees();
        }

        var trace = _diagnostics.HasErrors ? null : new InputTrace(model, initial, _rows, _endMs);
        return new InputTraceResult(trace, _diagnostics.ToList());
    }

    private bool ReadHeader(TraceCsvRecord header)
    {
        var timeCell = header.Cells[0];
        if (!timeCell.Text.Equals(InputTraceReader.TimeColumnName, StringComparison.OrdinalIgnoreCase))
        {
            Error(
                TraceCodes.MissingTimeColumn,
                $"the first column must be '{InputTraceReader.TimeColumnName}' (milliseconds from power-up), not '{Shown(timeCell.Text)}'.",
                header.Line,
                timeCell);
            return false;
        }

        var inputsByName = model.Inputs.ToDictionary(cell => model.Cells[cell].Name, StringComparer.OrdinalIgnoreCase);
        var cellsByName = new Dictionary<string, Cell>(StringComparer.OrdinalIgnoreCase);
        foreach (var cell in model.Cells)
        {
            cellsByName.TryAdd(cell.Name, cell);
        }

        var columnOfInput = new Dictionary<int, TraceCsvCell>();
        _cellOfColumn = new int[header.Cells.Count];
        var ok = true;
        for (var column = 1; column < header.Cells.Count; column++)
        {
            var name = header.Cells[column];
            _cellOfColumn[column] = -1;
            if (!inputsByName.TryGetValue(name.Text, out var input))
            {
                if (name.Text.Length == 0 && header.Cells.Skip(column).All(cell => cell.Text.Length == 0))
                {
                    break;
                }

                var why = name.Text.Length == 0
                    ? "a column has no name"
                    : cellsByName.ContainsKey(name.Text)
                        ? $"'{Shown(name.Text)}' is not an input of scheme '{model.Name}' (it is computed by the scheme)"
                        : $"'{Shown(name.Text)}' is not an input of scheme '{model.Name}'";
                Error(TraceCodes.UnknownColumn, why + "; inputs: " + InputList() + ".", header.Line, name);
                ok = false;
                continue;
            }

            if (columnOfInput.TryGetValue(input, out var first))
            {
                _diagnostics.Add(new Diagnostic(TraceCodes.DuplicateColumn, Severity.Error, $"input '{model.Cells[input].Name}' has two columns.", Span(header.Line, name))
                {
                    Related = [new RelatedLocation("first column", Span(header.Line, first))],
                });
                ok = false;
                continue;
            }

            columnOfInput[input] = name;
            _cellOfColumn[column] = input;
        }

        var missing = model.Inputs.Where(input => !columnOfInput.ContainsKey(input)).Select(input => model.Cells[input]).ToList();
        if (missing.Count > 0)
        {
            var list = string.Join(", ", missing.Select(cell => cell.Type == SignalType.Bool
                ? cell.Name
                : $"{cell.Name} = {ExactNumberText.FormatExact(InputTrace.DefaultReal(cell))}"));
            var subject = missing.Count == 1 ? "an input has no column; it stays" : $"{missing.Count} inputs have no column; they stay";
            _diagnostics.Add(new Diagnostic(
                TraceCodes.MissingInputColumn,
                Severity.Warning,
                $"{subject} FALSE (a real at the value shown) for the whole run: {list}.",
                Span(header.Line, header.Cells[0])));
        }

        return ok;
    }

    private ScanInputs ReadRow(TraceCsvRecord record, ScanInputs previous)
    {
        var timeCell = record.Cells[0];
        var time = ReadTime(record, timeCell);
        if (_endMs is not null)
        {
            if (_endLine > 0)
            {
                Error(TraceCodes.MisplacedEnd, $"a row follows the END row of line {_endLine}; END must be the last row.", record.Line, timeCell);
                _endLine = 0;
            }

            return previous;
        }

        if (record.Cells.Count > 1 && record.Cells[1].Text.Equals(InputTraceReader.EndMarker, StringComparison.OrdinalIgnoreCase))
        {
            foreach (var extra in record.Cells.Skip(2).Where(cell => cell.Text.Length > 0))
            {
                Error(TraceCodes.MisplacedEnd, "the END row carries no values; move them to a row before it.", record.Line, extra);
            }

            _endMs = time ?? Fraction.Zero;
            _endLine = record.Line;
            return previous;
        }

        var inputs = previous.Clone();
        for (var column = 1; column < record.Cells.Count; column++)
        {
            var cell = record.Cells[column];
            if (cell.Text.Length == 0)
            {
                continue;
            }

            if (column >= _cellOfColumn.Length || _cellOfColumn[column] < 0)
            {
                if (column >= _cellOfColumn.Length)
                {
                    Error(TraceCodes.TooManyCells, $"the row has more cells than the header's {_cellOfColumn.Length} columns.", record.Line, cell);
                    break;
                }

                continue;
            }

            ReadValue(record.Line, cell, _cellOfColumn[column], inputs);
        }

        if (time is { } t)
        {
            _rows.Add(new InputTraceRow(t, inputs) { Line = record.Line });
        }

        return inputs;
    }

    private Fraction? ReadTime(TraceCsvRecord record, TraceCsvCell cell)
    {
        if (cell.Text.Length == 0)
        {
            Error(TraceCodes.BadTime, "the row has no time; every row starts with its time in ms.", record.Line, cell);
            return null;
        }

        if (!ExactNumberText.TryParse(cell.Text, out var time))
        {
            Error(TraceCodes.BadTime, $"'{Shown(cell.Text)}' is not a time in ms: use an exact decimal such as 12.5 (with a point).", record.Line, cell);
            return null;
        }

        if (time.CompareTo(Fraction.Zero) < 0 || time.CompareTo(InputTrace.MaxTimeMs) > 0)
        {
            Error(TraceCodes.BadTime, $"time {Shown(cell.Text)} ms is out of range: times run from 0 to {ExactNumberText.FormatExact(InputTrace.MaxTimeMs)} ms.", record.Line, cell);
            return null;
        }

        var previousTime = _endMs ?? (_rows.Count > 0 ? _rows[^1].TimeMs : (Fraction?)null);
        if (previousTime is { } before && time.CompareTo(before) < 0)
        {
            var previousLine = _endMs is not null ? _endLine : _rows[^1].Line;
            _diagnostics.Add(new Diagnostic(
                TraceCodes.DecreasingTime,
                Severity.Error,
                $"time {Shown(cell.Text)} ms is earlier than the previous row's {ExactNumberText.FormatExact(before)} ms; times never decrease.",
                Span(record.Line, cell))
            {
                Related = [new RelatedLocation("previous row", Span(previousLine, 1, 1))],
            });
            return null;
        }

        return time;
    }

    private void ReadValue(int line, TraceCsvCell text, int input, ScanInputs inputs)
    {
        var cell = model.Cells[input];
        if (cell.Type == SignalType.Bool)
        {
            if (InputTraceReader.ParseBool(text.Text) is { } value)
            {
                inputs.SetBool(input, value);
            }
            else
            {
                Error(TraceCodes.BadBoolValue, $"'{Shown(text.Text)}' is not a value of bool input '{cell.Name}': use 1, 0, TRUE or FALSE.", line, text);
            }

            return;
        }

        if (!ExactNumberText.TryParse(text.Text, out var real))
        {
            Error(TraceCodes.BadRealValue, $"'{Shown(text.Text)}' is not a value of real input '{cell.Name}': use an exact decimal such as -0.25 (with a point).", line, text);
            return;
        }

        if (cell.Range is { } range && (real.CompareTo(range.Low) < 0 || real.CompareTo(range.High) > 0))
        {
            Error(
                TraceCodes.RealOutOfRange,
                $"{Shown(text.Text)} is outside the range {ExactNumberText.FormatExact(range.Low)} .. {ExactNumberText.FormatExact(range.High)} declared for input '{cell.Name}'.",
                line,
                text);
            return;
        }

        inputs.SetReal(input, real);
    }

    private void WarnAboutRowsNoScanSees()
    {
        if (_diagnostics.HasErrors || _rows.Count == 0)
        {
            return;
        }

        var timing = model.Timing;
        var scanText = ExactNumberText.FormatExact(timing.ScanMilliseconds);
        if (_rows[0].TimeMs.CompareTo(Fraction.Zero) > 0)
        {
            Warning(TraceCodes.LateFirstRow, $"the first row starts at {ExactNumberText.FormatExact(_rows[0].TimeMs)} ms; before it every input is FALSE (or 0).", _rows[0].Line);
        }

        for (var i = 0; i < _rows.Count; i++)
        {
            var nextTime = i + 1 < _rows.Count ? _rows[i + 1].TimeMs : _endMs;
            if (nextTime is { } next
                && InputTrace.FirstScanAtOrAfter(next, timing) == InputTrace.FirstScanAtOrAfter(_rows[i].TimeMs, timing))
            {
                Warning(
                    TraceCodes.RowNeverInForce,
                    $"no scan sees this row: the next row (at {ExactNumberText.FormatExact(next)} ms) replaces it before the next scan starts (scans every {scanText} ms).",
                    _rows[i].Line);
            }
        }
    }

    /// <summary>A cell's text for a message: one line, at most 40 characters, whatever the file holds.</summary>
    private static string Shown(string text)
    {
        const int longest = 40;
        var printable = new string(text.Select(c => char.IsControl(c) || c == '\uFFFD' ? '?' : c).ToArray());
        return printable.Length <= longest ? printable : printable[..longest] + "...";
    }

    private string InputList()
    {
        const int shown = 12;
        var names = model.Inputs.Select(input => model.Cells[input].Name).ToList();
        return names.Count == 0 ? "(none)" : string.Join(", ", names.Take(shown)) + (names.Count > shown ? $", ... ({names.Count} in all)" : string.Empty);
    }

    private void Error(string code, string message, int line, TraceCsvCell cell) =>
        _diagnostics.Error(code, message, Span(line, cell));

    private void Error(string code, string message, int line, int column, int length) =>
        _diagnostics.Error(code, message, Span(line, column, length));

    private void Warning(string code, string message, int line) =>
        _diagnostics.Warning(code, message, Span(line, 1, 1));

    private SourceSpan Span(int line, TraceCsvCell cell) => Span(line, cell.Column, Math.Max(cell.Length, 1));

    private SourceSpan Span(int line, int column, int length)
    {
        var offset = Math.Min(_lineStarts[Math.Clamp(line - 1, 0, _lineStarts.Length - 1)] + column - 1, source.Content.Length);
        return new SourceSpan(source.Path, offset, length, line, column);
    }

    private static int[] LineStarts(string content)
    {
        var starts = new List<int> { 0 };
        for (var i = 0; i < content.Length; i++)
        {
            if (content[i] == '\n')
            {
                starts.Add(i + 1);
            }
        }

        return [.. starts];
    }
}
