// The progress line of long studies: count of total, rate and time left, in words a reader takes in at a glance.
using Study.App.Cli;

namespace Study.App.Tests.Cli;

public class TerminalProgressTests
{
    [Fact]
    public void The_line_gives_the_count_of_the_total_the_rate_and_the_time_left()
    {
        var progress = new TerminalProgress(TextWriter.Null, "outages", 14_000, inPlace: true);
        // 1,400 of 14,000 in 10 s: 140 a second, 12,600 left take 90 s, said as 2 min.
        Assert.Equal("outages: 1,400 of 14,000, 140 a second, about 2 min left", progress.Line(0.1, TimeSpan.FromSeconds(10)));
        Assert.Equal("outages: 14,000 of 14,000, 1,400 a second", progress.Line(1, TimeSpan.FromSeconds(10)));
        Assert.Equal("outages: 0 of 14,000", progress.Line(0, TimeSpan.FromSeconds(3)));
        var shards = new TerminalProgress(TextWriter.Null, "shards", 4, inPlace: false);
        Assert.Equal("shards: 1 of 4, 6 a minute, about 30 s left", shards.Line(0.25, TimeSpan.FromSeconds(10)));
    }

    [Theory]
    [InlineData(0.2, "1 s")]
    [InlineData(59, "59 s")]
    [InlineData(61, "2 min")]
    [InlineData(3600, "1 h 0 min")]
    [InlineData(7800, "2 h 10 min")]
    public void Durations_read_as_people_say_them(double seconds, string words) => Assert.Equal(words, TerminalProgress.Duration(seconds));

    [Fact]
    public void Only_the_process_standard_error_gets_a_progress_line()
    {
        Assert.Null(TerminalProgress.ForStandardError(new StringWriter(), "outages", 10));
        Assert.Null(TerminalProgress.ForStandardError(Console.Error, "outages", 0));
    }
}
