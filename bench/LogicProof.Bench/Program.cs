using System.Globalization;
using LogicProof.Bench;

// Usage: front-end [--equations N] [--seed N]   |   simulate [--equations N] [--seconds N] [--seed N]   |   bays [N ...]
// Run in Release: dotnet run -c Release --project bench/LogicProof.Bench -- simulate
const int DefaultSeed = 61131;
if (args.Length > 0 && args[0] == "bays")
{
    // bays [N ...]: decide every requirement of N generated breaker bays (default 1, 10 and 40).
    var counts = args.Skip(1).Select(a => int.Parse(a, CultureInfo.InvariantCulture)).DefaultIfEmpty().ToList();
    return BayBenchmark.Run(counts.Count == 1 && counts[0] == 0 ? [1, 10, 40] : counts, Console.Out);
}

if (args.Length == 0 || args[0] is not ("front-end" or "simulate"))
{
    Console.Error.WriteLine("usage: front-end [--equations N] [--seed N] | simulate [--equations N] [--seconds N] [--seed N] | bays [N ...]");
    return 2;
}

var options = new Dictionary<string, long>(StringComparer.Ordinal);
for (var i = 1; i < args.Length; i++)
{
    if (i + 1 >= args.Length || !long.TryParse(args[i + 1], NumberStyles.None, CultureInfo.InvariantCulture, out var value)
        || args[i] is not ("--equations" or "--seconds" or "--seed"))
    {
        Console.Error.WriteLine($"bad argument '{args[i]}': expected --equations N, --seconds N or --seed N");
        return 2;
    }

    options[args[i]] = value;
    i++;
}

var seed = (int)options.GetValueOrDefault("--seed", DefaultSeed);
return args[0] == "front-end"
    ? FrontEndBenchmark.Run((int)options.GetValueOrDefault("--equations", 100_000), seed, Console.Out)
    : SimulateBenchmark.Run((int)options.GetValueOrDefault("--equations", 500), options.GetValueOrDefault("--seconds", 3600), seed, Console.Out);
