// The shunt fault types a study can place at a bus, and their short names on the command line.
using Study.Core.Model;

namespace Study.Core.Faults;

/// <summary>Balanced and unbalanced shunt faults (IEC 60909-0 names the currents I''k3, I''k1, I''k2, I''k2E).</summary>
public enum FaultKind
{
    /// <summary>Three-phase fault, "3ph".</summary>
    ThreePhase,
    /// <summary>Single line-to-earth fault on phase a, "slg".</summary>
    LineToEarth,
    /// <summary>Line-to-line fault between phases b and c, "ll".</summary>
    LineToLine,
    /// <summary>Double line-to-earth fault, phases b and c to earth, "dlg".</summary>
    LineLineToEarth,
}

/// <summary>Short names ("3ph", "slg", "ll", "dlg") used in requests, tables and JSON.</summary>
public static class FaultKindNames
{
    public static string Code(this FaultKind kind) => kind switch
    {
        FaultKind.ThreePhase => "3ph",
        FaultKind.LineToEarth => "slg",
        FaultKind.LineToLine => "ll",
        _ => "dlg",
    };

    /// <summary>True for the kinds whose current returns through earth and so needs the zero-sequence network.</summary>
    public static bool InvolvesEarth(this FaultKind kind) => kind is FaultKind.LineToEarth or FaultKind.LineLineToEarth;

    public static FaultKind Parse(string code) => code.Trim().ToLowerInvariant() switch
    {
        "3ph" => FaultKind.ThreePhase,
        "slg" => FaultKind.LineToEarth,
        "ll" => FaultKind.LineToLine,
        "dlg" => FaultKind.LineLineToEarth,
        _ => throw new InputException($"unknown fault type '{code}' (known: 3ph, slg, ll, dlg)"),
    };
}
