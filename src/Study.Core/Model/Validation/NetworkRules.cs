// Checks on the network's own header values (system base and frequency).
namespace Study.Core.Model.Validation;

internal static class NetworkRules
{
    public static void Check(ValidationContext context)
    {
        Network network = context.Network;
        Finite(context, "baseMva", network.BaseMva);
        Finite(context, "frequencyHz", network.FrequencyHz);
        if (double.IsFinite(network.BaseMva) && network.BaseMva <= 0)
            context.Add(Severity.Error, null, null, "baseMva",
                $"baseMva is {Numbers.Show(network.BaseMva)}: the system base must be above 0 MVA (100 is usual)");
        if (double.IsFinite(network.FrequencyHz) && network.FrequencyHz <= 0)
            context.Add(Severity.Error, null, null, "frequencyHz",
                $"frequencyHz is {Numbers.Show(network.FrequencyHz)}: give the system frequency, 50 or 60 Hz");
        else if (double.IsFinite(network.FrequencyHz) && (network.FrequencyHz < 15 || network.FrequencyHz > 500))
            context.Add(Severity.Warning, null, null, "frequencyHz",
                $"frequencyHz {Numbers.Show(network.FrequencyHz)} is not a power frequency (50 or 60 Hz; 16.7 to 400 Hz at the extremes): check the value and its unit");
        if (double.IsFinite(network.BaseMva) && network.BaseMva > Plausibility.HighestBaseMva)
            context.Add(Severity.Error, null, null, "baseMva", BaseTooLarge(network.BaseMva));
        if (ValidationContext.Items(network.Buses).Count == 0)
            context.Add(Severity.Error, null, null, "buses",
                "the network has no buses: list them under \"buses\" (a file holding only {} is not a network)");
    }

    /// <summary>
    /// Every per-unit quantity scales with the base, and the convergence tolerance is in per unit: a base
    /// typed in VA (1e8 for 100 MVA) makes 1e-8 pu a whole MW and the impedances a million times too large,
    /// so the load flow "converges" to an answer that does not balance. Refused, with the base it likely means.
    /// </summary>
    private static string BaseTooLarge(double baseMva)
    {
        (string unit, double meant) = baseMva >= 1e5 ? ("VA", baseMva / 1e6) : ("kVA", baseMva / 1e3);
        return $"baseMva {Numbers.Show(baseMva)} is far above any system base (1 to {Numbers.Show(Plausibility.HighestBaseMva)} MVA; " +
            $"100 is usual): it looks like {unit}, not MVA — did you mean {Numbers.Show(meant)}?";
    }

    private static void Finite(ValidationContext context, string field, double value)
    {
        if (!double.IsFinite(value))
            context.Add(Severity.Error, null, null, field, $"{field} is {Numbers.Show(value)}: give a finite number");
    }
}
