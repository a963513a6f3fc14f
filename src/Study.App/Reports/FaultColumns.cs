// The columns of the fault result records: levels per bus and type, phase voltages, branch contributions, breaker duty.
using System.Numerics;
using Study.Core.Faults;

namespace Study.App.Reports;

public static class FaultColumns
{
    /// <summary>
    /// The report's fault levels. A bus with kV shows kA and ohm; one without shows per unit, and the
    /// headers say per unit when no bus states its kV (<paramref name="perUnitOnly"/>).
    /// </summary>
    public static ColumnSpec<ShortCircuitLevel> Levels(bool perUnitOnly)
    {
        string current = perUnitOnly ? "pu" : "kA", impedance = perUnitOnly ? "pu" : "ohm";
        return new ColumnSpec<ShortCircuitLevel>()
            .Text("bus", "bus", f => f.Bus, namesGroup: true)
            .Number("kv", "", "kV", f => LoadFlowColumns.Stated(f.Kv), 1)
            .Text("type", "type", f => f.Kind.Code())
            .Number(perUnitOnly ? "ikPu" : "ikKa", "I''k", current, f => f.Kv > 0 ? f.IkKa : f.IkPu, 3)
            .Number("skMva", "S''k", "MVA", f => f.SkMva, 1)
            .Number(perUnitOnly ? "earthCurrentPu" : "earthCurrentKa", perUnitOnly ? "earth" : "3I0", current,
                f => f.Kv > 0 ? f.EarthCurrentKa : f.EarthCurrentPu, 3,
                reads: f => f.Kind.InvolvesEarth() ? Numbers.Fixed(f.Kv > 0 ? f.EarthCurrentKa : f.EarthCurrentPu, 3) : "")
            .Number("xOverR", "X/R", null, f => XOverR(f), 2)
            .Number("kappa", "κ", null, f => f.Kappa, 3)
            .Number(perUnitOnly ? "ipPu" : "ipKa", "i_p", current, f => f.Kv > 0 ? f.IpKa : f.IpPu, 2)
            .Words(null, "Z1", _ => null, f => Impedance(Z1(f)), Align.Right, impedance)
            .Words(null, "Z0", _ => null, f => Impedance(Z0(f)), Align.Right, impedance)
            .CsvOnly($"z1R{Title(impedance)}", f => Z1(f)?.Real).CsvOnly($"z1X{Title(impedance)}", f => Z1(f)?.Imaginary)
            .CsvOnly($"z0R{Title(impedance)}", f => Z0(f)?.Real).CsvOnly($"z0X{Title(impedance)}", f => Z0(f)?.Imaginary);
    }

    /// <summary>The Faults tab's selection of the same columns: the currents first, so they show on a narrow screen.</summary>
    public static ColumnSpec<ShortCircuitLevel> ScreenLevels(bool perUnitOnly) => perUnitOnly
        ? Levels(true).Select("bus", "type", "ikPu", "skMva", "xOverR", "kappa", "ipPu", "earthCurrentPu", "Z1", "Z0")
        : Levels(false).Select("bus", "type", "ikKa", "skMva", "xOverR", "kappa", "ipKa", "earthCurrentKa", "kv", "Z1", "Z0");

    /// <summary>Phase-voltage magnitudes after one fault, in pu of each bus's base.</summary>
    public static ColumnSpec<PhaseVoltages> Voltages { get; } = new ColumnSpec<PhaseVoltages>()
        .Words("bus", "bus", p => p.Bus, p => p.Bus + (p.Faulted ? " (faulted)" : ""))
        .CsvOnly("faulted", p => p.Faulted)
        .Number("vaPu", "Va", null, p => p.VaPu, 3)
        .Number("vbPu", "Vb", null, p => p.VbPu, 3)
        .Number("vcPu", "Vc", null, p => p.VcPu, 3);

    /// <summary>Each branch's fault-induced current at the faulted end, in kA when the faulted bus states its kV.</summary>
    public static ColumnSpec<BranchContribution> Contributions(bool kv) => new ColumnSpec<BranchContribution>()
        .Text("branch", "branch", c => c.Branch)
        .Text("otherBus", "from bus", c => c.OtherBus)
        .Number(kv ? "ikKa" : "ikPu", "I", kv ? "kA" : "pu", c => kv ? c.IkKa : c.IkPu, 3)
        .Words("direction", "direction", c => c.Direction.ToString(), c => c.Direction switch
        {
            ContributionDirection.IntoFault => "into the faulted bus",
            ContributionDirection.AwayFromFault => "away from it",
            _ => "no fault current",
        });

    /// <summary>Breaker duty: "▲ OVER" above a rating, "△ near" above 90 %, so the row reads without colour.</summary>
    public static ColumnSpec<BreakerDuty> Breakers { get; } = new ColumnSpec<BreakerDuty>()
        .Text("id", "breaker", b => b.Id)
        .Text("bus", "bus", b => b.Bus)
        .Number("dutyPercent", "duty", "%", b => b.DutyPercent, 1, mark: b => b.DutyPercent is null ? "" : " " + Marks.Duty(b.Status))
        .Words("status", "status", b => b.Status.Code(), b => Marks.DutyWords(b.Status))
        .Number("ikKa", "I''k", "kA", b => b.IkKa, 2)
        .Number("interruptingKa", "rated", "kA", b => b.InterruptingKa, 1)
        .Number("ipKa", "i_p", "kA", b => b.IpKa, 2)
        .Number("peakKa", "peak", "kA", b => b.PeakKa, 1)
        .Text("governingKind", "worst type", b => b.GoverningKind?.Code());

    /// <summary>The Faults tab's selection: duty and status first so that they show on a narrow screen.</summary>
    public static ColumnSpec<BreakerDuty> ScreenBreakers { get; } =
        Breakers.Select("id", "dutyPercent", "status", "bus", "ikKa", "ipKa", "interruptingKa", "peakKa", "governingKind");

    /// <summary>X/R is unbounded when the fault impedance has no resistance (null in the result).</summary>
    private static double XOverR(ShortCircuitLevel f) => f.XOverR ?? double.PositiveInfinity;

    /// <summary>The sequence impedances in ohm where the bus states its kV, else in pu; null where the sequence network is open.</summary>
    private static Complex? Z1(ShortCircuitLevel f) => f.Kv > 0 ? f.Z1Ohm : f.Z1Pu;

    private static Complex? Z0(ShortCircuitLevel f) => f.Kv > 0 ? f.Z0Ohm : f.Z0Pu;

    private static string Title(string unit) => char.ToUpperInvariant(unit[0]) + unit[1..];

    /// <summary>"0.0708+j0.8267"; "open" where there is no path (no current flows in that sequence).</summary>
    private static string Impedance(Complex? z) => z is Complex v
        ? $"{Numbers.Fixed(v.Real, 4)}{(v.Imaginary < 0 ? "-" : "+")}j{Numbers.Fixed(Math.Abs(v.Imaginary), 4)}"
        : "open";
}
