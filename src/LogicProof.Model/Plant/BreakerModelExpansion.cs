using LogicProof.Language.Binding;

namespace LogicProof.Model.Plant;

/// <summary>
/// What the breaker model did to a scheme. <see cref="Scheme"/> is the scheme to build the model from: the one given
/// when there is no breaker_model block, the scheme with the breaker added when there is one, null after an error.
/// <see cref="StatusModelled"/> says whether 52a/52b are driven by the model (TRUE) or free inputs (FALSE): reports
/// print it, since without the model "no pumping" and "sealed in" are checked against a breaker that may do anything.
/// </summary>
public sealed record BreakerModelExpansion(BoundScheme? Scheme, bool StatusModelled, BreakerModelSettings? Settings, BreakerProgram? Program)
{
    public IReadOnlyList<string> ModelledStatuses => Program?.DrivenStatuses ?? [];

    /// <summary>One line for a report.</summary>
    public string Summary =>
        StatusModelled && Settings is { } s
            ? $"breaker status {string.Join(", ", ModelledStatuses)} driven by the breaker model (closing {Describe(s.ClosingTime)}, "
              + $"opening {Describe(s.OpeningTime)}, trip-free {(s.TripFree ? "yes" : "no")}, close into fault "
              + (s.CloseIntoFaultDelay is { } d ? $"within {Describe(d)}" : "no") + Options(s) + ")"
            : "breaker status inputs are free (no breaker_model block): the checker lets 52a/52b take any value at any scan";

    private static string Options(BreakerModelSettings s)
    {
        var options = new List<string>();
        if (s.FailsToClose)
        {
            options.Add("may fail to close");
        }

        if (s.FailsToTrip)
        {
            options.Add("may fail to trip");
        }

        if (s.SpringRechargeTime is { } spring)
        {
            options.Add($"spring recharge {Describe(spring)}");
        }

        if (s.TravelContactsFree)
        {
            options.Add("52a/52b free during travel");
        }

        if (s.AuxContactFault)
        {
            options.Add("52a/52b may fail stuck");
        }

        return options.Count == 0 ? string.Empty : ", " + string.Join(", ", options);
    }

    private static string Describe(BreakerTimeRange range) =>
        range.LowText == range.HighText ? range.LowText : $"{range.LowText} .. {range.HighText}";
}
