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
    }

    private static void Finite(ValidationContext context, string field, double value)
    {
        if (!double.IsFinite(value))
            context.Add(Severity.Error, null, null, field, $"{field} is {Numbers.Show(value)}: give a finite number");
    }
}
