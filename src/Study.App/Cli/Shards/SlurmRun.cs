// `study outages --slurm N`: the screening as a Slurm job array of N shards, waited for and merged.
using System.ComponentModel;
using System.Diagnostics;
using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Cli.Shards;

/// <summary>What --slurm is asked: the shards, the work folder, and what passes through to sbatch.</summary>
/// <param name="WorkFolder">Where the script, the network copy, the parts and the logs go; null for a new folder under the current one.</param>
/// <param name="Partition">sbatch --partition.</param>
/// <param name="TimeLimit">sbatch --time (minutes, or [D-]HH:MM:SS).</param>
/// <param name="Memory">sbatch --mem (4G, 500M).</param>
/// <param name="CoresPerShard">sbatch --cpus-per-task: the cores each shard solves on.</param>
public sealed record SlurmOptions(int Shards, string? WorkFolder, string? Partition, string? TimeLimit, string? Memory, int? CoresPerShard);

/// <summary>
/// Writes into the work folder a copy of the network, a job script that runs one shard per array task
/// (<c>study outages COPY --shard $SLURM_ARRAY_TASK_ID/N --json</c>, its part written whole when it
/// succeeds), submits it with <c>sbatch --wait --array=1-N</c>, shows how many shards have finished
/// while it waits, then merges the parts (<see cref="OutageParts.Merge"/>). The script can be submitted
/// again by hand; on a real cluster the work folder and the program must be on a file system every
/// node sees (README, "Running on a Slurm cluster").
/// </summary>
public static partial class SlurmRun
{
    public const string Script = "outages.sh";

    /// <exception cref="InputException">
    /// A pass-through value would break the script, the work folder cannot be used, sbatch is missing or
    /// refuses the job, or a shard wrote no part (its log is named).
    /// </exception>
    public static OutageScreeningResult Run(string networkPath, string sha256, OutageScreeningRequest request, SlurmOptions options,
        TextWriter err)
    {
        CheckPassThrough(options);
        string folder = WorkFolder(options.WorkFolder);
        string network = Path.Combine(folder, Path.GetFileName(networkPath));
        AtomicFile.WriteAllBytes(network, File.ReadAllBytes(networkPath));
        string script = Path.Combine(folder, Script);
        AtomicFile.WriteAllText(script, JobScript(folder, network, request, options));
        if (!OperatingSystem.IsWindows()) File.SetUnixFileMode(script, File.GetUnixFileMode(script) | UnixFileMode.UserExecute);
        err.WriteLine($"slurm: {options.Shards} shards of {networkPath}, work folder {folder}");

        string[] arguments = ["--wait", "--parsable", $"--array=1-{options.Shards}", $"--output={Path.Combine(folder, "log-%a.txt")}", script];
        (int exit, string said) = Submit(arguments, folder, options.Shards, err);
        var missing = Enumerable.Range(1, options.Shards).Where(k => !File.Exists(PartFile(folder, k))).ToList();
        if (missing.Count > 0)
            throw new InputException(
                $"{missing.Count} of {options.Shards} shards wrote no part (sbatch ended with exit code {exit}{(said.Length > 0 ? ": " + said : "")})"
                + string.Concat(missing.Take(5).Select(k => $"\n  shard {k}/{options.Shards}: {LogTail(folder, k)}")), folder);
        var (result, header) = OutageParts.Merge(Enumerable.Range(1, options.Shards).Select(k => PartFile(folder, k)).ToList());
        if (header.NetworkSha256 != sha256)
            throw new InputException($"the shards read a network other than {networkPath}: it changed while the job ran", folder);
        return result;
    }

    public static string PartFile(string folder, int shard) => Path.Combine(folder, $"part-{shard}.json");

    /// <summary>The job script: one shard per array task, its part moved into place only when it is whole.</summary>
    public static string JobScript(string folder, string network, OutageScreeningRequest request, SlurmOptions options)
    {
        int n = options.Shards;
        var command = new List<string>(StudyProgram.Invocation()) { "outages", network };
        foreach (string? scenario in request.Scenarios) command.AddRange(["--scenario", scenario ?? ""]);
        if (request.ElementIds.Count > 0)
        {
            command.Add("--elements");
            command.AddRange(request.ElementIds);
        }
        var s = new StringBuilder();
        s.Append("#!/bin/sh\n");
        s.Append($"# Outage screening of {Path.GetFileName(network)} in {n} shards, one Slurm array task per shard,\n");
        s.Append("# written by 'study outages --slurm'. To run it again by hand:\n");
        s.Append($"#   sbatch --array=1-{n} --output={Quote(Path.Combine(folder, "log-%a.txt"))} {Quote(Path.Combine(folder, Script))}\n");
        s.Append("# then: study merge ").Append(Quote(folder)).Append("/part-*.json\n");
        s.Append("#SBATCH --job-name=study-outages\n");
        if (options.Partition is string partition) s.Append($"#SBATCH --partition={partition}\n");
        if (options.TimeLimit is string time) s.Append($"#SBATCH --time={time}\n");
        if (options.Memory is string memory) s.Append($"#SBATCH --mem={memory}\n");
        if (options.CoresPerShard is int cores) s.Append($"#SBATCH --cpus-per-task={cores.ToString(CultureInfo.InvariantCulture)}\n");
        s.Append("set -u\n");
        s.Append($"k=\"${{SLURM_ARRAY_TASK_ID:?run this script as a Slurm job array: sbatch --array=1-{n}}}\"\n");
        s.Append($"part={Quote(folder)}/part-\"$k\".json\n");
        s.Append(string.Join(' ', command.Select(Quote))).Append($" --shard \"$k/{n}\" --json > \"$part.partial\"\n");
        s.Append("code=$?\n");
        s.Append("# 0: done; 3: an intact case did not converge, which the part records and the merge reports.\n");
        s.Append("if [ \"$code\" -eq 0 ] || [ \"$code\" -eq 3 ]; then mv \"$part.partial\" \"$part\"; exit 0; fi\n");
        s.Append("exit \"$code\"\n");
        return s.ToString();
    }

