using LogicProof.Model.Scan;
using LogicProof.Model.Simulation;
using static LogicProof.Model.Tests.Lowering.LoweringFixture;

namespace LogicProof.Model.Tests.Timing;

public sealed class PresetTimingTests
{
    private static string OnDelayWaveform(string scan, string preset, int scans)
    {
        var model = BuildModel($"""
            scheme T;
            frequency 60 Hz;
            scan {scan};
            inputs IN : bool; end
            outputs Q : bool; end
            logic Q := TON(IN, {preset}); end
            """);
        var simulator = ScanSimulator.Compile(model);
        var state = simulator.PowerUpState(new Dictionary<int, bool>());
        var inputs = simulator.CreateInputs();
        var values = simulator.CreateValues();
        var q = new char[scans];
        for (var i = 0; i < scans; i++)
        {
            inputs.SetBool(model.CellNamed("IN").Index, true);
            simulator.Step(state, inputs, values);
            q[i] = values.GetBool(model.CellNamed("Q").Index) ? '1' : '0';
        }

        return new string(q);
    }

    [Fact]
    public void Ton_When25msAtAQuarterCycleScan_QRisesOnTheSeventhConsecutiveScan()
    {
        // 25 ms is exactly 6 quarter cycles of 1/240 s; ET reaches PT after 6 scan intervals, so Q is TRUE from the
        // 7th scan with IN TRUE (IEC 61131-3 ed.2 §2.5.2.3.3, TON timing: Q when ET = PT).
        Assert.Equal("000000111", OnDelayWaveform("0.25 cyc", "T#25ms", 9));
    }

    [Fact]
    public void Ton_When25msAtA2msScan_RoundsUpTo13ScansAndQRisesOnThe14th()
    {
        Assert.Equal("0000000000000111", OnDelayWaveform("2 ms", "T#25ms", 16));
    }

    [Fact]
    public void Ton_WhenPresetInCycles_CountsCyclesAtThePowerFrequency()
    {
        // 2 cycles at 60 Hz = 8 quarter-cycle scans.
        Assert.Equal("00000000111", OnDelayWaveform("0.25 cyc", "2 cyc", 11));
    }
}
