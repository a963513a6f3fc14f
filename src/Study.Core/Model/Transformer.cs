// A two-winding transformer bank, from nameplate data or (for imported cases) system per-unit values.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>
/// A two-winding transformer. Nameplate form: Mva, HvKv, LvKv, ZPercent, Xr. Per-unit form (imported
/// cases): RPu, XPu on the system base with an off-nominal Ratio at the hv side. Exactly one form.
/// </summary>
public sealed record Transformer
{
    public Transformer() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Transformer(string id, string hv, string lv, int units = 1, bool inService = true)
    {
        Id = id;
        Hv = hv;
        Lv = lv;
        Units = units;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Hv { get; init; }
    public required string Lv { get; init; }

    public double? Mva { get; init; }
    public double? HvKv { get; init; }
    public double? LvKv { get; init; }
    public double? ZPercent { get; init; }
    public double? Xr { get; init; }
    /// <summary>Zero-sequence impedance in percent on the unit rating (same X/R); defaults to ZPercent.</summary>
    public double? Z0Percent { get; init; }

    /// <summary>Identical units in parallel, treated as one bank.</summary>
    public int Units { get; init; } = 1;

    /// <summary>IEC 60076-1 vector group such as YNd11 or Dyn1.</summary>
    public string? VectorGroup { get; init; }
    public Earthing? HvNeutral { get; init; }
    public Earthing? LvNeutral { get; init; }
    public TapChanger? Tap { get; init; }
    /// <summary>
    /// Phase displacement φ of the ideal ratio t·e^{jφ}:1 in degrees (lv lags hv by φ). When not given it is
    /// the vector group's clock number × 30°; given, it replaces that (a phase-shifting transformer, say).
    /// </summary>
    public double? PhaseShiftDeg { get; init; }
    public NoLoadLoss? NoLoad { get; init; }
    public double? RatingMva { get; init; }

    public double? RPu { get; init; }
    public double? XPu { get; init; }
    /// <summary>Charging susceptance in the per-unit form (imported cases), system per-unit.</summary>
    public double? BPu { get; init; }
    /// <summary>Off-nominal turns ratio at the hv side, per-unit form.</summary>
    public double? Ratio { get; init; }

    public bool InService { get; init; } = true;
}
