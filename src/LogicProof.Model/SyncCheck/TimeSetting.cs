namespace LogicProof.Model.SyncCheck;

/// <summary>
/// A time as a setting is written: a number and its unit, such as 500ms, 0.5s or 30cyc. Cycles stay cycles
/// until a power frequency is given, since their length depends on it.
/// </summary>
public readonly record struct TimeSetting(double Value, TimeUnit Unit)
{
    private const string Expected = "write a number and a unit, such as 500ms, 0.5s or 30cyc";

    public static TimeSetting Parse(string text, string what)
    {
        ArgumentNullException.ThrowIfNull(text);
        var trimmed = text.Trim();
        var split = trimmed.Length;
        while (split > 0 && char.IsLetter(trimmed[split - 1]))
        {
            split--;
        }

        var number = trimmed[..split].TrimEnd();
        var unitText = trimmed[split..];
        if (unitText.Length == 0)
        {
            throw new SyncCheckInputException($"{what} '{text}' has no unit: {Expected}.");
        }

        TimeUnit unit = unitText.ToLowerInvariant() switch
        {
            "ms" => TimeUnit.Milliseconds,
            "s" => TimeUnit.Seconds,
            "cyc" or "cycle" or "cycles" => TimeUnit.Cycles,
            _ => throw new SyncCheckInputException(
                $"{what} '{text}' has the unknown unit '{unitText}': {Expected}."),
        };

        var value = SyncCheckNumber.Parse(number, what);
        SyncCheckGuard.Positive(value, what, UnitSymbol(unit));
        return new TimeSetting(value, unit);
    }

    public double ToSeconds(double frequencyHz) => TimeConversion.ToSeconds(Value, Unit, frequencyHz);

    public override string ToString() => SyncCheckNumber.Format(Value, 15) + " " + UnitSymbol(Unit);

    public static string UnitSymbol(TimeUnit unit) => unit switch
    {
        TimeUnit.Milliseconds => "ms",
        TimeUnit.Seconds => "s",
        _ => "cyc",
    };
}
