namespace LogicProof.Language;

/// <summary>
/// Stable diagnostic codes of the Language layer: LP1xxx reading and syntax, LP2xxx names and types.
/// A code is never reused for a different meaning; messages may be reworded.
/// </summary>
public static class LanguageCodes
{
    /// <summary>The file is missing or cannot be read (not found, no permission, a folder, an I/O failure).</summary>
    public const string FileUnreadable = "LP1001";

    /// <summary>The file is not valid UTF-8 (reported at the first invalid byte), or is UTF-16/UTF-32.</summary>
    public const string InvalidUtf8 = "LP1002";

    /// <summary>The file is binary: it contains a NUL byte (reported at the first one).</summary>
    public const string BinaryFile = "LP1003";

    /// <summary>Parentheses (or prefix operators) nest deeper than the parser allows; the file is not parsed.</summary>
    public const string NestingTooDeep = "LP1004";

    /// <summary>A character that is not part of the language.</summary>
    public const string UnexpectedCharacter = "LP1005";

    /// <summary>A text in double quotes is not closed on its line.</summary>
    public const string UnterminatedString = "LP1006";

    /// <summary>A comment opened with <c>(*</c> is never closed with <c>*)</c>.</summary>
    public const string UnterminatedComment = "LP1007";

    /// <summary>The tokens do not form a valid scheme: the message names what was found and what was expected.</summary>
    public const string SyntaxError = "LP1008";

    /// <summary>A duration literal that is not a valid IEC 61131-3 duration or number with a known time unit.</summary>
    public const string InvalidDuration = "LP1009";

    /// <summary>The power frequency has a unit other than Hz.</summary>
    public const string FrequencyUnitNotHertz = "LP1010";

    /// <summary>A second <c>breaker_model</c> block; a scheme has at most one.</summary>
    public const string DuplicateBreakerModel = "LP1011";

    /// <summary>A power frequency or a scan interval of zero.</summary>
    public const string TimingNotPositive = "LP1012";

    /// <summary>A word after <c>init</c> that is not <c>retained</c>.</summary>
    public const string UnknownInitWord = "LP1013";

    /// <summary>A name declared twice (names are case-insensitive); the first declaration is a related location.</summary>
    public const string DuplicateName = "LP2001";

    /// <summary>A name that is not declared.</summary>
    public const string UndefinedName = "LP2002";

    /// <summary>An equation assigns an input or a setting; only locals and outputs can be assigned.</summary>
    public const string TargetNotAssignable = "LP2003";

    /// <summary>A name assigned by two equations; the other equation is a related location.</summary>
    public const string AssignedTwice = "LP2004";

    /// <summary>An expression of the wrong type (bool, real or time); the message gives expected and found types.</summary>
    public const string TypeMismatch = "LP2005";

    /// <summary>A call of a name that is not a known function block, function or past-time operator.</summary>
    public const string UnknownFunction = "LP2006";

    /// <summary>A call with too many or too few arguments, or a required argument left out.</summary>
    public const string WrongArgumentCount = "LP2007";

    /// <summary>A named argument the callee does not have, an argument given twice, or a name where none is allowed.</summary>
    public const string WrongArgumentName = "LP2008";

    /// <summary>A positional argument after a named one.</summary>
    public const string PositionalAfterNamed = "LP2009";

    /// <summary>A timer preset or a HELD/WITHIN window that is not a duration literal or a setting of type time.</summary>
    public const string DurationExpected = "LP2010";

    /// <summary>A past-time operator (PREV, ROSE, FELL, ONCE, HISTORICALLY, HELD, WITHIN, SINCE) in an equation.</summary>
    public const string TemporalInEquation = "LP2011";

    /// <summary><c>-&gt;</c> in an equation; implication is for require and assume formulas only.</summary>
    public const string ImpliesInEquation = "LP2012";

    /// <summary>A product or quotient without a constant side (the solver's arithmetic is linear).</summary>
    public const string NonLinearArithmetic = "LP2013";

    /// <summary>Division by a constant that is zero.</summary>
    public const string DivisionByZero = "LP2014";

    /// <summary>A setting whose value is not of its declared type.</summary>
    public const string SettingValueType = "LP2015";

    /// <summary>An <c>init</c> value that is not of the variable's type.</summary>
    public const string InitValueType = "LP2016";

    /// <summary>A <c>range</c> on an input that is not real.</summary>
    public const string RangeNotAllowed = "LP2017";

    /// <summary>A range whose low end is above its high end.</summary>
    public const string RangeEmpty = "LP2018";

    /// <summary>An input, local or output of type time; only settings may be durations.</summary>
    public const string TimeTypeNotAllowed = "LP2019";

    /// <summary>A declared name that is the name of a built-in function block, function or past-time operator.</summary>
    public const string ReservedName = "LP2020";

    /// <summary>Two requirements or two assumptions with the same name.</summary>
    public const string DuplicatePropertyName = "LP2021";

    /// <summary><c>init retained</c> on a variable that is not bool (only a bool memory may have an unknown power-up value).</summary>
    public const string RetainedNeedsBool = "LP2022";

}
