// Which constraint binds each candidate bank: the one it fails, or for a bank that meets all, its tightest margin.
using Study.Core.Cases;

namespace Study.App.Reports;

/// <summary>A candidate's binding constraint (null: none could be measured), failed or tightest, and the candidates column that shows it (null: no column).</summary>
public sealed record Binding(BankConstraint? Constraint, bool Fails, string? ColumnKey)
{
    public string Words => (Fails ? "FAILS " : "tightest ") + ChooseBinding.Name(Constraint);
}

/// <summary>
/// A failing bank is bound by the constraint of its first reason. A bank that meets every constraint is bound by the one
/// with the least headroom as a share of its limit: the voltage margin over half the band width (the
/// band asked for, else the usual ±5 %), and the breaker duty and N-1 loading below 100 % (a duty already
/// over with the existing bank is the network's limit, stated in the notes, and does not bind the choice).
/// </summary>
public static class ChooseBinding
{
    public static string Name(BankConstraint? c) => c switch
    {
        BankConstraint.CandidateData => "candidate data",
        BankConstraint.VoltageBand => "voltage band",
        BankConstraint.Loading => "bank loading",
        BankConstraint.BreakerDuty => "breaker duty",
        BankConstraint.Outage => "N-1 outage",
        _ => "none measured",
    };

    public static Binding Of(CandidateAssessment c, BankChoiceResult r)
    {
        if (!c.Feasible) return new Binding(c.Reasons[0].Constraint, true, ColumnOf(c.Reasons[0].Constraint));
        double halfBand = r.Band is { } b ? (b.High - b.Low) / 2 : 0.05;
        var shares = new List<(double Share, BankConstraint Constraint, string Key)>();
        if (c.MarginPu is double m) shares.Add((m / halfBand, BankConstraint.VoltageBand, "marginPu"));
        if (c.MaxDutyPercent is double d && d <= 100) shares.Add(((100 - d) / 100, BankConstraint.BreakerDuty, "maxDutyPercent"));
        if (c.N1WorstPct is double n && n <= 100) shares.Add(((100 - n) / 100, BankConstraint.Outage, "n1WorstPct"));
        if (shares.Count == 0) return new Binding(null, false, null);
        var tightest = shares.MinBy(s => s.Share);
        return new Binding(tightest.Constraint, false, tightest.Key);
    }

    private static string? ColumnOf(BankConstraint c) => c switch
    {
        BankConstraint.VoltageBand => "marginPu",
        BankConstraint.BreakerDuty => "maxDutyPercent",
        BankConstraint.Outage => "n1WorstPct",
        _ => null,
    };
}
