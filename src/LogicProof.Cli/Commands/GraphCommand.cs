using System.CommandLine;
using LogicProof.Cli.Output;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Core.Threading;
using LogicProof.Language;
using LogicProof.Model;
using LogicProof.Model.Graph;
using LogicProof.Reports.Graph;

namespace LogicProof.Cli.Commands;

/// <summary>
/// The <c>graph</c> command: the dependency graph of a scheme (who reads whom, this scan or last scan) as DOT or
/// JSON on the output stream, optionally only the cone of influence of one name. Exit 3 on an input error.
/// </summary>
public static class GraphCommand
{
    private const string DotFormat = "dot";
    private const string JsonFormat = "json";

    public static Command Create()
    {
        var file = new Argument<string>("FILE") { Description = "The scheme (.lpl)." };
        var format = new Option<string>("--format")
        {
            Description = $"Output format: {DotFormat} (default, for graph-drawing tools) or {JsonFormat}.",
            HelpName = "FORMAT",
            DefaultValueFactory = _ => DotFormat,
        };
        format.AcceptOnlyFromAmong(DotFormat, JsonFormat);
        var cone = new Option<string>("--cone")
        {
            Description = "Only what can affect this input, variable or function block (its cone of influence).",
            HelpName = "NAME",
        };
        var formulas = new Option<bool>("--formulas") { Description = "Also show the require and assume formulas and what they read." };

        var command = new Command("graph", "Print the dependency graph of a scheme: which names each equation reads, this scan or last scan.");
        command.Arguments.Add(file);
        command.Options.Add(format);
        command.Options.Add(cone);
        command.Options.Add(formulas);
        command.SetAction(parseResult =>
        {
            var path = parseResult.GetValue(file)!;
            var formatName = parseResult.GetValue(format) ?? DotFormat;
            var coneName = parseResult.GetValue(cone);
            var withFormulas = parseResult.GetValue(formulas);
            var output = parseResult.InvocationConfiguration.Output;
            var error = parseResult.InvocationConfiguration.Error;
            return LargeStack.Run(() => Execute(path, formatName, coneName, withFormulas, output, error));
        });
        return command;
    }

    private static int Execute(string path, string format, string? coneName, bool withFormulas, TextWriter output, TextWriter error)
    {
        var front = FrontEnd.Load(path);
        DiagnosticPrinter.Print(error, front.Diagnostics, front.Source);
        if (front.Scheme is not { } scheme)
        {
            return ExitCodes.InputError;
        }

        var graph = DependencyGraph.Build(scheme, withFormulas);
        if (coneName is not null)
        {
            if (graph.Find(coneName) is null)
            {
                var unknown = new Diagnostic(
                    ModelCodes.UnknownConeName,
                    Severity.Error,
                    $"--cone: '{coneName}' is not an input, variable or function block of scheme {scheme.Syntax.Name}",
                    SourceSpan.None with { File = front.Source.Path });
                DiagnosticPrinter.Print(error, [unknown], front.Source);
                return ExitCodes.InputError;
            }

            graph = graph.Cone(coneName);
        }

        if (format == JsonFormat)
        {
            JsonGraphRenderer.Render(graph, output);
        }
        else
        {
            DotGraphRenderer.Render(graph, output);
        }

        return ExitCodes.Success;
    }
}
