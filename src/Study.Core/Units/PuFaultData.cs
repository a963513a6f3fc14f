// What fault studies need beyond the load-flow π model, compiled with the model so that no fault
// routine reads the Network: declared supply fault levels, rated data behind the correction factors,
// vector groups and neutral earthing, and the breakers.
using System.Numerics;
using Study.Core.Model;

namespace Study.Core.Units;

/// <summary>How a star point (generator or transformer winding) is earthed, in per unit of its terminal bus base.</summary>
public sealed record PuNeutral
{
    /// <summary>No earthing data was given: fault studies take the star point as solidly earthed and say so.</summary>
    public static PuNeutral NotStated { get; } = new() { Stated = false, Earthed = true };

    /// <summary>False when the file gives no earthing data for this star point.</summary>
    public bool Stated { get; init; } = true;

    /// <summary>True when the star point is connected to earth (solidly or through <see cref="ZPu"/>).</summary>
    public bool Earthed { get; init; }

    /// <summary>Neutral impedance Z_N in per unit of the terminal bus base; zero when solid.</summary>
    public Complex ZPu { get; init; }

    /// <summary>
    /// Z_N in ohm converted on the terminal bus base (Z_base = kV² / S_base). A neutral impedance in ohm
    /// on a bus whose kV is not stated cannot be converted: an input error.
    /// </summary>
    /// <exception cref="InputException">An impedance is given in ohm and the bus kV is not stated.</exception>
    public static PuNeutral Compile(Earthing? earthing, double busKv, double baseMva, string elementId, string field)
    {
        if (earthing is null) return NotStated;
        if (!earthing.Grounded) return new PuNeutral { Earthed = false };
        var zOhm = new Complex(earthing.ROhm, earthing.XOhm);
        if (zOhm == Complex.Zero) return new PuNeutral { Earthed = true };
        if (!(busKv > 0))
            throw new InputException($"{field}: the neutral impedance is in ohm but the bus kV is not stated", elementId: elementId);
        return new PuNeutral { Earthed = true, ZPu = zOhm / BaseQuantities.ZBaseOhm(busKv, baseMva) };
    }
}

/// <summary>A supply point's declared fault data; null where the file does not give it.</summary>
/// <param name="ScMvaMax">Declared maximum three-phase fault level S''kQ max, MVA.</param>
/// <param name="ScMvaMin">Declared minimum fault level, MVA (defaults to the maximum when used).</param>
/// <param name="XOverR">X/R of the feeder impedance.</param>
/// <param name="Z0Z1">Ratio of zero- to positive-sequence feeder impedance.</param>
public sealed record SupplyFaultData(double? ScMvaMax, double? ScMvaMin, double? XOverR, double? Z0Z1)
{
    public static SupplyFaultData Of(Supply s) => new(s.ScMvaMax, s.ScMvaMin, s.Xr, s.Z0Z1);
}

/// <summary>A generator's rated data behind the IEC 60909 correction factor K_G; null where not given.</summary>
/// <param name="Mva">Rated apparent power S_rG, MVA.</param>
/// <param name="Kv">Rated voltage U_rG, kV.</param>
/// <param name="XdppPu">Subtransient reactance x''d on the machine's own rating.</param>
/// <param name="PowerFactor">Rated power factor cos φ_rG.</param>
public sealed record GeneratorRating(double? Mva, double? Kv, double? XdppPu, double? PowerFactor)
{
    public static GeneratorRating Of(Generator g) => new(g.Mva, g.Kv, g.XdppPu, g.PowerFactor);
}

/// <summary>Nameplate of one unit of a two-winding bank, for the correction factor K_T; absent for the per-unit form.</summary>
public sealed record TransformerRating(double Mva, double HvKv, double LvKv, double ZPercent, double XOverR)
{
    /// <summary>Relative reactance x_T on the unit's own rating: z·X/R/√(1 + (X/R)²).</summary>
    public double XPu => ZPercent / 100.0 * XOverR / Math.Sqrt(1 + XOverR * XOverR);

