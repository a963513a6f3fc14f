// Output never damages what is not ours: write failures are input errors (exit 2, "cannot write PATH:
// reason"), non-regular files are refused, links are written through, no folder is created, an output
// never lands on an input, and a result's tables are replaced as one set.
using System.Diagnostics;
using Study.App.Reports;
using Study.Core.Io;

namespace Study.App.Tests.Cli;

public sealed class OutputSafetyTests : IDisposable
{
    private readonly TempDirectory dir = new();

    public void Dispose()
    {
        AtomicFolder.BeforeSwap = null;
        dir.Dispose();
    }

    private static CliOutcome SolveDemo(params string[] extra) => CliRun.Run(["solve", DemoNetworks.Demo, .. extra]);

    private static void AssertCannotWrite(CliOutcome run, string path, string reason)
    {
        Assert.Equal(2, run.ExitCode);
        Assert.Contains($"error: cannot write {path}: {reason}", run.Err);
        Assert.DoesNotContain("internal error", run.Err);
    }

    [Fact]
    public void A_device_a_folder_an_empty_name_and_a_dash_are_refused_as_input_errors()
    {
        if (File.Exists("/dev/null")) AssertCannotWrite(SolveDemo("--markdown", "/dev/null"), "/dev/null", "it is a device, not a regular file");
        AssertCannotWrite(SolveDemo("--markdown", dir.Path), dir.Path, "it is a folder");
        AssertCannotWrite(SolveDemo("--markdown", ""), "\"\"", "no file name given");
        AssertCannotWrite(SolveDemo("--markdown", "-"), "-", "'-' stands for standard output");
        if (Directory.Exists("/proc/self")) AssertCannotWrite(SolveDemo("--markdown", "/proc/self/study.md"), "/proc/self/study.md", "");
        Assert.True(File.Exists("/dev/null") || !OperatingSystem.IsLinux(), "the device was replaced");
    }

    [Fact]
    public void A_named_pipe_is_refused_and_left_a_pipe()
    {
        if (!OperatingSystem.IsLinux()) return;
        string fifo = dir.File("pipe");
        using (Process p = Process.Start("mkfifo", fifo)) p.WaitForExit();
        AssertCannotWrite(SolveDemo("--markdown", fifo), fifo, "it is a named pipe, not a regular file");
        Assert.Equal(PathKind.Pipe, FileKind.Of(fifo));
    }

    [Fact]
    public void A_missing_folder_is_an_error_and_nothing_is_created()
    {
        string path = dir.File("nowhere/deeper/solve.md");
        AssertCannotWrite(SolveDemo("--markdown", path), path, $"the folder {dir.File("nowhere/deeper")} does not exist");
        Assert.False(Directory.Exists(dir.File("nowhere")));
        string tables = dir.File("nowhere/tables");
        AssertCannotWrite(SolveDemo("--csv", tables), tables, $"the folder {dir.File("nowhere")} does not exist");
    }

    [Fact]
    public void A_link_is_written_through_and_stays_a_link()
    {
        string real = dir.File("real.md"), link = dir.File("link.md");
        File.WriteAllText(real, "old");
        File.CreateSymbolicLink(link, real);
        Assert.Equal(0, SolveDemo("--markdown", link).ExitCode);
        Assert.NotNull(new FileInfo(link).LinkTarget);
        Assert.StartsWith("# Load flow: ", File.ReadAllText(real));
        Assert.Empty(dir.Leftovers());
    }

    [Fact]
    public void An_output_on_an_input_is_refused_before_any_work_and_the_input_is_untouched()
    {
        string network = dir.File("net.study.json");
        File.Copy(DemoNetworks.Demo, network);
        string before = File.ReadAllText(network);
        CliOutcome run = CliRun.Run("solve", network, "--markdown", network);
        AssertCannotWrite(run, network, $"it is the input {network} (--markdown names it)");
        Assert.Equal(before, File.ReadAllText(network));
        Assert.Equal("", run.Out);

        string link = dir.File("alias.json");
        File.CreateSymbolicLink(link, network);
        AssertCannotWrite(CliRun.Run("convert", network, link), link, "it is the input");
        AssertCannotWrite(CliRun.Run("solve", network, "--markdown", dir.File("a.md"), "--export-jacobian", dir.File("a.md")),
            dir.File("a.md"), "--markdown and --export-jacobian both name it");
        Assert.Equal(before, File.ReadAllText(network));
    }

    [Fact]
    public void A_file_given_as_the_csv_folder_is_refused()
    {
        string file = dir.File("tables");
        File.WriteAllText(file, "mine");
        AssertCannotWrite(SolveDemo("--csv", file), file, "it is a file, not a folder");
        Assert.Equal("mine", File.ReadAllText(file));
    }

    [Fact]
    public void A_csv_folder_holding_other_files_is_refused_rather_than_replaced()
    {
        string tables = dir.File("tables");
        Directory.CreateDirectory(tables);
        File.WriteAllText(Path.Combine(tables, "notes.txt"), "keep me");
        AssertCannotWrite(SolveDemo("--csv", tables), tables, "it holds notes.txt, which is not a table");
        Assert.Equal("keep me", File.ReadAllText(Path.Combine(tables, "notes.txt")));
    }

