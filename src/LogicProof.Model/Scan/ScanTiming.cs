using Fractions;

namespace LogicProof.Model.Scan;

/// <summary>The power frequency and the processing interval, exact.</summary>
public sealed record ScanTiming(Fraction FrequencyHz, Fraction ScanMilliseconds)
{
    /// <summary>The time at the start of a scan, in milliseconds from power-up (scan 0 starts at 0 ms).</summary>
    public Fraction TimeOfScan(long scan) => ScanMilliseconds * scan;
}
