// Reading load profiles: steps from the time column or a given step length, and every bad file refused at its line and column.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.Core.Tests.Io;

public sealed class ProfileFileTests
{
    [Fact]
    public void Each_row_holds_until_the_next_and_the_last_for_as_long_as_the_one_before()
    {
        LoadProfile p = ProfileFile.Parse("time,scale\n2027-01-01T00:00,0.5\n2027-01-01T00:15,0.6\n2027-01-01T01:15,0.7\n", "p.csv");
        Assert.Null(p.LoadIds);
        Assert.Equal([0.25, 1.0, 1.0], p.Steps.Select(s => s.Hours));
        Assert.Equal([0.5, 0.6, 0.7], p.Steps.Select(s => s.Scales[0]));
        Assert.Equal(new DateTimeOffset(2027, 1, 1, 0, 15, 0, TimeSpan.Zero), p.Steps[1].Time);
    }

    [Fact]
    public void A_step_length_replaces_the_time_column_and_load_columns_keep_their_order()
    {
        LoadProfile p = ProfileFile.Parse("L1,L2\r\n1,0.5\r\n0.9,0.4\r\n", "p.csv", stepMinutes: 30);
        Assert.Equal(["L1", "L2"], p.LoadIds);
        Assert.Equal([0.5, 0.5], p.Steps.Select(s => s.Hours));
        Assert.Equal([1, 4], p.LoadColumns);
    }

    [Theory]
    [InlineData("", 1, 1, "empty")]
    [InlineData("time,scale\n", 1, 1, "no rows")]
    [InlineData("scale\n1\n", 1, 1, "no 'time' column")]
    [InlineData("time,scale\n2027-01-01T00:00,1\n2027-13-01T00:00,1\n", 3, 1, "not an ISO 8601 time")]
    [InlineData("time,scale\n2027-01-01T01:00,1\n2027-01-01T00:00,1\n", 3, 1, "does not come after")]
    [InlineData("time,scale\n2027-01-01T00:00,1\n2027-01-01T01:00,-0.5\n", 3, 18, "negative")]
    [InlineData("time,scale\n2027-01-01T00:00,NaN\n2027-01-01T01:00,1\n", 2, 18, "not a finite number")]
    [InlineData("time,scale\n2027-01-01T00:00,1,2\n", 2, 1, "3 cells for 2 columns")]
    [InlineData("time,scale,L1\n2027-01-01T00:00,1,1\n", 1, 6, "not both")]
    [InlineData("time,L1,L1\n2027-01-01T00:00,1,1\n", 1, 9, "named twice")]
    [InlineData("time,scale\n2027-01-01T00:00,1\n", 2, 1, "one row has no step length")]
    public void A_bad_profile_is_refused_at_its_line_and_column(string text, int line, int column, string message)
    {
        var e = Assert.Throws<InputException>(() => ProfileFile.Parse(text, "bad.csv"));
        Assert.Contains(message, e.Message);
        Assert.Equal("bad.csv", e.File);
        Assert.Equal((line, column), (e.Line, e.Column));
    }

    [Fact]
    public void The_bundled_demo_profiles_read_a_day_at_quarter_hours_and_a_year_at_hours()
    {
        LoadProfile day = ProfileFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-day.profile.csv"));
        Assert.Equal(96, day.Steps.Count);
        Assert.Equal(24, day.Hours, 9);
        LoadProfile year = ProfileFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-year.profile.csv"));
        Assert.Equal(8760, year.Steps.Count);
        Assert.Equal(8760, year.Hours, 6);
    }
}
