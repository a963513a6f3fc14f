// Malformed IEEE Common Format input: every problem is an InputException at its line and column.
using static Study.Core.Tests.Io.CommonFormatReaderTests;
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Io;

public class CommonFormatErrorTests
{
    private static InputException Fails(IEnumerable<string> lines) =>
        Assert.Throws<InputException>(() => CommonFormatReader.Parse(string.Join("\r\n", lines), "bad.txt"));

    private static string[] Ieee14Lines() => CaseLines("ieee14cdf.txt");

    [Fact]
    public void A_letter_in_a_number_column_names_the_field_line_and_column()
    {
        string[] lines = Ieee14Lines();
        lines[5] = WithColumns(lines[5], 41, "     4x.8"); // bus 4, load MW in columns 41-49
        InputException e = Fails(lines);
        Assert.Equal("bus card: 'load MW' is not a number: '4x.8'", e.Message);
        Assert.Equal((6, 41), (e.Line, e.Column));
        Assert.Equal("bad.txt:6:41: bus card: 'load MW' is not a number: '4x.8'", e.Describe());
    }

    [Theory]
    [InlineData(28, "  NaN ")]
    [InlineData(28, "  inf ")]
    [InlineData(28, "Infini")]
    [InlineData(28, " 1e999")]
    [InlineData(28, " 1,060")]
    public void Non_finite_or_localised_numbers_are_refused(int column, string text)
    {
        string[] lines = Ieee14Lines();
        lines[2] = WithColumns(lines[2], column, text); // bus 1, final voltage in columns 28-33
        InputException e = Fails(lines);
        Assert.Contains("'final voltage'", e.Message);
        Assert.Equal((3, 28), (e.Line, e.Column));
    }

    [Fact]
    public void A_fraction_in_a_whole_number_column_is_refused()
    {
        string[] lines = Ieee14Lines();
        lines[18] = WithColumns(lines[18], 1, " 1.0"); // branch 1-2, tap bus in columns 1-4
        InputException e = Fails(lines);
        Assert.Equal("branch card: 'tap bus number' is not a whole number: '1.0'", e.Message);
        Assert.Equal((19, 1), (e.Line, e.Column));
    }

    [Fact]
    public void A_branch_to_an_unknown_bus_names_the_bus()
    {
        string[] lines = Ieee14Lines();
        lines[37] = WithColumns(lines[37], 6, "  15"); // branch 13-14 becomes 13-15
        InputException e = Fails(lines);
        Assert.Contains("15", e.Message);
        Assert.Contains("'Z bus number'", e.Message);
        Assert.Equal((38, 6), (e.Line, e.Column));
    }

    [Fact]
    public void A_file_cut_in_the_middle_of_the_bus_section_is_refused()
    {
        string text = CaseText("ieee14cdf.txt");
        int cut = text.IndexOf("   7 Bus 7", StringComparison.Ordinal) + 40;
        var e = Assert.Throws<InputException>(() => CommonFormatReader.Parse(text[..cut], "cut.txt"));
        Assert.Contains("BUS DATA", e.Message);
        Assert.Contains("-999", e.Message);
        Assert.Equal(9, e.Line);
    }

    [Fact]
    public void A_file_cut_anywhere_gives_an_input_exception_or_a_network_never_another_exception()
    {
        string text = CaseText("ieee14cdf.txt");
        int readable = 0;
        for (int length = 0; length <= text.Length; length++)
        {
            try
            {
                CommonFormatReader.Parse(text[..length], "cut.txt");
                readable++;
            }
            catch (InputException e)
            {
                Assert.NotNull(e.Line);
            }
        }
        // Exactly the cuts at or after the end of the BRANCH DATA section's -999 still hold a whole case.
        int closed = text.IndexOf("-999\r\nLOSS ZONES", StringComparison.Ordinal) + 4;
        Assert.Equal(text.Length - closed + 1, readable);
    }

    [Fact]
    public void Scrambled_characters_give_an_input_exception_or_a_network_never_another_exception()
    {
        // Fixed seed: one character at a time replaced by something a damaged file could hold.
        string text = CaseText("ieee30cdf.txt");
        const string junk = "x-.+e9 \t\r\n0E";
        var random = new Random(20250101);
        for (int trial = 0; trial < 1000; trial++)
        {
            char[] chars = text.ToCharArray();
            for (int k = 0; k < 3; k++) chars[random.Next(chars.Length)] = junk[random.Next(junk.Length)];
            try
            {
                CommonFormatReader.Parse(new string(chars), "scrambled.txt");
            }
            catch (InputException)
            {
            }
        }
    }

    [Fact]
    public void A_case_without_a_bus_section_is_refused()
    {
        string[] lines = Ieee14Lines();
        lines[1] = "NOT A HEADER";
        InputException e = Fails(lines);
        Assert.Contains("BUS DATA FOLLOWS", e.Message);
    }

    [Fact]
    public void A_case_without_a_branch_section_is_refused()
    {
        InputException e = Fails(Ieee14Lines().Take(17).Append("END OF DATA"));
        Assert.Contains("BRANCH DATA FOLLOWS", e.Message);
    }

    [Fact]
    public void A_section_must_close_with_minus_999_before_the_next_one()
    {
        string[] lines = Ieee14Lines();
        lines[16] = "";
        InputException e = Fails(lines);
        Assert.Contains("not closed by a -999 line", e.Message);
        Assert.Equal(18, e.Line);
    }

    [Fact]
    public void A_bus_number_used_twice_is_refused()
    {
        string[] lines = Ieee14Lines();
        lines[4] = WithColumns(lines[4], 1, "   2");
        InputException e = Fails(lines);
        Assert.Equal("bus card: bus 2 is already defined on line 4", e.Message);
        Assert.Equal((5, 1), (e.Line, e.Column));
    }

    [Fact]
    public void A_bus_type_outside_0_to_3_is_refused()
    {
        string[] lines = Ieee14Lines();
        lines[2] = WithColumns(lines[2], 25, " 5");
        InputException e = Fails(lines);
        Assert.Contains("'bus type'", e.Message);
        Assert.Equal((3, 25), (e.Line, e.Column));
    }

    [Fact]
    public void A_branch_from_a_bus_to_itself_is_refused()
    {
        string[] lines = Ieee14Lines();
        lines[18] = WithColumns(lines[18], 6, "   1");
        InputException e = Fails(lines);
        Assert.Contains("to itself", e.Message);
        Assert.Equal((19, 6), (e.Line, e.Column));
    }

    [Fact]
    public void A_tab_in_a_card_is_refused_because_columns_would_shift()
    {
        string[] lines = Ieee14Lines();
        lines[3] = "   2\tBus 2" + lines[3][10..];
        InputException e = Fails(lines);
        Assert.Contains("tab", e.Message);
        Assert.Equal((4, 5), (e.Line, e.Column));
    }

    [Fact]
    public void The_mva_base_must_be_a_positive_number()
    {
        string[] lines = Ieee14Lines();
        lines[0] = WithColumns(lines[0], 32, "  0.0 ");
        InputException e = Fails(lines);
        Assert.Contains("'MVA base'", e.Message);
        Assert.Equal((1, 32), (e.Line, e.Column));
    }

    [Fact]
    public void Junk_in_the_trailing_limit_columns_is_found_at_its_own_column()
    {
        string[] lines = Ieee14Lines();
        lines[18] = lines[18][..118] + "0.O"; // the file's maximum limit starts in column 119
        InputException e = Fails(lines);
        Assert.Contains("maximum voltage, MVAR or MW limit", e.Message);
        Assert.Equal((19, 119), (e.Line, e.Column));
    }
}
