// What a branch looks like to zero-sequence current: a series path, an earthing at one or both ends, or open.
using System.Numerics;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// The zero-sequence circuit of one branch: a π branch (<see cref="Series"/>) joining its two buses,
/// and/or admittances to earth at its From and To buses, or nothing (open). Neutral impedances are
/// given in pu of the bus base at their own terminal (ZN at the From end is referred through the ideal
/// ratio t by 1/t², since the series impedance sits on the To side).
/// </summary>
public readonly record struct ZeroSequencePath(PuBranch? Series, Complex EarthAtFrom, Complex EarthAtTo)
{
    public static ZeroSequencePath Open => new(null, Complex.Zero, Complex.Zero);

    /// <summary>
    /// Two-winding bank (common practice, any protection text): YN–yn passes zero sequence through
    /// Z0 + 3Z_N(hv) + 3Z_N(lv); a YN (or yn) winding opposite a d winding earths its own side through
    /// Z0 + 3Z_N and passes nothing; an earthed zigzag earths its own side whatever the other winding
    /// (its limb ampere-turns cancel, so nothing is induced across); y, z and d on their own are open.
    /// </summary>
    /// <param name="znHv">Neutral impedance of the hv winding in pu, null when that winding is not earthed.</param>
    public static ZeroSequencePath TwoWinding(PuBranch branch, Complex z0, VectorGroup group, Complex? znHv, Complex? znLv)
    {
        double t2 = branch.Ratio * branch.Ratio;
        bool hvStar = group.Hv == WindingConnection.StarNeutral && znHv is not null;
        bool lvStar = group.Lv == WindingConnection.StarNeutral && znLv is not null;
        bool hvZig = group.Hv == WindingConnection.ZigzagNeutral && znHv is not null;
        bool lvZig = group.Lv == WindingConnection.ZigzagNeutral && znLv is not null;
        if (hvStar && lvStar)
            return new(Through(branch, z0 + 3 * znHv!.Value / t2 + 3 * znLv!.Value), Complex.Zero, Complex.Zero);
        Complex atFrom = (hvStar && group.Lv == WindingConnection.Delta) || hvZig ? 1.0 / (t2 * z0 + 3 * znHv!.Value) : Complex.Zero;
        Complex atTo = (lvStar && group.Hv == WindingConnection.Delta) || lvZig ? 1.0 / (z0 + 3 * znLv!.Value) : Complex.Zero;
        return new(null, atFrom, atTo);
    }

    /// <summary>
    /// One winding of a three-winding bank, terminal (From) to star (To): an earthed star winding
    /// joins its terminal to the star point through Z0_w + 3Z_N; a delta winding earths the star point
    /// through Z0_w; an earthed zigzag earths its terminal; others are open (the star-equivalent rule).
    /// </summary>
    public static ZeroSequencePath Winding(PuBranch branch, Complex z0, WindingConnection connection, Complex? zn)
    {
        double t2 = branch.Ratio * branch.Ratio;
        return connection switch
        {
            WindingConnection.StarNeutral when zn is not null => new(Through(branch, z0 + 3 * zn.Value / t2), Complex.Zero, Complex.Zero),
            WindingConnection.Delta => new(null, Complex.Zero, 1.0 / z0),
            WindingConnection.ZigzagNeutral when zn is not null => new(null, 1.0 / (t2 * z0 + 3 * zn.Value), Complex.Zero),
            _ => Open,
        };
    }

    /// <summary>A line: its own zero-sequence series impedance and charging.</summary>
    public static ZeroSequencePath Line(PuBranch branch, Complex z0) =>
        new(branch with { Z = z0, B = branch.B0 ?? 0, MagnetisingY = Complex.Zero, ShiftRad = 0 }, Complex.Zero, Complex.Zero);

    // Zero-sequence quantities see no phase shift; charging and magnetising are not represented.
    private static PuBranch Through(PuBranch branch, Complex z) =>
        branch with { Z = z, B = 0, MagnetisingY = Complex.Zero, ShiftRad = 0 };
}
