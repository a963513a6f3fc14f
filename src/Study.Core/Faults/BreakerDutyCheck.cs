// Breaker duty: for each check, the largest current a breaker must stand over the fault types studied, against its rating.
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// Four checks per breaker (a planning screen in IEC 62271-100 terms; the currents from IEC 60909-0):
/// breaking, I_b at the breaker's t_min against interruptingKa; breaking asymmetric, √(I_b² + i_DC²) against
/// interruptingKa·√(1 + 2·(dcPercent/100)²), the DC percentage 100·i_DC/(√2·I_b) shown beside the rated one;
/// making, i_p against peakKa; short-time, I_th·√(T_k/shortTimeS) when T_k ≥ shortTimeS, else I_th, against
/// shortTimeKa (a rating I_thr for T_kr covers I_th for T_k when I_th ≤ I_thr·√(T_kr/T_k): common
/// practice). Each check takes the largest current over the fault types and, for a breaker on a branch,
/// over its two sides. Warned above 90 %, flagged above 100 % (DEVELOPERS.md, Algorithms).
/// </summary>
public static class BreakerDutyCheck
{
    public const double WarningPercent = 90;
    public const double OverPercent = 100;

    public static IReadOnlyList<BreakerDuty> Evaluate(IReadOnlyList<PuBreaker> breakers, IReadOnlyList<ShortCircuitLevel> faults, double durationS,
        double baseMva)
    {
        var byBus = faults.GroupBy(f => f.Bus).ToDictionary(g => g.Key, g => g.ToList());
        var duties = new List<BreakerDuty>();
        foreach (PuBreaker breaker in breakers)
        {
            if (!byBus.TryGetValue(breaker.BusId, out var atBus)) continue;
            var rows = new List<(ShortCircuitLevel Fault, SideCurrents Side)>();
            double tMin = 0;
            foreach (ShortCircuitLevel f in atBus)
                foreach (BreakerCurrents c in f.BreakerCurrents)
                    if (c.Breaker == breaker.Id)
                    {
                        tMin = c.TMinS;
                        foreach (SideCurrents s in c.Sides) rows.Add((f, s));
                    }
            if (rows.Count == 0) continue;
            double kv = atBus[0].Kv;
            double? baseKa = kv > 0 ? baseMva / (Math.Sqrt(3) * kv) : null;

            var ik = rows.MaxBy(r => r.Side.IkPu);
            var ip = rows.MaxBy(r => r.Side.IpPu);
            double? interrupting = breaker.InterruptingKa > 0 ? breaker.InterruptingKa : null;
            double? peak = breaker.PeakKa > 0 ? breaker.PeakKa : null;
            double? dc = breaker.DcPercent;
            double? asymRated = interrupting is double i && dc is double d ? i * Math.Sqrt(1 + 2 * Math.Pow(d / 100, 2)) : null;
            double refer = durationS >= breaker.ShortTimeS ? Math.Sqrt(durationS / breaker.ShortTimeS) : 1.0;

            var asym = rows.MaxBy(r => r.Side.IbAsymPu);
            double? dcNow = asym.Side.IbPu > 0 ? 100 * asym.Side.IdcPu / (Math.Sqrt(2) * asym.Side.IbPu) : null;
            DutyCheck[] checks =
            [
                Check(DutyCheckKind.Breaking, rows.MaxBy(r => r.Side.IbPu), r => r.IbPu, interrupting, baseKa),
                Check(DutyCheckKind.BreakingAsym, asym, r => r.IbAsymPu, asymRated, baseKa) with { DcPercent = dcNow, RatedDcPercent = dc },
                Check(DutyCheckKind.Making, ip, r => r.IpPu, peak, baseKa),
                Check(DutyCheckKind.ShortTime, rows.MaxBy(r => r.Side.IthPu), r => r.IthPu * refer, breaker.ShortTimeKa, baseKa),
            ];
            var rated = checks.Where(c => c.DutyPercent is not null).ToList();
            double? worst = rated.Count > 0 ? rated.Max(c => c.DutyPercent) : null;
            DutyStatus status = checks.All(c => c.Status == DutyStatus.NoRating) ? DutyStatus.NoRating
                : baseKa is null ? DutyStatus.KvNotStated
                : StatusOf(worst ?? 0);
            duties.Add(new BreakerDuty
            {
                Id = breaker.Id, Bus = breaker.BusId, Branch = breaker.BranchId, TMinS = tMin,
                IkKa = ik.Side.IkPu * baseKa, IpKa = ip.Side.IpPu * baseKa, GoverningKind = ik.Fault.Kind,
                InterruptingKa = interrupting, PeakKa = peak,
                BreakingPercent = checks[0].DutyPercent, MakingPercent = checks[2].DutyPercent,
                DutyPercent = worst, Status = status, Checks = checks,
            });
        }
        return duties;
    }

    private static DutyCheck Check(DutyCheckKind kind, (ShortCircuitLevel Fault, SideCurrents Side) row, Func<SideCurrents, double> required,
        double? ratedKa, double? baseKa)
    {
        double? requiredKa = required(row.Side) * baseKa;
        var check = new DutyCheck { Check = kind, Kind = row.Fault.Kind, Side = row.Side.Side, RequiredKa = requiredKa, RatedKa = ratedKa };
        if (ratedKa is not double r) return check with { Status = DutyStatus.NoRating };
        if (requiredKa is not double q) return check with { Status = DutyStatus.KvNotStated };
        double percent = 100 * q / r;
        return check with { DutyPercent = percent, Status = StatusOf(percent) };
    }

    private static DutyStatus StatusOf(double percent) =>
        percent > OverPercent ? DutyStatus.Over : percent > WarningPercent ? DutyStatus.Warning : DutyStatus.Ok;
}
