// Reading the IEEE 14- and 30-bus cases from the UW archive (1993) in the IEEE Common Format
// (IEEE Working Group, 1973); expected values are read off the files themselves.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Io;

public class CommonFormatReaderTests
{
    internal static string CaseText(string name) =>
        File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "networks", name));

    internal static Network Ieee14() => CommonFormatReader.Parse(CaseText("ieee14cdf.txt"), "ieee14cdf.txt");

    private static Network Ieee30() => CommonFormatReader.Parse(CaseText("ieee30cdf.txt"), "ieee30cdf.txt");

    [Fact]
    public void Ieee14_has_14_buses_and_20_branches_of_which_3_are_transformers()
    {
        Network n = Ieee14();
        Assert.Equal(14, n.Buses.Count);
        Assert.Equal(20, n.Lines.Count + n.Transformers.Count);
        Assert.Equal(17, n.Lines.Count);
        Assert.Equal(["4-7", "4-9", "5-6"], n.Transformers.Select(t => t.Id));
        Assert.Equal([0.978, 0.969, 0.932], n.Transformers.Select(t => t.Ratio!.Value));
        Transformer t47 = n.Transformers[0];
        Assert.Equal(("4", "7"), (t47.Hv, t47.Lv));
        Assert.Equal(0.0, t47.RPu);
        Assert.Equal(0.20912, t47.XPu);
        Assert.Null(t47.BPu);
        Assert.Null(t47.PhaseShiftDeg);
    }

    [Fact]
    public void Ieee14_lines_keep_their_per_unit_impedance_and_total_charging()
    {
        Line l12 = Ieee14().Lines.Single(l => l.Id == "1-2");
        Assert.Equal(("1", "2"), (l12.From, l12.To));
        Assert.Equal(ImpedanceBasis.PerUnit, l12.Z1!.Per);
        Assert.Equal(0.01938, l12.Z1.R);
        Assert.Equal(0.05917, l12.Z1.X);
        Assert.Equal(0.0528, l12.Z1.B);
        Assert.Null(l12.RatingMva);
        Assert.Null(l12.Z0);
    }

    [Fact]
    public void Ieee14_has_one_slack_and_four_pv_generators_even_at_zero_MW()
    {
        Network n = Ieee14();
        Assert.Equal(5, n.Generators.Count);
        Generator slack = Assert.Single(n.Generators, g => g.Mode == GeneratorMode.Slack);
        Assert.Equal(("G1", "1", 1.060, 232.4, -16.9), (slack.Id, slack.Bus, slack.VSet, slack.PMw, slack.QMvar));
        Assert.Null(slack.QMaxMvar);
        Assert.Null(slack.QMinMvar);
        Assert.Equal(["2", "3", "6", "8"], n.Generators.Where(g => g.Mode == GeneratorMode.Pv).Select(g => g.Bus));
        Generator g2 = n.Generators.Single(g => g.Id == "G2");
        Assert.Equal((40.0, 1.045, 50.0, -40.0), (g2.PMw, g2.VSet, g2.QMaxMvar!.Value, g2.QMinMvar!.Value));
        Generator g3 = n.Generators.Single(g => g.Id == "G3");
        Assert.Equal(0, g3.PMw);
        Assert.Equal((40.0, 0.0), (g3.QMaxMvar!.Value, g3.QMinMvar!.Value));
    }

    [Fact]
    public void Ieee14_keeps_base_mva_case_name_and_is_per_unit_only()
    {
        Network n = Ieee14();
        Assert.Equal(100, n.BaseMva);
        Assert.Equal("IEEE 14 Bus Test Case", n.Name);
        Assert.Equal(60, n.FrequencyHz);
        Assert.True(n.IsPerUnitOnly);
        Bus b1 = n.Buses[0];
        Assert.Equal(("1", "Bus 1     HV", "1", 0.0, 0.95, 1.05), (b1.Id, b1.Name, b1.Zone, b1.Kv, b1.VMin, b1.VMax));
    }

    [Fact]
    public void Ieee14_loads_and_the_bus_9_capacitor_become_elements()
    {
        Network n = Ieee14();
        Assert.Equal(11, n.Loads.Count);
        Load l4 = n.Loads.Single(l => l.Id == "L4");
        Assert.Equal(("4", 47.8, -3.9), (l4.Bus, l4.PMw, l4.QMvar));
        Assert.DoesNotContain(n.Loads, l => l.Bus is "1" or "7" or "8");
        Shunt sh9 = Assert.Single(n.Shunts);
        Assert.Equal(("SH9", "9", 19.0, 0.0), (sh9.Id, sh9.Bus, sh9.QMvar, sh9.PMw));
    }

    [Fact]
    public void Ieee14_keeps_the_published_solution()
    {
        PublishedSolution s = Ieee14().PublishedSolution!;
        Assert.Equal("ieee14cdf.txt", s.Source);
        Assert.Equal(14, s.Buses.Count);
        Assert.Equal(("1", 1.060, 0.0, 232.4, -16.9), (s.Buses[0].Id, s.Buses[0].VPu, s.Buses[0].AngleDeg, s.Buses[0].PGenMw, s.Buses[0].QGenMvar));
        Assert.Equal(("14", 1.036, -16.04), (s.Buses[13].Id, s.Buses[13].VPu, s.Buses[13].AngleDeg));
        Assert.Equal(17.4, s.Buses[7].QGenMvar);
    }

    [Fact]
    public void Ieee14_elements_remember_the_line_of_their_card()
    {
        Network n = Ieee14();
        Assert.Equal("ieee14cdf.txt", n.Source.File);
        Assert.Equal(3, n.Source.LineOf(ElementFamily.Bus, "1"));
        Assert.Equal(3, n.Source.LineOf(ElementFamily.Source, "G1"));
        Assert.Equal(4, n.Source.LineOf(ElementFamily.LoadOrShunt, "L2"));
        Assert.Equal(11, n.Source.LineOf(ElementFamily.LoadOrShunt, "SH9"));
        Assert.Equal(19, n.Source.LineOf(ElementFamily.Branch, "1-2"));
        Assert.Equal(26, n.Source.LineOf(ElementFamily.Branch, "4-7"));
        Assert.Equal(38, n.Source.LineOf(ElementFamily.Branch, "13-14"));
    }

    [Fact]
    public void Ieee30_has_30_buses_and_41_branches()
    {
        Network n = Ieee30();
        Assert.Equal(30, n.Buses.Count);
        Assert.Equal(41, n.Lines.Count + n.Transformers.Count);
        Assert.Equal(41, n.Lines.Select(l => l.Id).Concat(n.Transformers.Select(t => t.Id)).Distinct().Count());
        Assert.Equal("IEEE 30 Bus Test Case", n.Name);
        Assert.False(n.IsPerUnitOnly);
        Assert.Equal(6, n.Generators.Count);
        Assert.Equal([("SH10", 19.0), ("SH24", 4.3)], n.Shunts.Select(s => (s.Id, s.QMvar)));
    }

    [Fact]
    public void Ieee30_branches_between_different_base_voltages_are_transformers_at_ratio_one()
    {
        // The four with a turns ratio on the card, plus 9-11 (1.0/11 kV), 9-10 (1.0/33 kV) and
        // 12-13 (33/11 kV), which the file writes as ratio 0 but which join two voltage levels.
        Network n = Ieee30();
        Assert.Equal(
            [("6-9", 0.978), ("6-10", 0.969), ("9-11", 1.0), ("9-10", 1.0), ("4-12", 0.932), ("12-13", 1.0), ("28-27", 0.968)],
            n.Transformers.Select(t => (t.Id, t.Ratio!.Value)));
        Assert.All(n.Lines, l => Assert.Equal(n.FindBus(l.From)!.Kv, n.FindBus(l.To)!.Kv));
    }

    [Fact]
    public void Ieee30_bus_names_and_base_kv_are_read_from_their_columns()
    {
        // Bus 28's name fills columns 6-17 up to the base kV text ("Cloverdle132").
        Network n = Ieee30();
        Bus b28 = n.FindBus("28")!;
        Assert.Equal(("Cloverdle132", 132.0), (b28.Name, b28.Kv));
        Assert.Equal(("Roanoke  1.0", 1.0), (n.FindBus("9")!.Name, n.FindBus("9")!.Kv));
    }

    [Theory]
    [InlineData("ieee14cdf.txt")]
    [InlineData("ieee30cdf.txt")]
    public void Writing_the_imported_case_and_reading_it_back_gives_the_same_file(string name)
    {
        string once = NetworkFile.ToJson(NetworkFile.Parse(CaseText(name), name));
        string twice = NetworkFile.ToJson(NetworkFile.Parse(once, "copy.study.json"));
        Assert.Equal(once, twice);
        Assert.Contains("\"publishedSolution\"", once);
    }

    [Theory]
    [InlineData("ieee14cdf.txt")]
    [InlineData("ieee30cdf.txt")]
    public void Line_endings_do_not_matter(string name)
    {
        string text = CaseText(name);
        Assert.Contains("\r\n", text); // the archive files are CRLF
        string lf = text.Replace("\r\n", "\n");
        string crlf = lf.Replace("\n", "\r\n");
        string cr = lf.Replace("\n", "\r");
        string expected = NetworkFile.ToJson(CommonFormatReader.Parse(lf, name));
        Assert.Equal(expected, NetworkFile.ToJson(CommonFormatReader.Parse(crlf, name)));
        Assert.Equal(expected, NetworkFile.ToJson(CommonFormatReader.Parse(cr, name)));
        Assert.Equal(expected, NetworkFile.ToJson(CommonFormatReader.Parse("\uFEFF" + crlf, name)));
        Assert.Equal(
            CommonFormatReader.Parse(lf, name).Source.LineOf(ElementFamily.Branch, "1-2"),
            CommonFormatReader.Parse(cr, name).Source.LineOf(ElementFamily.Branch, "1-2"));
    }

    [Fact]
    public void Reading_from_disk_recognises_the_format_by_content()
    {
        string path = Path.Combine(AppContext.BaseDirectory, "networks", "ieee14cdf.txt");
        Network n = NetworkFile.Read(path);
        Assert.Equal(14, n.Buses.Count);
        Assert.Equal(path, n.Source.File);
        Assert.Equal("ieee14cdf.txt", n.PublishedSolution!.Source);
    }

    [Fact]
    public void Short_cards_read_the_missing_trailing_fields_as_zero()
    {
        // Keep bus 14 up to its load (column 59) and line 1-2 up to its charging (column 50).
        string[] lines = CaseLines("ieee14cdf.txt");
        lines[15] = lines[15][..59];
        lines[18] = lines[18][..50];
        Network n = CommonFormatReader.Parse(string.Join("\n", lines), "short.txt");
        Assert.Equal(14.9, n.Loads.Single(l => l.Bus == "14").PMw);
        Assert.Equal(0, n.PublishedSolution!.Buses[13].QGenMvar);
        Assert.Equal(0.0528, n.Lines.Single(l => l.Id == "1-2").Z1!.B);
    }

    [Fact]
    public void Parallel_branches_get_their_circuit_number()
    {
        // A second 1-2 card with circuit 2, and a third one that repeats circuit 2.
        string[] lines = CaseLines("ieee14cdf.txt");
        string circuit2 = WithColumns(lines[18], 17, "2");
        var edited = lines.Take(19).Append(circuit2).Append(circuit2).Concat(lines.Skip(19));
        Network n = CommonFormatReader.Parse(string.Join("\n", edited), "parallel.txt");
        Assert.Equal(["1-2#1", "1-2#2", "1-2#3", "1-5"], n.Lines.Take(4).Select(l => l.Id));
        Assert.Equal(21, n.Source.LineOf(ElementFamily.Branch, "1-2#3"));
    }

    [Fact]
    public void Parallel_branches_with_no_circuit_number_are_counted()
    {
        string[] lines = CaseLines("ieee14cdf.txt");
        string blank = WithColumns(lines[18], 17, " ");
        var edited = lines.Take(18).Append(blank).Append(blank).Concat(lines.Skip(19));
        Network n = CommonFormatReader.Parse(string.Join("\n", edited), "parallel.txt");
        Assert.Equal(["1-2#1", "1-2#2", "1-5"], n.Lines.Take(3).Select(l => l.Id));
    }

    [Fact]
    public void A_pq_bus_with_generation_gets_a_pq_generator()
    {
        // Bus 4 (type 0) given 10 MW, 2 Mvar in the generation columns 60-67 and 68-75.
        string[] lines = CaseLines("ieee14cdf.txt");
        lines[5] = WithColumns(WithColumns(lines[5], 60, "    10.0"), 68, "     2.0");
        Generator g4 = CommonFormatReader.Parse(string.Join("\n", lines), "pq.txt").Generators.Single(g => g.Id == "G4");
        Assert.Equal((GeneratorMode.Pq, 10.0, 2.0), (g4.Mode, g4.PMw, g4.QMvar));
        Assert.Null(g4.QMaxMvar);
    }

    internal static string[] CaseLines(string name) => CaseText(name).Replace("\r\n", "\n").Split('\n');

    /// <summary>The line with <paramref name="text"/> written over it from 1-based <paramref name="column"/>.</summary>
    internal static string WithColumns(string line, int column, string text)
    {
        string padded = line.PadRight(column - 1 + text.Length);
        return padded[..(column - 1)] + text + padded[(column - 1 + text.Length)..];
    }
}
