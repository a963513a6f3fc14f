// The title card of a Common Format case is the card just before BUS DATA FOLLOWS; archive files may carry
// a tape label or comment lines above it, which are skipped with a note (IEEE Working Group, 1973).
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Io;

public class CommonFormatTitleCardTests
{
    [Fact]
    public void Lines_before_the_title_card_are_skipped_with_a_note_and_the_mva_base_comes_from_the_title_card()
    {
        // A comment line with a number where the title card keeps its MVA base (columns 32-37): read as the
        // title card it would give a 50 MVA base in silence.
        string comment = "COMMENT: archive copy, page 1".PadRight(31) + "  50.0";
        string label = "VOL1 TAPE LABEL";
        string text = comment + "\r\n" + label + "\r\n" + CommonFormatReaderTests.CaseText("ieee14cdf.txt");
        Network n = CommonFormatReader.Parse(text, "ieee14-labelled.txt");
        Assert.Equal(100, n.BaseMva);
        Assert.Equal("IEEE 14 Bus Test Case", n.Name);
        string note = Assert.Single(n.Source.Notes);
        Assert.Contains("2 lines (1 to 2) before the title card skipped", note);
        Assert.Contains("MVA base 100", note);
        // The cards keep their own line numbers: bus 1 is now on line 5.
        Assert.Equal(5, n.Source.LineOf(ElementFamily.Bus, "1"));
    }

    [Fact]
    public void A_case_whose_first_line_is_its_title_card_reads_without_a_note()
    {
        Network n = CommonFormatReader.Parse(CommonFormatReaderTests.CaseText("ieee14cdf.txt"), "ieee14cdf.txt");
        Assert.Empty(n.Source.Notes);
        Assert.Equal(100, n.BaseMva);
    }

    [Fact]
    public void A_line_before_the_title_card_that_is_not_a_title_card_no_longer_stops_the_read()
    {
        // A tape-label line has text where the MVA base belongs; taken as the title card it refused the case.
        string text = "HDR1 IEEE300 ARCHIVE TAPE       NOT-A-NUMBER\n" + CommonFormatReaderTests.CaseText("ieee14cdf.txt");
        Network n = NetworkFile.Parse(text, "ieee14-tape.txt");
        Assert.Equal(14, n.Buses.Count);
        Assert.Contains("line 1 before the title card skipped", Assert.Single(n.Source.Notes));
    }

    [Fact]
    public void No_line_before_bus_data_is_still_refused_at_the_header()
    {
        string text = CommonFormatReaderTests.CaseText("ieee14cdf.txt");
        text = text[(text.IndexOf('\n') + 1)..];
        var e = Assert.Throws<InputException>(() => CommonFormatReader.Parse(text, "no-title.txt"));
        Assert.Equal((1, "no title card before 'BUS DATA FOLLOWS'"), (e.Line!.Value, e.Message));
    }
}
