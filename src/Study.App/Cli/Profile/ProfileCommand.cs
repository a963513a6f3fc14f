// `study profile FILE --profile CSV`: a load flow per time step with on-load taps acting between steps; energy, operations, hours out of band.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Cli.Profile;

public sealed class ProfileCommand : CliCommand
{
    public override string Name => "profile";
    public override string Summary => "a load flow at every step of a load profile: energy lost (load and no-load), tap operations, hours out of band";

    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Value("profile", "CSV", "the profile: a time column (ISO 8601) and a 'scale' column or one column per load id (required)")
        .Value("step-minutes", "M", "the length of every step, minutes (default: the spacing of the time column)")
        .Value("scenario", "NAME", "the scenario whose loads the profile scales (default: loads as entered)")
        .Many("watch", "BUS", "buses whose voltage is kept at every step for steps.csv (default: the buses on-load changers regulate)")
        .Flag("json", "machine-readable result")
        .Value("csv", "DIR", "write buses.csv, transformers.csv, energy.csv and steps.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        string profilePath = args.Value("profile") ?? throw new UsageException("--profile CSV is required");
        var request = new ProfileRequest { Scenario = args.Value("scenario"), WatchBuses = args.Values("watch") };
        request.Validate();
        LoadProfile profile = ProfileFile.Read(profilePath, args.Number("step-minutes"));

        StudyCase study = NetworkLoading.Open(path, context.Err);
        ProfileResult result;
        using (TerminalProgress? progress = TerminalProgress.ForStandardError(context.Err, "steps", profile.Steps.Count))
            result = study.Profile(request, profile, progress);

        ReportDocument report = ProfileReport.Build(path, study.Network, profilePath, result, request.Options);
        if (args.Value("csv") is string dir) ProfileCsv.Write(result, dir);
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json")) CliJson.Write(context, ProfileJson.From(result));
        else context.Out.Write(PlainTextReport.Render(report));
        if (result.StepsNotConverged == 0) return ExitCode.Done;
        context.Err.WriteLine($"error: {path}: {result.StepsNotConverged} of {result.Steps} steps did not converge; the first: {result.FirstFailure}");
        return ExitCode.NoConvergence;
    }
}

/// <summary>`--csv DIR` for the profile: one table per file.</summary>
public static class ProfileCsv
{
    public static void Write(ProfileResult r, string dir) => CsvTable.WriteSet(dir,
        ("buses.csv", CsvTable.Of(ProfileColumns.Buses, r.Buses)),
        ("transformers.csv", CsvTable.Of(ProfileColumns.Transformers, r.Transformers)),
        ("energy.csv", CsvTable.Of(ProfileColumns.Energy, ProfileColumns.EnergyRows(r.Energy))),
        ("steps.csv", CsvTable.Of(ProfileColumns.Steps(r.Series), ProfileColumns.StepRows(r.Series))));
}
