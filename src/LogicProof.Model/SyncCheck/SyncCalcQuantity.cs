namespace LogicProof.Model.SyncCheck;

/// <summary>One named value of a calculation; <see cref="Given"/> is the value as entered when it was converted.</summary>
public sealed record SyncCalcQuantity(string Symbol, double Value, string Unit, string? Given = null)
{
    public string ToText(int significantDigits = SyncCheckNumber.DefaultSignificantDigits)
    {
        var text = $"{Symbol} = {SyncCheckNumber.Format(Value, significantDigits)}";
        if (Unit.Length > 0)
        {
            text += " " + Unit;
        }

        return Given is null ? text : $"{text} (given as {Given})";
    }
}
