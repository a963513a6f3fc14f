// A rotating machine near the fault, whose AC contribution decays before the breaker opens.
using System.Numerics;

namespace Study.Core.Faults;

/// <summary>
/// A generator with x''d or a motor as the fault study models it: its bus, its impedance in the network
/// (corrected, in pu on the system base), its rated current in pu of its bus base current and, for an
/// asynchronous machine, its rated power per pole pair (the m of the factor q).
/// </summary>
public sealed record FaultMachine(string Id, bool Asynchronous, int Bus, Complex ZPu, double RatedCurrentPu, double MwPerPolePair);

/// <summary>One machine's partial short-circuit current for one fault, and the share of it that decays by t_min.</summary>
/// <param name="CurrentPu">|I''k_i|, the machine's own current, pu of its bus base current.</param>
/// <param name="DropOverC">ΔU''_i/(c·U_n/√3) = |X''_i·I''k_i|/c: the voltage drop behind the machine's reactance over the source voltage.</param>
/// <param name="RatedRatio">I''k_i/I_r,i, the argument of μ.</param>
public sealed record MachineContribution(string Id, bool Asynchronous, double CurrentPu, double DropOverC, double RatedRatio, double MwPerPolePair)
{
    /// <summary>The part of the fault current this machine loses by <paramref name="tMinS"/>: ΔU''/(c·U_n/√3)·(1 − μ·q)·I''k_i.</summary>
    public double DecayPu(double tMinS)
    {
        double mu = DecayFactors.Mu(tMinS, RatedRatio);
        double q = Asynchronous ? DecayFactors.Q(tMinS, MwPerPolePair) : 1.0;
        return DropOverC * (1 - mu * q) * CurrentPu;
    }
}
