namespace LogicProof.Reports.Check;

/// <summary>
/// The exit code a check run ends with. The numbers are the product's exit-code table (the command-line layer owns
/// the same table; Reports cannot reference it). When several apply, the first in this order wins: an internal
/// failure, an input error (some file could not be fully checked), a violation, an inconclusive verdict.
/// </summary>
public static class CheckExitCode
{
    public const int Success = 0;

    public const int Violated = 1;

    public const int Inconclusive = 2;

    public const int InputError = 3;

    public const int InternalError = 4;

    public static int Of(bool internalFailure, int errors, int violated, int inconclusive) =>
        internalFailure ? InternalError
        : errors > 0 ? InputError
        : violated > 0 ? Violated
        : inconclusive > 0 ? Inconclusive
        : Success;
}