    /// <summary>A word for the shell: single-quoted unless it is plain.</summary>
    public static string Quote(string word) =>
        word.Length > 0 && PlainWord().IsMatch(word) ? word : "'" + word.Replace("'", "'\\''", StringComparison.Ordinal) + "'";

    [GeneratedRegex(@"^[A-Za-z0-9_./:=@%+-]+$")]
    private static partial Regex PlainWord();

    [GeneratedRegex(@"^[A-Za-z0-9_.:+-]+$")]
    private static partial Regex PassThroughValue();

    private static void CheckPassThrough(SlurmOptions options)
    {
        foreach (var (name, value) in new[] { ("partition", options.Partition), ("time-limit", options.TimeLimit), ("memory", options.Memory) })
        {
            if (value is not null && !PassThroughValue().IsMatch(value))
                throw new InputException($"--{name} '{value}' is not a value sbatch takes (letters, digits and . : + - only)");
        }
        if (options.CoresPerShard is < 1) throw new InputException($"--cores-per-shard must be at least 1 (got {options.CoresPerShard})");
    }

    // The given folder (created, and refused when it already holds files), or a new one under the current folder.
    private static string WorkFolder(string? given)
    {
        if (given is not null)
        {
            string full = Path.GetFullPath(given);
            if (File.Exists(full)) throw new InputException("the work folder is a file", given);
            if (Directory.Exists(full) && Directory.EnumerateFileSystemEntries(full).Any())
                throw new InputException("the work folder is not empty: give a new or empty folder, so no part of an earlier run is merged", given);
            Directory.CreateDirectory(full);
            return full;
        }
        string stem = Path.Combine(Directory.GetCurrentDirectory(), "study-outages-" + DateTime.Now.ToString("yyyyMMdd-HHmmss", CultureInfo.InvariantCulture));
        for (int k = 1; ; k++)
        {
            string candidate = k == 1 ? stem : $"{stem}-{k}";
            if (Directory.Exists(candidate) || File.Exists(candidate)) continue;
            Directory.CreateDirectory(candidate);
            return candidate;
        }
    }

    // Runs sbatch --wait, showing how many parts are in while it waits; returns its exit code and what it said on stderr.
    private static (int Exit, string Said) Submit(string[] arguments, string folder, int shards, TextWriter err)
    {
        var start = new ProcessStartInfo("sbatch") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in arguments) start.ArgumentList.Add(a);
        Process process;
        try
        {
            process = Process.Start(start) ?? throw new InputException("sbatch could not be started");
        }
        catch (Win32Exception)
        {
            throw new InputException("sbatch was not found: --slurm needs Slurm's sbatch on PATH (README, \"Running on a Slurm cluster\")");
        }
        using (process)
        {
            var said = new StringBuilder();
            process.ErrorDataReceived += (_, e) => { if (e.Data is not null) lock (said) said.AppendLine(e.Data); };
            process.OutputDataReceived += (_, e) =>
            {
                if (e.Data is { Length: > 0 } id) err.WriteLine($"slurm: submitted job {id.Split(';')[0]}; waiting for its {shards} shards");
            };
            process.BeginErrorReadLine();
            process.BeginOutputReadLine();
            using (TerminalProgress? progress = TerminalProgress.ForStandardError(err, "shards", shards))
            {
                while (!process.WaitForExit(1000))
                    progress?.Report(Enumerable.Range(1, shards).Count(k => File.Exists(PartFile(folder, k))) / (double)shards);
            }
            process.WaitForExit();
            lock (said) return (process.ExitCode, said.ToString().Trim().Replace('\n', ' '));
        }
    }

    // The last lines of a shard's log, or where it should have been.
    private static string LogTail(string folder, int shard)
    {
        string log = Path.Combine(folder, $"log-{shard}.txt");
        if (!File.Exists(log)) return $"no log at {log} (the task did not start)";
        var lines = File.ReadAllLines(log).Where(l => l.Trim().Length > 0).TakeLast(3).ToList();
        return lines.Count == 0 ? $"{log} is empty" : $"{log}: " + string.Join(" / ", lines);
    }
}
