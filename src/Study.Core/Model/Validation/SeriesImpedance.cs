// The zero and negative series impedance rules, shared by lines and per-unit transformers.
namespace Study.Core.Model.Validation;

internal static class SeriesImpedance
{
    /// <summary>
    /// Zero series impedance is an error (README, Network files); negative reactance is accepted
    /// with a warning, since series capacitors and three-winding star branches have it in real data.
    /// </summary>
    public static void Check(ElementScope at, string rKey, double? r, string xKey, double? x)
    {
        if (r is not double rv || x is not double xv) return;
        if (!double.IsFinite(rv) || !double.IsFinite(xv)) return;
        if (rv == 0 && xv == 0)
            at.Error(xKey, $"series impedance is zero ({rKey} {Numbers.Show(rv)}, {xKey} {Numbers.Show(xv)}): " +
                "a zero-impedance connection belongs in a bus merge, not a branch");
        if (xv < 0)
            at.Warning(xKey, $"{xKey} {Numbers.Show(xv)} is negative (capacitive): accepted, as for a series capacitor " +
                "or a star branch; check the sign if this is an ordinary branch");
        if (rv < 0)
            at.Warning(rKey, $"{rKey} {Numbers.Show(rv)} is negative: only network equivalents have negative resistance; check the sign");
    }
}
