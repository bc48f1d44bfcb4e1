using System.CommandLine;
using LogicProof.Cli.Commands;

namespace LogicProof.Cli;

/// <summary>Builds the command tree; tests call <see cref="BuildRootCommand"/> and <see cref="Run"/> without a process.</summary>
public static class CliApplication
{
    public static RootCommand BuildRootCommand()
    {
        var root = new RootCommand(
            "LogicProof: proves close-supervision rules of relay logic for every input sequence, or shows the shortest timed sequence that breaks one.");
        root.Subcommands.Add(SyncCalcCommand.Create());
        return root;
    }

    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        try
        {
            var parse = BuildRootCommand().Parse(args);
            return parse.Invoke(new InvocationConfiguration { Output = output, Error = error });
        }
        catch (Exception ex)
        {
            error.WriteLine($"internal error: {ex.GetType().Name}: {ex.Message}");
            return ExitCodes.InternalError;
        }
    }
}
