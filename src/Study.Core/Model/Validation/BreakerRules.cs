// Breaker checks: the bus it sits on, the branch it switches there, and the ratings its duty is checked against.
namespace Study.Core.Model.Validation;

internal static class BreakerRules
{
    public static void Check(ValidationContext context, Breaker breaker)
    {
        ElementScope at = context.At(ElementKind.Breaker, breaker.Id);
        at.BusRef("bus", breaker.Bus);
        if (breaker.Branch is not null) BranchRef(at, context.Network, breaker);
        if (!at.AllFinite(("interruptingKa", breaker.InterruptingKa), ("peakKa", breaker.PeakKa), ("dcPercent", breaker.DcPercent),
                ("shortTimeKa", breaker.ShortTimeKa), ("shortTimeS", breaker.ShortTimeS), ("minTripS", breaker.MinTripS))) return;
        at.NotNegative("interruptingKa", breaker.InterruptingKa, "the rated breaking current (kA)");
        at.NotNegative("peakKa", breaker.PeakKa, "the rated making (peak) current (kA)");
        if (breaker.InterruptingKa == 0 && breaker.PeakKa == 0 && breaker.ShortTimeKa is null)
            at.Warning("interruptingKa", "no rating: duty not checked (give interruptingKa and peakKa in kA)");
        // The making current is the peak of the first loop, about 2.5 times the rms breaking current (IEC 62271-100).
        if (breaker.PeakKa > 0 && breaker.InterruptingKa > breaker.PeakKa)
            at.Warning("peakKa", $"peakKa {Numbers.Show(breaker.PeakKa)} kA is below interruptingKa " +
                $"{Numbers.Show(breaker.InterruptingKa)} kA: a making (peak) rating is about 2.5 times the breaking rating; are they swapped?");
        if (breaker.DcPercent is double dc && (dc < 0 || dc > 100))
            at.Error("dcPercent", $"dcPercent is {Numbers.Show(dc)}: the rated DC component is a percentage from 0 to 100 (30 to 45 is usual)");
        if (breaker.DcPercent is not null && breaker.InterruptingKa == 0)
            at.Warning("dcPercent", "dcPercent is not used without interruptingKa: the asymmetric breaking rating is built on the symmetrical one");
        at.Positive("shortTimeKa", breaker.ShortTimeKa, "the rated short-time current (kA)");
        at.Positive("shortTimeS", breaker.ShortTimeS, "the rated short-time duration (s)");
        if (breaker.ShortTimeS is not null && breaker.ShortTimeKa is null)
            at.Warning("shortTimeS", "shortTimeS is not used without shortTimeKa");
        at.Positive("minTripS", breaker.MinTripS, "the minimum time to contact separation (s)");
        if (breaker.MinTripS is double t && t > 5)
            at.Warning("minTripS", $"minTripS {Numbers.Show(t)} s is long for relay plus opening time: seconds, not milliseconds?");
    }

    /// <summary>The branch must be a line or transformer with an end at the breaker's bus.</summary>
    private static void BranchRef(ElementScope at, Network n, Breaker b)
    {
        string id = b.Branch!;
        IEnumerable<string?>? ends =
            ValidationContext.Items(n.Lines).FirstOrDefault(l => l?.Id == id) is { } line ? [line.From, line.To]
            : ValidationContext.Items(n.Transformers).FirstOrDefault(t => t?.Id == id) is { } t2 ? [t2.Hv, t2.Lv]
            : ValidationContext.Items(n.ThreeWindingTransformers).FirstOrDefault(t => t?.Id == id) is { } t3 ? [t3.Hv, t3.Mv, t3.Lv]
            : null;
        if (ends is null)
        {
            var known = ValidationContext.Items(n.Lines).Select(l => l?.Id).Concat(ValidationContext.Items(n.Transformers).Select(t => t?.Id))
                .Concat(ValidationContext.Items(n.ThreeWindingTransformers).Select(t => t?.Id)).OfType<string>();
            string? near = IdSuggestion.Closest(id, known);
            at.Error("branch", $"branch names '{id}', which is not a line or transformer of the network{(near is null ? "" : $": did you mean '{near}'?")}");
        }
        else if (!ends.Contains(b.Bus))
            at.Error("branch", $"branch {id} does not end at bus {b.Bus}: a breaker switches a branch at the bus it sits on");
    }
}
