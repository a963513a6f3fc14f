// Breaker duty: the largest fault current and peak a breaker's bus sees, against its ratings.
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// Duty = max(I''k / interruptingKa, i_p / peakKa) over the fault types studied at the breaker's bus
/// (a planning screen in the spirit of IEC 62271-100 rated breaking and making currents; the
/// breaking duty here uses I''k, which is conservative against the decayed breaking current I_b).
/// Warned above 90 %, flagged above 100 % (DEVELOPERS.md, Algorithms).
/// </summary>
public static class BreakerDutyCheck
{
    public const double WarningPercent = 90;
    public const double OverPercent = 100;

    public static IReadOnlyList<BreakerDuty> Evaluate(IReadOnlyList<PuBreaker> breakers, IReadOnlyList<ShortCircuitLevel> faults)
    {
        var worst = new Dictionary<string, (ShortCircuitLevel Ik, double IpPu)>();
        foreach (ShortCircuitLevel f in faults)
        {
            if (!worst.TryGetValue(f.Bus, out var w)) worst[f.Bus] = (f, f.IpPu);
            else worst[f.Bus] = (f.IkPu > w.Ik.IkPu ? f : w.Ik, Math.Max(w.IpPu, f.IpPu));
        }
        var duties = new List<BreakerDuty>();
        foreach (PuBreaker breaker in breakers)
        {
            if (!worst.TryGetValue(breaker.BusId, out var w)) continue;
            ShortCircuitLevel f = w.Ik;
            double? ipKa = f.Kv > 0 ? w.IpPu * (f.IpKa / f.IpPu ?? 0) : null;
            if (f.IpPu == 0) ipKa = f.Kv > 0 ? 0 : null;
            var duty = new BreakerDuty
            {
                Id = breaker.Id, Bus = breaker.BusId, IkKa = f.IkKa, IpKa = ipKa, GoverningKind = f.Kind,
                InterruptingKa = breaker.InterruptingKa > 0 ? breaker.InterruptingKa : null,
                PeakKa = breaker.PeakKa > 0 ? breaker.PeakKa : null,
            };
            if (duty.InterruptingKa is null && duty.PeakKa is null)
            {
                duties.Add(duty with { Status = DutyStatus.NoRating });
                continue;
            }
            if (f.IkKa is not double ik || ipKa is not double ip)
            {
                duties.Add(duty with { Status = DutyStatus.KvNotStated });
                continue;
            }
            double? breaking = duty.InterruptingKa is double ib ? 100 * ik / ib : null;
            double? making = duty.PeakKa is double pk ? 100 * ip / pk : null;
            double percent = Math.Max(breaking ?? 0, making ?? 0);
            duties.Add(duty with
            {
                BreakingPercent = breaking, MakingPercent = making, DutyPercent = percent,
                Status = percent > OverPercent ? DutyStatus.Over : percent > WarningPercent ? DutyStatus.Warning : DutyStatus.Ok,
            });
        }
        return duties;
    }
}
