// IEC 60076-1 vector-group notation (YNd11, Dyn1, YNyn0d1, Yzn11): winding connections and clock numbers.
using System.Globalization;

namespace Study.Core.Model;

/// <summary>How one winding is connected; the N forms have the star point brought out for earthing.</summary>
public enum WindingConnection
{
    Star,
    StarNeutral,
    Delta,
    Zigzag,
    ZigzagNeutral,
}

/// <summary>
/// A parsed vector group: the hv winding (capital letters), then for each further winding its
/// connection (small letters) and clock number, the phase displacement in steps of 30° by which that
/// winding lags the hv winding (IEC 60076-1, from memory). Two-winding: <see cref="Lv"/>;
/// three-winding: <see cref="Mv"/> then <see cref="Lv"/>, in the order the notation writes them.
/// </summary>
public sealed record VectorGroup(WindingConnection Hv, WindingConnection? Mv, int MvClock, WindingConnection Lv, int LvClock)
{
    public static VectorGroup Parse(string text, string elementId, bool threeWinding = false)
    {
        string s = text.Trim();
        int pos = 0;
        WindingConnection hv = Letters(s, ref pos, upper: true, text, elementId);
        var others = new List<(WindingConnection Connection, int Clock)>();
        while (pos < s.Length)
        {
            WindingConnection c = Letters(s, ref pos, upper: false, text, elementId);
            int start = pos;
            while (pos < s.Length && char.IsAsciiDigit(s[pos])) pos++;
            if (pos == start) throw Bad(text, elementId, "a clock number (0 to 11) must follow each lower-voltage winding");
            // Two digits at most: a longer run is outside 0 to 11 whatever it says (and might not fit an int).
            if (pos - start > 2) throw Bad(text, elementId, $"clock number {s[start..pos]} is outside 0 to 11");
            int clock = int.Parse(s.AsSpan(start, pos - start), CultureInfo.InvariantCulture);
            if (clock > 11) throw Bad(text, elementId, $"clock number {clock} is outside 0 to 11");
            others.Add((c, clock));
        }
        int expected = threeWinding ? 2 : 1;
        if (others.Count != expected)
            throw Bad(text, elementId, threeWinding ? "a three-winding transformer needs three windings, e.g. YNyn0d1" : "a two-winding transformer needs two windings, e.g. Dyn11");
        return threeWinding
            ? new VectorGroup(hv, others[0].Connection, others[0].Clock, others[1].Connection, others[1].Clock)
            : new VectorGroup(hv, null, 0, others[0].Connection, others[0].Clock);
    }

    /// <summary>Degrees by which the lv winding lags the hv winding, in (−180, 180]: clock × 30° (Dyn11: −30°, lv leads by 30°).</summary>
    public double LvLagDeg => LagDeg(LvClock);

    /// <summary>Degrees by which the mv winding of a three-winding unit lags the hv winding, in (−180, 180].</summary>
    public double MvLagDeg => LagDeg(MvClock);

    /// <summary>A clock number as an angle of lag in (−180, 180]: each hour is 30° (IEC 60076-1, from memory).</summary>
    public static double LagDeg(int clock)
    {
        int degrees = clock % 12 * 30;
        return degrees > 180 ? degrees - 360 : degrees;
    }

    private static WindingConnection Letters(string s, ref int pos, bool upper, string text, string elementId)
    {
        if (pos >= s.Length) throw Bad(text, elementId, "a winding letter is missing");
        char letter = s[pos];
        char expect(char c) => upper ? char.ToUpperInvariant(c) : c;
        WindingConnection plain, neutral;
        if (letter == expect('y')) (plain, neutral) = (WindingConnection.Star, WindingConnection.StarNeutral);
        else if (letter == expect('z')) (plain, neutral) = (WindingConnection.Zigzag, WindingConnection.ZigzagNeutral);
        else if (letter == expect('d')) (plain, neutral) = (WindingConnection.Delta, WindingConnection.Delta);
        else throw Bad(text, elementId, upper
            ? $"the hv winding is written in capitals (Y, YN, D, Z, ZN), found '{letter}'"
            : $"lower-voltage windings are written in small letters (y, yn, d, z, zn), found '{letter}'");
        pos++;
        if (plain != WindingConnection.Delta && pos < s.Length && s[pos] == expect('n'))
        {
            pos++;
            return neutral;
        }
        return plain;
    }

    private static InputException Bad(string text, string elementId, string why) =>
        new($"vector group '{text}' is not IEC 60076-1 notation: {why}", elementId: elementId);
}
