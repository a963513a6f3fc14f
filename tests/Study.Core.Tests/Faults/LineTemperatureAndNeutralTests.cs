// Minimum levels with lines at the end-of-fault temperature, and the neutral impedance of a bank of parallel units.
using System.Numerics;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class LineTemperatureAndNeutralTests
{
    /// <summary>A grid, a 33/11 kV bank and a 5 km cable of 0.1 + j0.12 ohm/km (zero sequence 0.4 + j0.3) to END.</summary>
    private static Network Feeder(ConductorMaterial? conductor) => new()
    {
        Name = "feeder",
        Buses = [new Bus { Id = "B33", Kv = 33 }, new Bus { Id = "B11", Kv = 11 }, new Bus { Id = "END", Kv = 11 }],
        Supplies = [Grid("B33", 1000, 10)],
        Transformers = [Bank("T1", "B33", "B11", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid)],
        Lines =
        [
            new Line
            {
                Id = "C1", From = "B11", To = "END", Km = 5, Conductor = conductor,
                Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.12 },
                Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.4, X = 0.3 },
            },
        ],
    };

    private static FaultRequest Min(double c) => new() { Kinds = [FaultKind.LineToEarth], Level = FaultLevel.Min, LineTemperatureC = c };

    // IEC 60909-0 (from memory): R_L = [1 + α·(θ_e − 20 °C)]·R_L20 for minimum currents; α = 0.004 /K when the
    // conductor is not stated (the standard's value for copper, aluminium and aluminium alloy), 0.00393 /K for
    // copper and 0.00403 /K for aluminium (the usual coefficients, from memory). The cable's 0.5 ohm at 20 °C
    // adds 0.5·α·60 ohm at 80 °C, in the positive and (2.0 ohm) the zero sequence; reactances do not change.
    [Theory]
    [InlineData(null, 0.004)]
    [InlineData(ConductorMaterial.Copper, 0.00393)]
    [InlineData(ConductorMaterial.Aluminium, 0.00403)]
    public void Minimum_levels_take_line_resistance_at_the_end_of_fault_temperature(ConductorMaterial? conductor, double alpha)
    {
        var cold = Run(Feeder(conductor), Min(20)).At("END", FaultKind.LineToEarth);
        var hot = Run(Feeder(conductor), Min(80)).At("END", FaultKind.LineToEarth);
        Assert.Equal(0.5 * alpha * 60, hot.Z1Ohm!.Value.Real - cold.Z1Ohm!.Value.Real, 9);
        Assert.Equal(2.0 * alpha * 60, hot.Z0Ohm!.Value.Real - cold.Z0Ohm!.Value.Real, 9);
        Assert.Equal(cold.Z1Ohm!.Value.Imaginary, hot.Z1Ohm!.Value.Imaginary, 12);
        Assert.True(hot.IkKa < cold.IkKa);
        // Maximum levels take the data as given, whatever the temperature option says.
        var max = Run(Feeder(conductor), Min(80) with { Level = FaultLevel.Max }).At("END", FaultKind.LineToEarth);
        var maxCold = Run(Feeder(conductor), Min(20) with { Level = FaultLevel.Max }).At("END", FaultKind.LineToEarth);
        Assert.Equal(maxCold.Z1Ohm, max.Z1Ohm);
        // The default end-of-fault temperature is 80 °C, and the study says what it took.
        var byDefault = Run(Feeder(conductor), new FaultRequest { Kinds = [FaultKind.LineToEarth], Level = FaultLevel.Min });
        Assert.Equal(hot.Z1Ohm, byDefault.At("END", FaultKind.LineToEarth).Z1Ohm);
        Assert.Equal(80, byDefault.LineTemperatureC);
        Assert.Contains(byDefault.Notes, n => n.Contains("line resistance at 80 °C", StringComparison.Ordinal));
    }

    // A bank of n identical units has n neutral impedances in parallel (one per unit): its zero-sequence impedance
    // seen from the earthed side is K_T·Z0_T/n + 3·Z_N/n. Infinite source, YNd11 bank of 2 × 10 MVA, 10 %, X/R 20,
    // with 20 ohm in each hv neutral: at the 132 kV bus (the grid's own zero sequence is there too) the bank adds
    // 1/(K_T·Z0_T/2 + 3·20/2) in parallel; worked here from the single-unit values.
    [Fact]
    public void A_bank_of_parallel_units_has_their_neutral_impedances_in_parallel()
    {
        var neutral = new Earthing { Grounded = true, ROhm = 20 };
        Network Network(int units, double mva) =>
            OneBank(Bank("T1", "HV", "LV", mva, 132, 33, 10, 20, "YNd11", hvNeutral: neutral) with { Units = units }, 132, 33, scMva: 3000);
        var request = new FaultRequest { Kinds = [FaultKind.LineToEarth] };
        Complex two = Run(Network(2, 10), request).At("HV", FaultKind.LineToEarth).Z0Ohm!.Value;
        Complex one = Run(Network(1, 10), request).At("HV", FaultKind.LineToEarth).Z0Ohm!.Value;
        // Z0 at HV = Z0_grid ∥ (Z0_bank + 3·Z_N_bank): take the grid's part out of the single-unit result.
        Complex zGrid = 1.1 * 132 * 132 / 3000 * Complex.FromPolarCoordinates(1, Math.Atan(12)) * 1.0;
        Complex branchOne = 1 / (1 / one - 1 / zGrid);
        Complex zUnit = branchOne - 3 * 20;
        Complex expected = 1 / (1 / zGrid + 1 / (zUnit / 2 + 3 * 20 / 2.0));
        Assert.Equal(expected.Real, two.Real, 9);
        Assert.Equal(expected.Imaginary, two.Imaginary, 9);
    }
}
