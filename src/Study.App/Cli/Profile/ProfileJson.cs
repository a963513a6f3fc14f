// The --json shape of `study profile` (README, "Results as JSON").
using Study.Core.Studies;

namespace Study.App.Cli.Profile;

public sealed record ProfileBusJson(string Id, double VMinPu, double VMaxPu, double HoursOutside);

public sealed record ProfileTransformerJson(string Id, bool OnLoad, int TapOperations, IReadOnlyList<int> PositionsUsed,
    double? PeakPctOfRating, double LossMwh, double LoadLossMwh, double NoLoadLossMwh);

public sealed record ProfileEnergyJson(double DeliveredMwh, double GeneratedMwh, double ConsumedMwh, double LossMwh,
    double LoadLossMwh, double NoLoadLossMwh);

/// <summary>
/// <c>steps</c> is the count of steps; <c>stepsNotConverged</c> those whose load flow failed (they count in no statistic).
/// </summary>
public sealed record ProfileJson(string? Scenario, int Steps, double Hours, int StepsNotConverged,
    IReadOnlyList<ProfileBusJson> Buses, IReadOnlyList<ProfileTransformerJson> Transformers, ProfileEnergyJson Energy)
{
    public static ProfileJson From(ProfileResult r) => new(r.Scenario, r.Steps, r.Hours, r.StepsNotConverged,
        r.Buses.Select(b => new ProfileBusJson(b.Id, b.VMinPu, b.VMaxPu, b.HoursOutside)).ToList(),
        r.Transformers.Select(t => new ProfileTransformerJson(t.Id, t.OnLoad, t.TapOperations, t.PositionsUsed, t.PeakPctOfRating,
            t.LossMwh, t.LoadLossMwh, t.NoLoadLossMwh)).ToList(),
        new ProfileEnergyJson(r.Energy.DeliveredMwh, r.Energy.GeneratedMwh, r.Energy.ConsumedMwh, r.Energy.LossMwh,
            r.Energy.LoadLossMwh, r.Energy.NoLoadLossMwh));
}
