using Fractions;
using LogicProof.Core.Diagnostics;
using LogicProof.Core.Text;
using LogicProof.Language.Binding;
using LogicProof.Language.Syntax;
using LogicProof.Model.Rules;
using LogicProof.Model.Timing;

namespace LogicProof.Model.Plant;

/// <summary>
/// Reads and checks the keys of a <c>breaker_model</c> block: <c>closing_time</c> and <c>opening_time</c> (required,
/// a range <c>D .. D</c>, one duration, or a time setting), <c>trip_free</c> and <c>close_into_fault</c> (TRUE or
/// FALSE, FALSE when left out) and <c>close_into_fault_delay</c> (needed when close_into_fault is TRUE). Keys are
/// compared ignoring case. The failure options <c>fails_to_close</c>, <c>fails_to_trip</c>, <c>travel_contacts_free</c>
/// and <c>aux_contact_fault</c> (TRUE or FALSE) and <c>spring_recharge_time</c> (a range) are off when left out.
/// Returns null after reporting an error.
/// </summary>
public static class BreakerModelSettingsReader
{
    public const string ClosingTimeKey = "closing_time";
    public const string OpeningTimeKey = "opening_time";
    public const string TripFreeKey = "trip_free";
    public const string CloseIntoFaultKey = "close_into_fault";
    public const string CloseIntoFaultDelayKey = "close_into_fault_delay";
    public const string FailsToCloseKey = "fails_to_close";
    public const string FailsToTripKey = "fails_to_trip";
    public const string SpringRechargeTimeKey = "spring_recharge_time";
    public const string TravelContactsFreeKey = "travel_contacts_free";
    public const string AuxContactFaultKey = "aux_contact_fault";

    private static readonly string[] Keys =
    [
        ClosingTimeKey, OpeningTimeKey, TripFreeKey, CloseIntoFaultKey, CloseIntoFaultDelayKey,
        FailsToCloseKey, FailsToTripKey, SpringRechargeTimeKey, TravelContactsFreeKey, AuxContactFaultKey,
    ];

    public static BreakerModelSettings? Read(BoundScheme scheme, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(scheme);
        ArgumentNullException.ThrowIfNull(diagnostics);
        if (scheme.Syntax.BreakerModel is not { } block)
        {
            return null;
        }

        var errorsBefore = diagnostics.Count(d => d.IsError);
        var byKey = new Dictionary<string, PlantSettingSyntax>(StringComparer.OrdinalIgnoreCase);
        foreach (var setting in block.Settings)
        {
            if (!Keys.Contains(setting.Key, StringComparer.OrdinalIgnoreCase))
            {
                diagnostics.Error(
                    RuleCodes.UnknownBreakerModelKey,
                    $"'{setting.Key}' is not a key of breaker_model; the keys are {string.Join(", ", Keys)}",
                    setting.KeySpan);
            }
            else if (!byKey.TryAdd(setting.Key, setting))
            {
                diagnostics.Add(new Diagnostic(RuleCodes.BreakerModelKeyTwice, Severity.Error, $"{setting.Key.ToLowerInvariant()} is given twice", setting.KeySpan)
                {
                    Related = [new RelatedLocation("the first one", byKey[setting.Key].KeySpan)],
                });
            }
        }

        var closing = Range(scheme, byKey, ClosingTimeKey, block.Span, diagnostics);
        var opening = Range(scheme, byKey, OpeningTimeKey, block.Span, diagnostics);
        var tripFree = Flag(byKey, TripFreeKey, diagnostics);
        var closeIntoFault = Flag(byKey, CloseIntoFaultKey, diagnostics);
        BreakerTimeRange? delay = null;
        if (closeIntoFault)
        {
            delay = Range(scheme, byKey, CloseIntoFaultDelayKey, byKey[CloseIntoFaultKey].Span, diagnostics);
        }
        else if (byKey.TryGetValue(CloseIntoFaultDelayKey, out var ignored))
        {
            diagnostics.Warning(RuleCodes.CloseIntoFaultDelayIgnored, "close_into_fault_delay is ignored: close_into_fault is not TRUE", ignored.KeySpan);
        }

        var spring = byKey.ContainsKey(SpringRechargeTimeKey) ? Range(scheme, byKey, SpringRechargeTimeKey, block.Span, diagnostics) : null;
        var failsToClose = Flag(byKey, FailsToCloseKey, diagnostics);
        var failsToTrip = Flag(byKey, FailsToTripKey, diagnostics);
        var travelContactsFree = Flag(byKey, TravelContactsFreeKey, diagnostics);
        var auxContactFault = Flag(byKey, AuxContactFaultKey, diagnostics);
        if (diagnostics.Count(d => d.IsError) > errorsBefore || closing is null || opening is null)
        {
            return null;
        }

        return new BreakerModelSettings(closing, opening, tripFree, closeIntoFault, delay, block.Span)
        {
            FailsToClose = failsToClose,
            FailsToTrip = failsToTrip,
            SpringRechargeTime = spring,
            TravelContactsFree = travelContactsFree,
            AuxContactFault = auxContactFault,
        };
    }

    private static BreakerTimeRange? Range(
        BoundScheme scheme, Dictionary<string, PlantSettingSyntax> byKey, string key, SourceSpan missingAt, DiagnosticBag diagnostics)
    {
        if (!byKey.TryGetValue(key, out var setting))
        {
            var why = key == CloseIntoFaultDelayKey ? "close_into_fault = TRUE needs" : "the breaker model needs";
            diagnostics.Error(RuleCodes.BreakerModelKeyMissing, $"{why} {key} = D .. D (the shortest and longest time)", missingAt);
            return null;
        }

        BreakerTimeRange? range = setting.Value switch
        {
            DurationRangePlantValueSyntax r => new(r.Low, r.Low.Text, r.High, r.High.Text, setting.Span),
            DurationPlantValueSyntax d => new(d.Duration, d.Duration.Text, d.Duration, d.Duration.Text, setting.Span),
            NamePlantValueSyntax name when scheme.Symbols.TryGetValue(name.Name, out var symbol)
                                           && symbol is { Kind: SymbolKind.Setting, SettingValue: BoundDurationConstant value }
                => new(value.Duration, symbol.Name, value.Duration, symbol.Name, setting.Span),
            _ => null,
        };
        if (range is null)
        {
            diagnostics.Error(
                RuleCodes.BreakerModelValueKind,
                $"{key} needs a time range such as 3 cyc .. 8 cyc, one duration, or a setting of type time",
                setting.Value.Span);
            return null;
        }

        var low = Milliseconds(range.Low, scheme);
        var high = Milliseconds(range.High, scheme);
        if (low > high || high <= Fraction.Zero)
        {
            diagnostics.Error(
                RuleCodes.BreakerModelRangeInvalid,
                low > high ? $"the range of {key} is empty: its low end is above its high end" : $"the longest {key} must be above zero",
                setting.Value.Span);
            return null;
        }

        return range;
    }

    private static bool Flag(Dictionary<string, PlantSettingSyntax> byKey, string key, DiagnosticBag diagnostics)
    {
        if (!byKey.TryGetValue(key, out var setting))
        {
            return false;
        }

        if (setting.Value is BoolPlantValueSyntax flag)
        {
            return flag.Value;
        }

        diagnostics.Error(RuleCodes.BreakerModelValueKind, $"{key} is TRUE or FALSE", setting.Value.Span);
        return false;
    }

    private static Fraction Milliseconds(DurationSyntax duration, BoundScheme scheme) =>
        DurationConverter.ToMilliseconds(duration, scheme.Syntax.FrequencyHz);
}
