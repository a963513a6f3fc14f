// The Profile screen: the dialog's question, the charts' numbers against the study's own series, the tab at
// 80×24 and 160×48, and a run through Alt+L off the UI thread with its progress and Esc to stop it.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.Profile;
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Studies;
using Terminal.Gui.Input;

namespace Study.App.Tests.Tui;

public sealed class ProfileScreenTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private static string Day => Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-day.profile.csv");

    private static ProfileResult RunDay(Network n) =>
        StudyCase.Of(n).Profile(new ProfileRequest(), ProfileFile.Read(Day));

    [Fact]
    public void The_profile_form_suggests_the_profile_beside_the_network_and_checks_what_is_typed()
    {
        Network n = DemoNetwork.Read();
        var form = new ProfileForm(n, "winter-peak", DemoNetwork.PathOf);
        Assert.EndsWith(".profile.csv", form.CsvText);
        Assert.Equal("winter-peak", form.Scenario);
        form.StepMinutesText = "-5";
        Assert.Contains("step minutes", form.Build().Error);
        form.StepMinutesText = "15";
        form.WatchText = "CQ11 NOWHERE";
        Assert.Contains("NOWHERE", form.Build().Error);
        form.WatchText = "CQ11";
        form.CsvText = temp.File("none.csv");
        Assert.Contains("no such file", form.Build().Error);
        form.CsvText = Day;
        ProfileQuestion q = form.Build().Question!;
        Assert.Equal(15, q.StepMinutes);
        Assert.Equal(["CQ11"], q.Request.WatchBuses);
        Assert.Equal("winter-peak", q.Request.Scenario);
    }

    [Fact]
    public void The_voltage_chart_draws_each_watched_bus_within_its_lowest_and_highest_and_the_tap_chart_only_on_load_changers()
    {
        Network n = DemoNetwork.Read();
        ProfileResult r = RunDay(n);
        TimeChart v = TimeChart.Voltages(r);
        Assert.Equal(r.Series.WatchedBuses.Count, v.Series.Count);
        for (int w = 0; w < v.Series.Count; w++)
        {
            // Every point drawn is one of the study's own voltages; the extremes are the bus's lowest and highest.
            ProfileBus bus = r.Buses.Single(b => b.Id == r.Series.WatchedBuses[w]);
            Assert.Equal(bus.VMinPu, v.Series[w].Lowest.Min(p => p.Y), 5);
            Assert.Equal(bus.VMaxPu, v.Series[w].Highest.Max(p => p.Y), 5);
            Assert.Equal(r.Steps, v.Series[w].Lowest.Count); // 96 steps: one interval each
            Assert.Equal(r.Series.Voltages[10][w], v.Series[w].Lowest[10].Y, 5);
        }
        Assert.Equal(0, v.Series[0].Lowest[0].X);
        Assert.Equal(r.Hours - r.Series.Hours[^1], v.Series[0].Lowest[^1].X, 4);
        Assert.Equal(r.Buses.Where(b => r.Series.WatchedBuses.Contains(b.Id)).Max(b => b.BandLowPu), v.BandLow);
        TimeChart t = TimeChart.Taps(r);
        Assert.Equal(r.Transformers.Where(x => x.OnLoad).Select(x => x.Id), t.Series.Select(s => s.Name));
        // Tap positions are drawn from the chart's bottom (the time axis sits at zero): every one at or above it.
        Assert.Equal(t.YLow, t.YShift);
        Assert.All(t.Series.SelectMany(x => x.Lowest), p => Assert.True(p.Y - t.YShift >= 0));
        Assert.Equal("00:00", v.TimeLabel(0));
        Assert.Equal("06:00", v.TimeLabel(6));
    }

    [Fact]
    public void A_year_is_gathered_into_intervals_that_keep_each_extreme()
    {
        Network n = DemoNetwork.Read();
        ProfileResult r = StudyCase.Of(n).Profile(new ProfileRequest(), ProfileFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-year.profile.csv")));
        TimeChart v = TimeChart.Voltages(r);
        Assert.Equal(TimeChart.Intervals, v.Series[0].Lowest.Count);
        ProfileBus bus = r.Buses.Single(b => b.Id == r.Series.WatchedBuses[0]);
        Assert.Equal(bus.VMinPu, v.Series[0].Lowest.Min(p => p.Y), 5);
        Assert.Equal(bus.VMaxPu, v.Series[0].Highest.Max(p => p.Y), 5);
        Assert.Equal("Jan", v.TimeLabel(0));
    }

    [Theory]
    [InlineData(80, 24)]
    [InlineData(160, 48)]
    public void Alt_L_runs_the_profile_off_the_UI_thread_and_shows_the_findings_charts_and_energy(int width, int height)
    {
        Network n = DemoNetwork.Read();
        using var h = new Headless(width, height);
        var session = EditSession.Untitled(n, temp.File("user"));
        MainWindow main = h.Main(session);
        string dialog = "", screen = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.L.WithAlt)),
            new Step("the profile dialog", () => h.DialogUp, () =>
            {
                dialog = h.DialogText();
                // The suggestion is a folder for an untitled network: type the day profile over it.
                h.Keys(Key.End);
                for (int i = 0; i < 300; i++) h.Keys(Key.Backspace);
                h.Type(Day);
                h.Keys(Key.Enter);
            }),
            new Step("the profile", () => main.Results.Profile.Result is not null && !main.Runner.IsRunning && !h.DialogUp, () => screen = h.Draw()));
        Assert.Contains("Profile CSV", dialog);
        ProfileResult shown = main.Results.Profile.Result!;
        ProfileResult direct = RunDay(n);
        Assert.Equal(direct.Energy.LossMwh, shown.Energy.LossMwh, 9);
        Assert.Contains("96 steps", screen);
        Assert.Contains("0.95–1.05 pu", screen);
        Assert.Contains("tap position", screen);
        Assert.Contains("00:00", screen);
        Assert.Contains("delivered by supplies", screen);
        Assert.Equal(Numbers.Fixed(direct.Energy.DeliveredMwh, 2), main.Results.Profile.Energy.Source.RowCells[0][1]);
        session.Close();
    }

    [Fact]
    public void Esc_stops_a_running_profile_and_the_tab_says_it_was_cancelled()
    {
        Network n = DemoNetwork.Read();
        using var h = new Headless(120, 40);
        var session = EditSession.Untitled(n, temp.File("user"));
        MainWindow main = h.Main(session);
        string? told = null;
        string running = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.L.WithAlt)),
            new Step("the profile dialog", () => h.DialogUp, () =>
            {
                h.Keys(Key.End);
                for (int i = 0; i < 300; i++) h.Keys(Key.Backspace);
                h.Type(Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-year.profile.csv"));
                h.Keys(Key.Enter);
            }),
            new Step("the study running", () => main.Runner.IsRunning && !h.DialogUp, () =>
            {
                running = main.Runner.Progress ?? "";
                h.Keys(Key.Esc);
            }),
            new Step("the message", () => h.DialogUp, () =>
            {
                told = h.DialogText();
                h.Keys(Key.Enter);
            }));
        Assert.StartsWith("Profile", running);
        Assert.Contains("Esc cancels", running);
        Assert.Contains("Profile cancelled", told);
        Assert.Null(main.Results.Profile.Result);
        session.Close();
    }
}
