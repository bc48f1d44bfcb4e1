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
        root.Subcommands.Add(SimulateCommand.Create());
        root.Subcommands.Add(GraphCommand.Create());
        root.Subcommands.Add(CheckCommand.Create());
        root.Subcommands.Add(RulesCommand.Create());
        return root;
    }

    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        try
        {
            var parse = BuildRootCommand().Parse(args);
            if (parse.Errors.Count > 0)
            {
                // A bad command line is an input error (exit 3), like a bad file; the parser's own default is 1,
                // which the exit-code table reserves for a violated rule.
                foreach (var parseError in parse.Errors)
                {
                    error.WriteLine($"error: {parseError.Message}");
                }

                error.WriteLine("Run 'logicproof --help' for the commands and their options.");
                return ExitCodes.InputError;
            }

            return parse.Invoke(new InvocationConfiguration { Output = output, Error = error });
        }
        catch (Exception ex)
        {
            error.WriteLine($"internal error: {ex.GetType().Name}: {ex.Message}");
            return ExitCodes.InternalError;
        }
    }
}
