// How serious an outage is, in the words of its severity tier, so that a ranking reads without colour.
using Study.Core.Studies;

namespace Study.App.Reports;

/// <summary>The tiers of <see cref="OutageSeverity"/>, worst last.</summary>
public enum OutageTier { Secure, LimitsBroken, LoadLost, NoConvergence }

public static class OutageTiers
{
    public static OutageTier Of(OutageCase c) =>
        !c.Converged || c.Severity >= OutageSeverity.NoConvergence ? OutageTier.NoConvergence
        : c.Severity >= OutageSeverity.LostLoadBase ? OutageTier.LoadLost
        : c.Severity > 0 ? OutageTier.LimitsBroken
        : OutageTier.Secure;

    /// <summary>What the tier means, in capitals where the outage needs action.</summary>
    public static string Words(OutageTier t) => t switch
    {
        OutageTier.NoConvergence => "NO SOLUTION",
        OutageTier.LoadLost => "LOAD LOST",
        OutageTier.LimitsBroken => "LIMITS BROKEN",
        _ => "secure",
    };

    /// <summary>The severity numbers of a tier (<see cref="OutageSeverity"/>).</summary>
    public static string Range(OutageTier t) => t switch
    {
        OutageTier.NoConvergence => "1000",
        OutageTier.LoadLost => "100–999",
        OutageTier.LimitsBroken => "0.1–99.9",
        _ => "0",
    };

    /// <summary>What each tier's numbers mean, worst first, for a legend under a ranking.</summary>
    public static string Legend =>
        "severity: 1000 NO SOLUTION (the load flow fails with the element out) · 100–999 LOAD LOST (100 + 899 × share of the load lost) · "
        + "0.1–99.9 LIMITS BROKEN (sum of % over rating and % outside the voltage band) · 0 secure";
}
