namespace LogicProof.Reports.Check;

/// <summary>
/// Counts over every file of a run, and the exit code the run ends with (see <see cref="CheckExitCode"/>).
/// <see cref="NotApplicable"/> counts rules that were not checked; <see cref="Errors"/>, <see cref="Warnings"/> and
/// <see cref="Notes"/> count the static diagnostics.
/// </summary>
public sealed record CheckRunSummary(
    int Files,
    int Proved,
    int Violated,
    int Inconclusive,
    int NotApplicable,
    int Errors,
    int Warnings,
    int Notes,
    int ExitCode);
