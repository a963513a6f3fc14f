// Which constraint binds each candidate bank: the one it fails, or for a bank that meets all, its tightest margin.
using Study.Core.Cases;

namespace Study.App.Reports;

/// <summary>The constraints of a bank choice, each with the candidates column that shows it (null: no column).</summary>
public enum BankConstraint { VoltageBand, Loading, BreakerDuty, Outage, Other }

/// <summary>A candidate's binding constraint: failed or tightest, and the column to mark.</summary>
public sealed record Binding(BankConstraint Constraint, bool Fails, string? ColumnKey)
{
    public string Words => (Fails ? "FAILS " : "tightest ") + ChooseBinding.Name(Constraint);
}

/// <summary>
/// A failing bank's first reason names what it fails (the engine's own wording: "no tap position holds",
/// "loaded … % of its", "… duty …", "with … out"). A bank that meets every constraint is bound by the one
/// with the least headroom as a share of its limit: the voltage margin over half the band width (the
/// band asked for, else the usual ±5 %), and the breaker duty and N-1 loading below 100 % (a duty already
/// over with the existing bank is the network's limit, stated in the notes, and does not bind the choice).
/// </summary>
public static class ChooseBinding
{
    public static string Name(BankConstraint c) => c switch
    {
        BankConstraint.VoltageBand => "voltage band",
        BankConstraint.Loading => "bank loading",
        BankConstraint.BreakerDuty => "breaker duty",
        BankConstraint.Outage => "N-1 outage",
        _ => "other",
    };

    public static Binding Of(CandidateAssessment c, BankChoiceResult r)
    {
        if (!c.Feasible) return Failed(c.Reasons[0]);
        double halfBand = r.Band is { } b ? (b.High - b.Low) / 2 : 0.05;
        var shares = new List<(double Share, BankConstraint Constraint, string Key)>();
        if (c.MarginPu is double m) shares.Add((m / halfBand, BankConstraint.VoltageBand, "marginPu"));
        if (c.MaxDutyPercent is double d && d <= 100) shares.Add(((100 - d) / 100, BankConstraint.BreakerDuty, "maxDutyPercent"));
        if (c.N1WorstPct is double n && n <= 100) shares.Add(((100 - n) / 100, BankConstraint.Outage, "n1WorstPct"));
        if (shares.Count == 0) return new Binding(BankConstraint.Other, false, null);
        var tightest = shares.MinBy(s => s.Share);
        return new Binding(tightest.Constraint, false, tightest.Key);
    }

    private static Binding Failed(string reason)
    {
        if (reason.Contains("tap position", StringComparison.Ordinal)) return new Binding(BankConstraint.VoltageBand, true, "marginPu");
        if (reason.StartsWith("with ", StringComparison.Ordinal) && reason.Contains(" out ", StringComparison.Ordinal))
            return new Binding(BankConstraint.Outage, true, "n1WorstPct");
        if (reason.Contains(" duty ", StringComparison.Ordinal)) return new Binding(BankConstraint.BreakerDuty, true, "maxDutyPercent");
        if (reason.Contains("% of its", StringComparison.Ordinal)) return new Binding(BankConstraint.Loading, true, null);
        return new Binding(BankConstraint.Other, true, null);
    }
}
