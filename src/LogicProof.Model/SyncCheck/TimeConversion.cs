namespace LogicProof.Model.SyncCheck;

/// <summary>Cycles of a power frequency f to and from milliseconds: one cycle lasts 1000 / f ms.</summary>
public static class TimeConversion
{
    public static double CyclesToMilliseconds(double cycles, double frequencyHz)
    {
        SyncCheckGuard.PowerFrequency(frequencyHz);
        return cycles * 1000 / frequencyHz;
    }

    public static double MillisecondsToCycles(double milliseconds, double frequencyHz)
    {
        SyncCheckGuard.PowerFrequency(frequencyHz);
        return milliseconds * frequencyHz / 1000;
    }

    public static double ToSeconds(double value, TimeUnit unit, double frequencyHz) => unit switch
    {
        TimeUnit.Milliseconds => value / 1000,
        TimeUnit.Seconds => value,
        TimeUnit.Cycles => CyclesToMilliseconds(value, frequencyHz) / 1000,
        _ => throw new SyncCheckInputException($"unknown time unit {unit}."),
    };
}
