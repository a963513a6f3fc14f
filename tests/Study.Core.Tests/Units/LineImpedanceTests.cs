// Line conversion from per-km, ohm and per-unit data (DEVELOPERS.md, Per-unit rules; common practice).
using System.Numerics;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class LineImpedanceTests
{
    private static readonly Bus Bus33 = new() { Id = "B1", Kv = 33 };

    // Common practice (Z_pu = Z_ohm / Z_base, B_pu = B_S · Z_base): 5.2 km of 0.12 + j0.38 ohm/km, 3 µS/km
    // at 33 kV on 100 MVA. Z_base = 33² / 100 = 10.89 ohm; R = 0.624 ohm, X = 1.976 ohm, B = 15.6 µS;
    // r = 0.624 / 10.89 = 0.0573003, x = 1.976 / 10.89 = 0.181451, b = 15.6e-6 · 10.89 = 1.69884e-4.
    [Fact]
    public void A_5_2_km_33_kV_line_divides_its_ohms_by_a_10_89_ohm_base()
    {
        var line = new Line { Id = "F1", From = "B1", To = "B2", Km = 5.2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38, B = 3.0 } };
        var c = LineImpedance.Convert(line, Bus33, 100);
        Assert.Equal(0.624 / 10.89, c.ZPu.Real, 12);
        Assert.Equal(1.976 / 10.89, c.ZPu.Imaginary, 12);
        Assert.Equal(15.6e-6 * 10.89, c.BPu, 12);
        Assert.Contains(c.Steps, s => s.Label == "Z_base" && Math.Abs(s.Value - 10.89) < 1e-12);
        Assert.Null(c.Z0Pu);
        Assert.Null(c.B0Pu);
    }

    [Fact]
    public void Zero_sequence_per_km_data_converts_like_the_positive_sequence()
    {
        var line = new Line
        {
            Id = "F1", From = "B1", To = "B2", Km = 5.2,
            Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38 },
            Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.30, X = 1.20, B = 1.8 },
        };
        var c = LineImpedance.Convert(line, Bus33, 100);
        Assert.Equal(0.30 * 5.2 / 10.89, c.Z0Pu!.Value.Real, 12);
        Assert.Equal(1.20 * 5.2 / 10.89, c.Z0Pu!.Value.Imaginary, 12);
        Assert.Equal(1.8e-6 * 5.2 * 10.89, c.B0Pu!.Value, 12);
        Assert.Equal(0.0, c.BPu);
    }

    [Fact]
    public void Ohm_totals_and_per_km_data_give_the_same_per_unit_values()
    {
        var perKm = new Line { Id = "A", From = "B1", To = "B2", Km = 5.2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38, B = 3.0 } };
        var totals = new Line { Id = "B", From = "B1", To = "B2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.624, X = 1.976, B = 15.6 } };
        var a = LineImpedance.Convert(perKm, Bus33, 100);
        var b = LineImpedance.Convert(totals, Bus33, 100);
        Assert.Equal(a.ZPu.Real, b.ZPu.Real, 12);
        Assert.Equal(a.ZPu.Imaginary, b.ZPu.Imaginary, 12);
        Assert.Equal(a.BPu, b.BPu, 12);
    }

    [Fact]
    public void Per_unit_data_passes_through_even_on_a_bus_without_kV()
    {
        var line = new Line { Id = "1-2", From = "1", To = "2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0.01938, X = 0.05917, B = 0.0528 } };
        var c = LineImpedance.Convert(line, new Bus { Id = "1", Kv = 0 }, 100);
        Assert.Equal(new Complex(0.01938, 0.05917), c.ZPu);
        Assert.Equal(0.0528, c.BPu);
    }

    [Fact]
    public void Ohm_data_on_a_bus_without_kV_is_an_input_error_naming_the_line()
    {
        var line = new Line { Id = "F9", From = "1", To = "2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 1, X = 2 } };
        var e = Assert.Throws<InputException>(() => LineImpedance.Convert(line, new Bus { Id = "1", Kv = 0 }, 100));
        Assert.Equal("F9", e.ElementId);
        Assert.Contains("bus 1 has no base kV: give the line per unit", e.Message);
    }

    [Fact]
    public void No_positive_sequence_or_per_km_data_without_a_length_are_input_errors()
    {
        var noLength = new Line { Id = "F2", From = "B1", To = "B2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.2 } };
        var none = new Line { Id = "F3", From = "B1", To = "B2", Km = 3 };
        Assert.Equal("F2", Assert.Throws<InputException>(() => LineImpedance.Convert(noLength, Bus33, 100)).ElementId);
        Assert.Equal("F3", Assert.Throws<InputException>(() => LineImpedance.Convert(none, Bus33, 100)).ElementId);
    }

    [Fact]
    public void Each_sequence_converts_on_its_own_basis()
    {
        // z1 per km and z0 for the whole line: 0.30 Ω/km · 5.2 km = 1.56 Ω total is the same zero sequence.
        var mixed = new Line
        {
            Id = "F5", From = "B1", To = "B2", Km = 5.2,
            Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38 },
            Z0 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 1.56, X = 6.24 },
        };
        var c = LineImpedance.Convert(mixed, Bus33, 100);
        Assert.Equal(1.56 / 10.89, c.Z0Pu!.Value.Real, 12);
        Assert.Equal(6.24 / 10.89, c.Z0Pu!.Value.Imaginary, 12);
        Assert.Equal(0.624 / 10.89, c.ZPu.Real, 12);
    }

    [Fact]
    public void A_zero_series_impedance_is_an_input_error()
    {
        var line = new Line { Id = "F4", From = "B1", To = "B2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0, X = 0 } };
        Assert.Equal("F4", Assert.Throws<InputException>(() => LineImpedance.Convert(line, Bus33, 100)).ElementId);
    }
}
