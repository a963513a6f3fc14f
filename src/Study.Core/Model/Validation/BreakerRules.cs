// Breaker checks: the bus it sits on and the ratings its duty is checked against.
namespace Study.Core.Model.Validation;

internal static class BreakerRules
{
    public static void Check(ValidationContext context, Breaker breaker)
    {
        ElementScope at = context.At(ElementKind.Breaker, breaker.Id);
        at.BusRef("bus", breaker.Bus);
        if (!at.AllFinite(("interruptingKa", breaker.InterruptingKa), ("peakKa", breaker.PeakKa))) return;
        at.NotNegative("interruptingKa", breaker.InterruptingKa, "the rated breaking current (kA)");
        at.NotNegative("peakKa", breaker.PeakKa, "the rated making (peak) current (kA)");
        if (breaker.InterruptingKa == 0 && breaker.PeakKa == 0)
            at.Warning("interruptingKa", "no rating: duty not checked (give interruptingKa and peakKa in kA)");
        // The making current is the peak of the first loop, about 2.5 times the rms breaking current (IEC 62271-100).
        if (breaker.PeakKa > 0 && breaker.InterruptingKa > breaker.PeakKa)
            at.Warning("peakKa", $"peakKa {Numbers.Show(breaker.PeakKa)} kA is below interruptingKa " +
                $"{Numbers.Show(breaker.InterruptingKa)} kA: a making (peak) rating is about 2.5 times the breaking rating; are they swapped?");
    }
}
