// Small networks built in code for the fault tests: a grid infeed, transformer banks, cables.
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Faults;

internal static class FaultNetworks
{
    /// <summary>A supply large enough to stand for an infinite source (z_Q = 1e-7 pu on 100 MVA).</summary>
    public const double InfiniteMva = 1e9;

    public static Supply Grid(string bus, double scMva, double xr = 12, double z0z1 = 1.0) =>
        new() { Id = "GRID", Bus = bus, ScMvaMax = scMva, ScMvaMin = scMva, Xr = xr, Z0Z1 = z0z1 };

    public static Transformer Bank(string id, string hv, string lv, double mva, double hvKv, double lvKv, double zPercent, double xr,
        string? vectorGroup, double? z0Percent = null, Earthing? hvNeutral = null, Earthing? lvNeutral = null) => new()
    {
        Id = id, Hv = hv, Lv = lv, Mva = mva, HvKv = hvKv, LvKv = lvKv, ZPercent = zPercent, Xr = xr, Z0Percent = z0Percent,
        VectorGroup = vectorGroup, HvNeutral = hvNeutral, LvNeutral = lvNeutral,
    };

    public static Earthing Solid => new() { Grounded = true };
    public static Earthing Unearthed => new() { Grounded = false };

    /// <summary>Supply at HV, one bank HV→LV: the transformer-limited fault circuit.</summary>
    public static Network OneBank(Transformer bank, double hvKv, double lvKv, double scMva = InfiniteMva, double z0z1 = 1.0) => new()
    {
        Name = "one bank",
        Buses = [new Bus { Id = "HV", Kv = hvKv }, new Bus { Id = "LV", Kv = lvKv }],
        Supplies = [Grid("HV", scMva, 12, z0z1)],
        Transformers = [bank],
    };

    public static FaultResult Run(Network network, FaultRequest request) => FaultStudy.Run(PerUnitModel.Build(network), request);

    public static ShortCircuitLevel At(this FaultResult result, string bus, FaultKind kind) =>
        result.Faults.Single(f => f.Bus == bus && f.Kind == kind);

    public static readonly FaultKind[] AllKinds =
        [FaultKind.ThreePhase, FaultKind.LineToEarth, FaultKind.LineToLine, FaultKind.LineLineToEarth];
}
