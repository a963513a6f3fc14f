// How serious an outage is, in the words of its severity tier, so that a ranking reads without colour.
using Study.Core.Studies;

namespace Study.App.Reports;

/// <summary>The tiers of <see cref="OutageSeverity"/>, worst last.</summary>
public enum OutageTier { Secure, Stressed, LoadLost, NoConvergence }

public static class OutageTiers
{
    public static OutageTier Of(OutageCase c) =>
        !c.Converged || c.Severity >= OutageSeverity.NoConvergence ? OutageTier.NoConvergence
        : c.Severity >= OutageSeverity.LostLoadBase ? OutageTier.LoadLost
        : c.Severity > 0 ? OutageTier.Stressed
        : OutageTier.Secure;

    public static string Words(OutageTier t) => t switch
    {
        OutageTier.NoConvergence => "NO CONV",
        OutageTier.LoadLost => "LOAD LOST",
        OutageTier.Stressed => "stressed",
        _ => "secure",
    };
}