    /// <summary>The nameplate form's rating, or null for the per-unit form (imported cases).</summary>
    public static TransformerRating? Of(Transformer t) =>
        t.Mva is double mva && t.HvKv is double hv && t.LvKv is double lv && t.ZPercent is double z && t.Xr is double xr
            ? new TransformerRating(mva, hv, lv, z, xr)
            : null;
}

/// <summary>Pairwise nameplate data of a three-winding bank, for its K_T, with the base kV of its mv and lv buses.</summary>
public sealed record ThreeWindingRating(
    double MvaHv, double MvaMv, double MvaLv, double ZHmPercent, double ZHlPercent, double ZMlPercent, double ZBaseMva,
    double XOverR, double MvBusKv, double LvBusKv)
{
    public static ThreeWindingRating Of(ThreeWindingTransformer t, double mvBusKv, double lvBusKv) =>
        new(t.MvaHv, t.MvaMv, t.MvaLv, t.ZHmPercent, t.ZHlPercent, t.ZMlPercent, t.ZBaseMva, t.Xr, mvBusKv, lvBusKv);
}

/// <summary>
/// A transformer's windings as a fault study sees them: the vector group (parsed; null when absent or
/// not IEC 60076-1 notation, with <see cref="GroupProblem"/> saying why) and each star point's earthing.
/// For a winding branch of a three-winding bank every field describes the whole bank.
/// </summary>
public sealed record PuWindings
{
    /// <summary>The vector group as written in the file; null when not given.</summary>
    public string? GroupText { get; init; }
    public VectorGroup? Group { get; init; }
    /// <summary>Why <see cref="Group"/> is null although a text was given (the parser's message).</summary>
    public string? GroupProblem { get; init; }
    public PuNeutral HvNeutral { get; init; } = PuNeutral.NotStated;
    public PuNeutral MvNeutral { get; init; } = PuNeutral.NotStated;
    public PuNeutral LvNeutral { get; init; } = PuNeutral.NotStated;

    public static PuWindings Compile(string elementId, string? groupText, bool threeWinding,
        PuNeutral hv, PuNeutral mv, PuNeutral lv)
    {
        VectorGroup? group = null;
        string? problem = null;
        if (groupText is not null)
        {
            try { group = VectorGroup.Parse(groupText, elementId, threeWinding); }
            catch (InputException e) { problem = e.Message; }
        }
        return new PuWindings { GroupText = groupText, Group = group, GroupProblem = problem, HvNeutral = hv, MvNeutral = mv, LvNeutral = lv };
    }
}

/// <summary>A breaker at an in-service bus, with its ratings (zero or null: not given).</summary>
public sealed record PuBreaker
{
    public required string Id { get; init; }
    public int Bus { get; init; }
    public required string BusId { get; init; }
    /// <summary>The branch it switches at its bus; null for a breaker that sees the whole bus.</summary>
    public string? BranchId { get; init; }
    /// <summary>Index into the model's branches of that branch's end at the bus; null without a branch or when the branch is out of service.</summary>
    public int? Branch { get; init; }
    /// <summary>Rated short-circuit breaking current, kA; 0 when not given.</summary>
    public double InterruptingKa { get; init; }
    /// <summary>Rated short-circuit making (peak) current, kA; 0 when not given.</summary>
    public double PeakKa { get; init; }
    /// <summary>Rated DC component of the breaking current, percent.</summary>
    public double? DcPercent { get; init; }
    public double? ShortTimeKa { get; init; }
    /// <summary>Rated duration of the short-time current, s (1 s when not given).</summary>
    public double ShortTimeS { get; init; } = 1.0;
    /// <summary>Relay plus opening time, s; null: the study's minimum time delay applies.</summary>
    public double? MinTripS { get; init; }
}
