// How the driving voltage and the passive network of a fault calculation are chosen.
namespace Study.Core.Faults;

/// <summary>How the pre-fault voltage is taken: IEC 60909's equivalent voltage source, or the solved load flow.</summary>
public enum FaultMethod
{
    /// <summary>
    /// Equivalent voltage source c·U_n/√3 at the fault; loads, shunts, line charging and magnetising
    /// neglected; correction factors K_T and K_G (IEC 60909-0:2016, from memory).
    /// </summary>
    Iec60909,
    /// <summary>
    /// Superposition on a solved load flow: the pre-fault voltage at the fault drives the fault, loads
    /// become constant impedances at their solved voltages, no c factor and no corrections.
    /// </summary>
    LoadFlow,
}

/// <summary>Short names used on the command line and in results.</summary>
public static class FaultMethodNames
{
    public static string Code(this FaultMethod method) => method == FaultMethod.Iec60909 ? "iec60909" : "loadflow";
}
