using System.Diagnostics;
using System.Globalization;

namespace LogicProof.Bench;

/// <summary>Prints a benchmark's figures as a two-column table, with the process's peak memory at the end.</summary>
internal sealed record Measured(TimeSpan Wall, TimeSpan Processor)
{
    public static Measured operator +(Measured left, Measured right) => new(left.Wall + right.Wall, left.Processor + right.Processor);

    public static Measured operator -(Measured left, Measured right) => new(left.Wall - right.Wall, left.Processor - right.Processor);
}

internal sealed class BenchReport(string title)
{
    private readonly List<(string Name, string Value)> _lines = [];

    public void Add(string name, string value) => _lines.Add((name, value));

    public void AddMilliseconds(string name, TimeSpan elapsed) => Add(name, Format(elapsed.TotalMilliseconds, "N1") + " ms");

    /// <summary>A phase timed both ways: on a shared machine the wall clock also counts other people's work.</summary>
    public void AddTimed(string name, Measured measured) =>
        Add(name, (Format(measured.Wall.TotalMilliseconds, "N1") + " ms").PadLeft(12) + "   processor " + Format(measured.Processor.TotalMilliseconds, "N1") + " ms");

    /// <summary>Processor time of the whole process (all threads, the garbage collector's too).</summary>
    public static TimeSpan ProcessorTime()
    {
        using var process = Process.GetCurrentProcess();
        return process.TotalProcessorTime;
    }

    /// <summary>Runs <paramref name="action"/> and returns its result with its wall-clock and processor time.</summary>
    public static (T Result, Measured Time) Measure<T>(Func<T> action)
    {
        var processor = ProcessorTime();
        var clock = Stopwatch.StartNew();
        var result = action();
        var wall = clock.Elapsed;
        return (result, new Measured(wall, ProcessorTime() - processor));
    }

    public void Print(TextWriter writer)
    {
        using var process = Process.GetCurrentProcess();
        process.Refresh();
        Add("peak working set", Format(process.PeakWorkingSet64 / (1024.0 * 1024.0), "N1") + " MB");
        Add("allocated (managed, total)", Format(GC.GetTotalAllocatedBytes(precise: true) / (1024.0 * 1024.0), "N1") + " MB");
        var width = _lines.Max(line => line.Name.Length) + 2;
        writer.WriteLine(title);
        writer.WriteLine(new string('-', Math.Max(title.Length, width + 20)));
        foreach (var (name, value) in _lines)
        {
            writer.WriteLine(name.PadRight(width) + value);
        }
    }

    public static string Format(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
