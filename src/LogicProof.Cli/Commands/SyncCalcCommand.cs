using System.CommandLine;
using LogicProof.Model.SyncCheck;

namespace LogicProof.Cli.Commands;

/// <summary>
/// The <c>sync-calc</c> command: settings arithmetic for a synchronism check (device 25): the slip limit of an
/// angle window and qualifying time, the advance angle of a breaker, and the difference voltage of an angle.
/// </summary>
public static class SyncCalcCommand
{
    public const int ExitSuccess = 0;
    public const int ExitBadInput = 3;

    private const string TextFormat = "text";
    private const string JsonFormat = "json";

    public static Command Create()
    {
        var command = new Command(
            "sync-calc",
            "Synchronism-check (device 25) settings: slip limit, breaker advance angle, difference voltage.");
        command.Subcommands.Add(CreateSlip());
        command.Subcommands.Add(CreateAdvance());
        command.Subcommands.Add(CreateVoltage());
        return command;
    }

    private static Command CreateSlip()
    {
        var command = new Command(
            "slip",
            "Largest slip frequency that an angle window ±theta passes in a qualifying time T: 2*theta / (360*T).");
        var window = ValueOption("--window-deg", "Half-width theta of the angle window ±theta, in degrees (0 < theta <= 180). Required.");
        var qualify = ValueOption("--qualify", "Qualifying time with its unit: 500ms, 0.5s or 30cyc. Required.");
        var frequency = FrequencyOption();
        command.Options.Add(window);
        command.Options.Add(qualify);
        command.Options.Add(frequency);
        SetRun(command, parseResult => SyncCalculator.MaximumSlip(
            Number(parseResult, window, "the angle window"),
            TimeSetting.Parse(Required(parseResult, qualify), "the qualifying time"),
            Number(parseResult, frequency, "the power frequency")));
        return command;
    }

    private static Command CreateAdvance()
    {
        var command = new Command(
            "advance",
            "Angle the phase difference moves while the breaker closes: 360*s*t degrees.");
        var slip = ValueOption("--slip-hz", "Slip frequency s in Hz (its magnitude). Required.");
        var closing = ValueOption("--closing-time", "Breaker closing time t with its unit: 80ms, 0.08s or 5cyc. Required.");
        var frequency = FrequencyOption();
        command.Options.Add(slip);
        command.Options.Add(closing);
        command.Options.Add(frequency);
        SetRun(command, parseResult => SyncCalculator.AdvanceAngle(
            Number(parseResult, slip, "the slip frequency"),
            TimeSetting.Parse(Required(parseResult, closing), "the closing time"),
            Number(parseResult, frequency, "the power frequency")));
        return command;
    }

    private static Command CreateVoltage()
    {
        var command = new Command(
            "voltage",
            "Difference voltage |dV| of V1 and V2 at a phase angle (--angle-deg), or the angle of a given |dV| (--dv).");
        var angle = ValueOption("--angle-deg", "Phase angle d between V1 and V2, in degrees (0 to 180); gives |dV|.");
        var dv = ValueOption("--dv", "Difference-voltage magnitude |dV|, in the unit of V1 and V2; gives the angle.");
        var v1 = ValueOption("--v1", "Voltage V1, in per unit or any unit shared with V2.", "1.0");
        var v2 = ValueOption("--v2", "Voltage V2, in the unit of V1.", "1.0");
        var unit = ValueOption("--voltage-unit", "Name of the voltage unit, for the printout only.", "pu");
        command.Options.Add(angle);
        command.Options.Add(dv);
        command.Options.Add(v1);
        command.Options.Add(v2);
        command.Options.Add(unit);
        SetRun(command, parseResult =>
        {
            var angleText = Value(parseResult, angle);
            var dvText = Value(parseResult, dv);
            if ((angleText is null) == (dvText is null))
            {
                throw new SyncCheckInputException("give exactly one of --angle-deg (to get |dV|) or --dv (to get the angle).");
            }

            var first = Number(parseResult, v1, "the voltage V1");
            var second = Number(parseResult, v2, "the voltage V2");
            var unitName = Required(parseResult, unit);
            return angleText is not null
                ? SyncCalculator.DifferenceVoltageFromAngle(SyncCheckNumber.Parse(angleText, "the phase angle"), first, second, unitName)
                : SyncCalculator.AngleFromDifferenceVoltage(SyncCheckNumber.Parse(dvText!, "the difference voltage"), first, second, unitName);
        });
        return command;
    }

    private static Option<string> FrequencyOption() =>
        ValueOption("--frequency", "Power frequency in Hz, for times given in cycles.", "60");

    // Values are read as text and parsed here: System.CommandLine parses an Option<double> with the current
    // culture (under de-DE "0.5" reads as 5), and a value it rejects would end with its own exit code and help
    // text. An arity of zero or one likewise lets a missing value reach the action, which reports it (exit 3).
    private static Option<string> ValueOption(string name, string description, string? defaultValue = null)
    {
        var option = new Option<string>(name) { Description = description, Arity = ArgumentArity.ZeroOrOne };
        if (defaultValue is not null)
        {
            option.DefaultValueFactory = _ => defaultValue;
        }

        return option;
    }

    private static string? Value(ParseResult parseResult, Option<string> option)
    {
        if (parseResult.GetResult(option) is { Implicit: false, Tokens.Count: 0 })
        {
            throw new SyncCheckInputException($"{option.Name} needs a value.");
        }

        return parseResult.GetValue(option);
    }

    private static string Required(ParseResult parseResult, Option<string> option) =>
        Value(parseResult, option) ?? throw new SyncCheckInputException($"{option.Name} is required.");

    private static double Number(ParseResult parseResult, Option<string> option, string what) =>
        SyncCheckNumber.Parse(Required(parseResult, option), what);

    private static void SetRun(Command command, Func<ParseResult, SyncCalcResult> calculate)
    {
        var format = ValueOption("--format", $"Output format: {TextFormat} or {JsonFormat}.", TextFormat);
        command.Options.Add(format);

        command.SetAction(parseResult =>
        {
            var output = parseResult.InvocationConfiguration.Output;
            var error = parseResult.InvocationConfiguration.Error;
            try
            {
                var formatName = Required(parseResult, format).Trim().ToLowerInvariant();
                if (formatName is not (TextFormat or JsonFormat))
                {
                    throw new SyncCheckInputException(
                        $"unknown --format '{formatName}': use {TextFormat} or {JsonFormat}.");
                }

                var result = calculate(parseResult);
                if (formatName == JsonFormat)
                {
                    output.WriteLine(result.ToJson());
                }
                else
                {
                    foreach (var line in result.ToTextLines())
                    {
                        output.WriteLine(line);
                    }
                }

                return ExitSuccess;
            }
            catch (SyncCheckInputException exception)
            {
                error.WriteLine($"sync-calc {command.Name}: {exception.Message}");
                return ExitBadInput;
            }
        });
    }
}
