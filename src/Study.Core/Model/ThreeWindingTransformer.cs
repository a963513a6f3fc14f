// A three-winding transformer, modelled through its star equivalent.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>A three-winding transformer with pairwise short-circuit impedances on ZBaseMva.</summary>
public sealed record ThreeWindingTransformer
{
    public ThreeWindingTransformer() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal ThreeWindingTransformer(string id, string hv, string mv, string lv, double xr = 30, bool inService = true)
    {
        Id = id;
        Hv = hv;
        Mv = mv;
        Lv = lv;
        Xr = xr;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Hv { get; init; }
    public required string Mv { get; init; }
    public required string Lv { get; init; }

    public double HvKv { get; init; }
    public double MvKv { get; init; }
    public double LvKv { get; init; }
    public double MvaHv { get; init; }
    public double MvaMv { get; init; }
    public double MvaLv { get; init; }

    public double ZHmPercent { get; init; }
    public double ZHlPercent { get; init; }
    public double ZMlPercent { get; init; }

    /// <summary>MVA base of the three pairwise impedances (often the hv rating).</summary>
    public double ZBaseMva { get; init; }
    public double Xr { get; init; } = 30;

    public string? VectorGroup { get; init; }
    public Earthing? HvNeutral { get; init; }
    public Earthing? MvNeutral { get; init; }
    public Earthing? LvNeutral { get; init; }
    public TapChanger? Tap { get; init; }
    public NoLoadLoss? NoLoad { get; init; }
    public bool InService { get; init; } = true;
}
