// `study outages --slurm N`: the job script it writes, and a real run on a local one-node cluster.
using Study.App.Cli.Shards;
using Study.Core.Io;
using Study.Core.Studies;
using Study.Core.Synthetic;
using Xunit.Abstractions;

namespace Study.App.Tests.Cli;

public sealed class SlurmTests(ITestOutputHelper output)
{
    [Fact]
    public void Four_shards_on_a_local_Slurm_cluster_print_exactly_what_one_run_prints()
    {
        using LocalSlurmCluster? cluster = LocalSlurmCluster.Start(out string? whyNot);
        if (cluster is null)
        {
            // CI sets the cluster up and says so: there, a cluster that cannot start is a failure, not a skip.
            Assert.True(Environment.GetEnvironmentVariable("STUDY_REQUIRE_SLURM") != "1", "no Slurm cluster: " + whyNot);
            output.WriteLine("skipped: " + whyNot);
            return;
        }
        output.WriteLine(cluster.Started.Count == 0 ? "reused the cluster that answers sinfo" : "started " + string.Join(", ", cluster.Started));
        using var dir = new TempDirectory();
        string network = dir.File("grid.study.json");
        NetworkFile.Write(SyntheticGrid.Generate(new SyntheticGridOptions { Buses = 150, Seed = 21 }).Network, network);

        CliOutcome whole = CliRun.Run("outages", network, "--json");
        Assert.Equal(0, whole.ExitCode);
        string work = dir.File("work");
        CliOutcome slurm = CliRun.Run("outages", network, "--slurm", "4", "--json", "--work-dir", work);
        output.WriteLine(slurm.Err);
        Assert.True(slurm.ExitCode == 0, slurm.Err);
        Assert.Equal(whole.Out, slurm.Out);
        Assert.True(File.Exists(Path.Combine(work, SlurmRun.Script)));
        Assert.All(Enumerable.Range(1, 4), k => Assert.True(File.Exists(SlurmRun.PartFile(work, k))));

        // The readable report of the Slurm run is the one-machine report too.
        CliOutcome text = CliRun.Run("outages", network, "--slurm", "4", "--work-dir", dir.File("work2"));
        Assert.Equal(0, text.ExitCode);
        Assert.Equal(CliRun.Run("outages", network).Out, text.Out);
    }

    [Fact]
    public void The_job_script_runs_one_shard_per_array_task_with_every_path_quoted_and_passes_the_limits_through()
    {
        string folder = "/shared/o'brien's runs/x";
        var request = new OutageScreeningRequest { Scenarios = ["winter peak"], ElementIds = ["GT1", "L 2"] };
        string script = SlurmRun.JobScript(folder, folder + "/net.study.json", request,
            new SlurmOptions(8, folder, "long", "2-00:00:00", "4G", 2));
        Assert.StartsWith("#!/bin/sh\n", script);
        Assert.Contains("#SBATCH --partition=long\n", script);
        Assert.Contains("#SBATCH --time=2-00:00:00\n", script);
        Assert.Contains("#SBATCH --mem=4G\n", script);
        Assert.Contains("#SBATCH --cpus-per-task=2\n", script);
        Assert.Contains("'/shared/o'\\''brien'\\''s runs/x/net.study.json'", script);
        Assert.Contains("--scenario 'winter peak' --elements GT1 'L 2' --shard \"$k/8\" --json", script);
        Assert.Contains("SLURM_ARRAY_TASK_ID", script);
        Assert.Contains("mv \"$part.partial\" \"$part\"", script);
    }

    [Fact]
    public void A_pass_through_value_that_would_break_the_script_is_refused_before_anything_is_written()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--slurm", "2", "--partition", "debug\n#SBATCH --x", "--work-dir", dir.File("w"));
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--partition", run.Err);
        Assert.False(Directory.Exists(dir.File("w")));
    }
}
