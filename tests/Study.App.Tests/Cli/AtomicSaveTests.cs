// Saving never loses work: a failure between writing the temporary file and the rename leaves the old file whole.
using Study.App.Reports;
using Study.App.Cli.Solve;
using Study.Core.Io;
using Study.Core.Numerics;

namespace Study.App.Tests.Cli;

public sealed class AtomicSaveTests : IDisposable
{
    private const string OldText = "the previous contents\n";
    private readonly string dir = Directory.CreateTempSubdirectory("study-atomic-").FullName;

    public void Dispose()
    {
        AtomicFile.BeforeRename = null;
        Directory.Delete(dir, recursive: true);
    }

    public static TheoryData<string> Writers => ["network file", "csv table", "matrix market"];

    [Theory]
    [MemberData(nameof(Writers))]
    public void A_crash_before_the_rename_leaves_the_old_file_intact_and_no_temporary_file(string writer)
    {
        string path = Path.Combine(dir, "saved.out");
        File.WriteAllText(path, OldText);
        string? temporary = null;
        AtomicFile.BeforeRename = temp =>
        {
            temporary = temp;
            // The new contents are complete on disk before the rename is attempted.
            Assert.True(new FileInfo(temp).Length > 0);
            throw new IOException("simulated crash between write and rename");
        };

        // The failure surfaces as an input error, "cannot write PATH: reason" (exit 2 at the command line).
        var e = Assert.Throws<Study.Core.Model.InputException>(() => Write(writer, path));
        Assert.Equal($"cannot write {path}: simulated crash between write and rename", e.Message);

        Assert.NotNull(temporary);
        Assert.Equal(dir, Path.GetDirectoryName(temporary));
        Assert.Equal(OldText, File.ReadAllText(path));
        Assert.Equal(new[] { "saved.out" }, Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).ToArray());
    }

    [Theory]
    [MemberData(nameof(Writers))]
    public void Without_a_crash_the_new_contents_replace_the_old_and_no_temporary_file_is_left(string writer)
    {
        string path = Path.Combine(dir, "saved.out");
        File.WriteAllText(path, OldText);

        Write(writer, path);

        Assert.NotEqual(OldText, File.ReadAllText(path));
        Assert.Equal(new[] { "saved.out" }, Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).ToArray());
    }

    [Fact]
    public void A_saved_network_reads_back_as_the_network_that_was_saved()
    {
        string path = Path.Combine(dir, "demo.study.json");
        NetworkFile.Write(Demo, path);
        Assert.Equal(NetworkFile.ToJson(Demo), NetworkFile.ToJson(NetworkFile.Read(path)));
    }

    private static Study.Core.Model.Network Demo => NetworkFile.Read(DemoNetworks.Demo);

    private static void Write(string writer, string path)
    {
        switch (writer)
        {
            case "network file":
                NetworkFile.Write(Demo, path);
                break;
            case "csv table":
                var spec = new ColumnSpec<(string Bus, double VPu)>().Text("bus", "bus", r => r.Bus).Number("vPu", "V", "pu", r => r.VPu, 4);
                CsvTable.Of(spec, [("B1", 1.02), ("B, \"2\"", 0.97)]).Write(path);
                break;
            default:
                var matrix = new CscMatrix<double>(2, 2, [0, 1, 3], [0, 0, 1], [4.0, 1.0, 3.0]);
                MatrixMarket.Write(matrix, path, "2 by 2");
                break;
        }
    }
}