    [Fact]
    public void A_failure_before_the_swap_leaves_the_previous_set_whole_and_no_temporary_folder()
    {
        string tables = dir.File("tables");
        Assert.Equal(0, SolveDemo("--csv", tables, "--scenario", "winter-peak").ExitCode);
        string[] previous = Directory.GetFiles(tables).Order().Select(File.ReadAllText).ToArray();
        AtomicFolder.BeforeSwap = temp =>
        {
            // The whole new set is written before the swap is tried.
            Assert.Equal(4, Directory.GetFiles(temp).Length);
            throw new IOException("simulated crash before the swap");
        };
        AssertCannotWrite(SolveDemo("--csv", tables, "--scenario", "summer-night"), tables, "simulated crash before the swap");
        Assert.Equal(previous, Directory.GetFiles(tables).Order().Select(File.ReadAllText).ToArray());
        Assert.Equal([tables], Directory.GetFileSystemEntries(dir.Path));
    }

    [Fact]
    public void A_load_flow_that_does_not_converge_leaves_the_previous_tables()
    {
        string tables = dir.File("tables");
        Assert.Equal(0, SolveDemo("--csv", tables).ExitCode);
        string buses = File.ReadAllText(Path.Combine(tables, "buses.csv"));
        CliOutcome failed = SolveDemo("--csv", tables, "--max-iterations", "1");
        Assert.Equal(3, failed.ExitCode);
        Assert.Contains($"note: no tables written to {tables}", failed.Err);
        Assert.Equal(buses, File.ReadAllText(Path.Combine(tables, "buses.csv")));
    }

    [Fact]
    public void Tables_of_another_result_in_the_folder_are_kept_and_the_set_is_replaced_whole()
    {
        string tables = dir.File("tables");
        Assert.Equal(0, CliRun.Run("outages", DemoNetworks.Demo, "--scenario", "winter-peak", "--csv", tables).ExitCode);
        Assert.Equal(0, SolveDemo("--csv", tables).ExitCode);
        Assert.Equal(["branches.csv", "buses.csv", "new-violations.csv", "outages.csv", "taps.csv", "violations.csv"],
            Directory.GetFiles(tables).Select(f => Path.GetFileName(f)!).Order().ToArray());
    }

    [Fact]
    public void Temporary_files_and_folders_of_a_killed_run_are_removed_on_the_next_write()
    {
        // Process id 999999999 is above any pid_max: the run that made these is not running.
        string tables = dir.File("tables");
        Directory.CreateDirectory(tables);
        string staleFolder = dir.File(".tables.999999999.0123abcd.tables");
        Directory.CreateDirectory(staleFolder);
        File.WriteAllText(Path.Combine(staleFolder, "buses.csv"), "half");
        string staleFile = dir.File(".solve.md.999999999.0123abcd.tmp");
        File.WriteAllText(staleFile, "half a report");
        Assert.Equal(0, SolveDemo("--csv", tables, "--markdown", dir.File("solve.md")).ExitCode);
        Assert.False(Directory.Exists(staleFolder));
        Assert.False(File.Exists(staleFile));
        Assert.Equal(4, Directory.GetFiles(tables).Length);
    }

    [Fact]
    public void A_swap_cut_between_its_two_renames_is_put_back_before_the_next_write()
    {
        // The previous set was moved aside and the run killed before the new set took its place.
        string tables = dir.File("tables");
        string aside = dir.File(".tables.999999999.0123abcd.old");
        Directory.CreateDirectory(aside);
        File.WriteAllText(Path.Combine(aside, "outages.csv"), "from an earlier screening");
        Assert.Equal(0, SolveDemo("--csv", tables).ExitCode);
        Assert.False(Directory.Exists(aside));
        Assert.Equal("from an earlier screening", File.ReadAllText(Path.Combine(tables, "outages.csv")));
        Assert.True(File.Exists(Path.Combine(tables, "buses.csv")));
    }

    [Theory]
    [InlineData("=HYPERLINK(\"http://x\")", "'=HYPERLINK(\"http://x\")")]
    [InlineData("+A1", "'+A1")]
    [InlineData("-B7", "'-B7")]
    [InlineData("@SUM(A1)", "'@SUM(A1)")]
    [InlineData("-3.75", "-3.75")]
    [InlineData("+2e-3", "+2e-3")]
    [InlineData("-inf", "-inf")]
    [InlineData("WRB33", "WRB33")]
    public void Csv_cells_that_a_spreadsheet_would_run_are_neutralised_and_numbers_keep_their_sign(string cell, string written)
    {
        Assert.Equal(written, CsvTable.Neutralised(cell));
    }

    [Fact]
    public void An_id_that_starts_like_a_formula_reaches_the_csv_neutralised()
    {
        string network = dir.File("net.study.json");
        File.WriteAllText(network, File.ReadAllText(DemoNetworks.Demo).Replace("\"CS11\"", "\"=CS11\""));
        string tables = dir.File("tables");
        Assert.Equal(0, CliRun.Run("solve", network, "--csv", tables).ExitCode);
        string csv = File.ReadAllText(Path.Combine(tables, "buses.csv"));
        Assert.Contains("\r\n'=CS11,", csv);
        Assert.DoesNotContain("\r\n=CS11", csv);
    }
}
