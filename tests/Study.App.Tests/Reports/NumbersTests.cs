// The one formatter: one mark for an absent value, one for an unbounded one, invariant numbers, machine-friendly CSV.
using System.Globalization;
using Study.App.Reports;

namespace Study.App.Tests.Reports;

public sealed class NumbersTests
{
    [Fact]
    public void Absent_values_read_as_one_blank_mark()
    {
        Assert.Equal("—", Numbers.Blank);
        Assert.Equal(Numbers.Blank, Numbers.Fixed(null, 2));
        Assert.Equal(Numbers.Blank, Numbers.Fixed(double.NaN, 2));
        Assert.Equal(Numbers.Blank, Numbers.UpTo(null, 3));
        Assert.Equal(Numbers.Blank, Numbers.Signed(null, 4));
        Assert.Equal(Numbers.Blank, Numbers.Integer(null));
        Assert.Equal(Numbers.Blank, Numbers.Text(null));
    }

    [Fact]
    public void Unbounded_values_read_as_one_infinity_mark()
    {
        Assert.Equal("∞", Numbers.Infinity);
        Assert.Equal("∞", Numbers.Fixed(double.PositiveInfinity, 2));
        Assert.Equal("-∞", Numbers.Fixed(double.NegativeInfinity, 2));
        Assert.Equal("∞", Numbers.UpTo(double.PositiveInfinity, 3));
        Assert.Equal("+∞", Numbers.Signed(double.PositiveInfinity, 4));
    }

    [Fact]
    public void Numbers_are_invariant_whatever_the_culture_of_the_machine()
    {
        CultureInfo saved = CultureInfo.CurrentCulture;
        try
        {
            // A culture that writes decimal commas (the machine may run in invariant-globalization mode, so it is made here).
            var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
            comma.NumberFormat.NumberDecimalSeparator = ",";
            comma.NumberFormat.NumberGroupSeparator = ".";
            CultureInfo.CurrentCulture = comma;
            Assert.Equal("1234.50", Numbers.Fixed(1234.5, 2));
            Assert.Equal("0.415", Numbers.UpTo(0.41500, 3));
            Assert.Equal("132", Numbers.UpTo(132, 3));
            Assert.Equal("4.0e-9", Numbers.Exponent(4.04e-9));
            Assert.Equal("0.1", Numbers.Csv(0.1));
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    [Fact]
    public void A_signed_change_that_rounds_to_nothing_reads_plus_zero()
    {
        Assert.Equal("+0.0043", Numbers.Signed(0.00431, 4));
        Assert.Equal("-0.0120", Numbers.Signed(-0.012, 4));
        Assert.Equal("+0.0000", Numbers.Signed(-0.00001, 4));
    }

    [Fact]
    public void Csv_cells_are_empty_where_absent_round_trip_numbers_and_write_inf()
    {
        Assert.Equal("", Numbers.Csv(null));
        Assert.Equal("", Numbers.Csv(double.NaN));
        Assert.Equal("inf", Numbers.Csv(double.PositiveInfinity));
        Assert.Equal("-inf", Numbers.Csv(double.NegativeInfinity));
        foreach (double x in new[] { 1.0 / 3, 1.0120345678912345, -25.018, 1e-15 })
            Assert.Equal(x, double.Parse(Numbers.Csv(x), CultureInfo.InvariantCulture));
        Assert.Equal("3", Numbers.Csv(3));
        Assert.Equal("True", Numbers.Csv(true));
    }
}
