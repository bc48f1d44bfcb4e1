using LogicProof.Model.SyncCheck;

namespace LogicProof.Model.Tests.SyncCheck;

/// <summary>
/// Example settings from the IEEE 1547 interconnection synchronisation limits for the smallest aggregate rating
/// class (0–500 kVA): 0.3 Hz frequency difference, 10 % voltage difference, 20° phase-angle difference.
/// These values are from memory of the IEEE 1547 table and have not been confirmed against the text.
/// </summary>
public sealed class InterconnectionLimitExampleTests
{
    private const double FrequencyDifferenceHz = 0.3;
    private const double VoltageDifferencePu = 0.10;
    private const double PhaseAngleDeg = 20;

    [Fact]
    public void Magnitude_When20DegAtOnePerUnit_IsAbout0Point347AndAboveTheVoltageLimit()
    {
        var dv = DifferenceVoltage.Magnitude(PhaseAngleDeg, 1.0, 1.0);

        Assert.Equal(0.347, dv, 3); // 2·sin(10°) = 0.3473
        // A 20° angle alone makes a phasor difference over three times the 10 % magnitude limit: the limit on
        // magnitudes and the limit on angle are separate checks, and neither can stand in for the other.
        Assert.True(dv > VoltageDifferencePu);
    }

    [Fact]
    public void MaximumQualifyingTimeSeconds_When20DegWindowAt0Point3HzSlip_Is0Point370()
    {
        var qualifying = SlipLimit.MaximumQualifyingTimeSeconds(PhaseAngleDeg, FrequencyDifferenceHz);

        Assert.Equal(0.370, qualifying, 3); // 2·20 / (360·0.3) = 0.37037 s
        Assert.True(SlipLimit.MaximumSlipHz(PhaseAngleDeg, qualifying) >= FrequencyDifferenceHz * (1 - 1e-12));
        Assert.True(SlipLimit.MaximumSlipHz(PhaseAngleDeg, 0.4) < FrequencyDifferenceHz); // a longer time blocks 0.3 Hz
    }
}
