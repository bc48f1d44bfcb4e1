namespace LogicProof.Model.Traces;

/// <summary>
/// Diagnostic codes of simulation inputs: the input-trace CSV and the options of a simulation run (LP4xxx).
/// Stable across releases; a code is never reused for another meaning.
/// </summary>
public static class TraceCodes
{
    /// <summary>The trace file cannot be read.</summary>
    public const string FileUnreadable = "LP4001";

    /// <summary>The first column of the header is not <c>time_ms</c>, or there is no header.</summary>
    public const string MissingTimeColumn = "LP4002";

    /// <summary>A header column names no input of the scheme (or names a variable, not an input).</summary>
    public const string UnknownColumn = "LP4003";

    /// <summary>Two header columns name the same input.</summary>
    public const string DuplicateColumn = "LP4004";

    /// <summary>Warning: an input of the scheme has no column; it stays FALSE (or 0) for the whole run.</summary>
    public const string MissingInputColumn = "LP4005";

    /// <summary>A time cell is empty, not an exact decimal, negative or too large.</summary>
    public const string BadTime = "LP4006";

    /// <summary>A row's time is earlier than the row before it.</summary>
    public const string DecreasingTime = "LP4007";

    /// <summary>A bool cell is not 1, 0, TRUE or FALSE.</summary>
    public const string BadBoolValue = "LP4008";

    /// <summary>A real cell is not an exact decimal (or fraction).</summary>
    public const string BadRealValue = "LP4009";

    /// <summary>A real cell lies outside the input's declared range.</summary>
    public const string RealOutOfRange = "LP4010";

    /// <summary>A row has more non-empty cells than the header has columns.</summary>
    public const string TooManyCells = "LP4011";

    /// <summary>A row follows the END row, or the END row carries values.</summary>
    public const string MisplacedEnd = "LP4012";

    /// <summary>The trace has no data rows.</summary>
    public const string NoRows = "LP4013";

    /// <summary>A quoted cell spans more than one line.</summary>
    public const string MultiLineCell = "LP4014";

    /// <summary>Warning: a row is replaced by the next one before any scan starts, so no scan sees it.</summary>
    public const string RowNeverInForce = "LP4015";

    /// <summary>Warning: the first row starts after 0 ms, so the scans before it see every input FALSE (or 0).</summary>
    public const string LateFirstRow = "LP4016";

    /// <summary>The run length (<c>--until</c>) is not a positive exact decimal of milliseconds.</summary>
    public const string BadUntil = "LP4017";

    /// <summary>A power-up choice (<c>--powerup NAME=TRUE|FALSE</c>) is malformed or names no latch of unknown power-up.</summary>
    public const string BadPowerUp = "LP4018";

    /// <summary>Warning: a latch of unknown power-up was given no value and starts FALSE.</summary>
    public const string PowerUpDefaulted = "LP4019";

    /// <summary>A name to show (<c>--show</c>) is not a cell of the scheme.</summary>
    public const string UnknownShowName = "LP4020";

    /// <summary>An option of the simulation run is malformed (an unknown format, a stray argument).</summary>
    public const string BadOption = "LP4021";

    /// <summary>The run would exceed <see cref="InputTrace.MaxScans"/> scans (a mistyped END time or --until).</summary>
    public const string RunTooLong = "LP4022";
}
