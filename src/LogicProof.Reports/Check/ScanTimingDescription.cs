using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;

namespace LogicProof.Reports.Check;

/// <summary>The scan timing for people: "scan 2 ms, 60 Hz", with the exact value when the display rounds it.</summary>
public static class ScanTimingDescription
{
    public static string Describe(ScanTiming timing)
    {
        ArgumentNullException.ThrowIfNull(timing);
        var scan = ExactNumberText.FormatForDisplay(timing.ScanMilliseconds);
        var exact = ExactNumberText.IsTerminating(timing.ScanMilliseconds)
            ? string.Empty
            : " (exactly " + ExactNumberText.FormatExact(timing.ScanMilliseconds) + " ms)";
        return $"scan {scan} ms{exact}, {ExactNumberText.FormatForDisplay(timing.FrequencyHz)} Hz";
    }
}
