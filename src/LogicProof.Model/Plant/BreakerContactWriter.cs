namespace LogicProof.Model.Plant;

/// <summary>
/// Writes the equation of one auxiliary contact (52a or 52b) of the breaker model, adding the inputs and locals of
/// the contact options (travel_contacts_free, aux_contact_fault; see <see cref="BreakerProgramWriter"/>). Without
/// options the contact is exactly its healthy value.
/// </summary>
internal sealed class BreakerContactWriter(
    BreakerModelSettings settings,
    string prefix,
    List<BreakerProgramDeclaration> inputs,
    List<BreakerProgramDeclaration> locals,
    List<BreakerProgramStatement> equations)
{
    /// <param name="status">The scheme's status input the contact drives.</param>
    /// <param name="letter">A or B, the start of the generated names.</param>
    /// <param name="device">52a or 52b, for descriptions.</param>
    /// <param name="healthy">The contact's value on a healthy breaker at rest and in travel.</param>
    public void Drive(string status, string letter, string device, string healthy)
    {
        string N(string suffix) => prefix + letter + "_" + suffix;
        var block = settings.Span;
        var value = healthy;
        if (settings.TravelContactsFree)
        {
            inputs.Add(new(N("IN_TRAVEL"), $"breaker model: {device} during travel (the checker chooses at every scan of the travel)", block));
            value = $"({healthy}) OR (({prefix}CLOSING OR {prefix}OPENING) AND {N("IN_TRAVEL")})";
        }

        if (settings.AuxContactFault)
        {
            inputs.Add(new(N("FAILS"), $"breaker model: {device} fails at this scan (the checker chooses)", block));
            inputs.Add(new(N("STUCK_VALUE"), $"breaker model: the value a failed {device} stays at, chosen at the scan it fails", block));
            locals.Add(new(N("STUCK"), $"breaker model: the value of {device} once failed", block));
            locals.Add(new(N("FAILED"), $"breaker model: {device} has failed", block));
            // STUCK is written before FAILED, so it reads FAILED of the last scan: it follows the choice until the
            // scan of the failure and holds it from then on.
            equations.Add(new(N("STUCK"), $"({N("FAILED")} AND {N("STUCK")}) OR (NOT {N("FAILED")} AND {N("STUCK_VALUE")})", block));
            equations.Add(new(N("FAILED"), $"{N("FAILED")} OR {N("FAILS")}", block));
            value = $"({N("FAILED")} AND {N("STUCK")}) OR (NOT {N("FAILED")} AND ({value}))";
        }

        equations.Add(new(status, value, block));
    }
}
