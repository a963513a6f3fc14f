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
            .Number("kv", "", "kV", f => LoadFlowColumns.Stated(f.Kv), 3, reads: f => LoadFlowColumns.BaseKv(f.Kv))
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

    /// <summary>
    /// The currents switchgear is rated against, per fault: I''k, I_b at t_min, the DC component and its
    /// percentage of √2·I_b, I_b,asym, the steady-state I_k and the thermal I_th for T_k.
    /// </summary>
    public static ColumnSpec<ShortCircuitLevel> Duty(bool perUnitOnly)
    {
        string current = perUnitOnly ? "pu" : "kA";
        double? Pick(ShortCircuitLevel f, double? ka, double pu) => f.Kv > 0 ? ka : pu;
        return new ColumnSpec<ShortCircuitLevel>()
            .Text("bus", "bus", f => f.Bus, namesGroup: true)
            .Text("type", "type", f => f.Kind.Code())
            .Number(perUnitOnly ? "ikPu" : "ikKa", "I''k", current, f => Pick(f, f.IkKa, f.IkPu), 3)
            .Number(perUnitOnly ? "ibPu" : "ibKa", "I_b", current, f => Pick(f, f.IbKa, f.IbPu), 3)
            .Number(perUnitOnly ? "idcPu" : "idcKa", "i_DC", current, f => Pick(f, f.IdcKa, f.IdcPu), 3)
            .Number("dcPercent", "DC", "%", f => DcPercent(f.IdcPu, f.IbPu), 1)
            .Number(perUnitOnly ? "ibAsymPu" : "ibAsymKa", "I_b,asym", current, f => Pick(f, f.IbAsymKa, f.IbAsymPu), 3)
            .Number(perUnitOnly ? "ikSteadyPu" : "ikSteadyKa", "I_k", current, f => Pick(f, f.IkSteadyKa, f.IkSteadyPu), 3)
            .Number(perUnitOnly ? "ithPu" : "ithKa", "I_th", current, f => Pick(f, f.IthKa, f.IthPu), 3)
            .CsvOnly("dcROverX", f => f.DcROverX).CsvOnly("thermalM", f => f.ThermalM);
    }

    /// <summary>The DC component as a percentage of the peak of the symmetrical breaking current, 100·i_DC/(√2·I_b).</summary>
    public static double? DcPercent(double idc, double ib) => ib > 0 ? 100 * idc / (Math.Sqrt(2) * ib) : null;

    /// <summary>The machines' own currents for one three-phase fault, and the share that has decayed by t_min.</summary>
    public static ColumnSpec<MachineContribution> Machines(double tMinS) => new ColumnSpec<MachineContribution>()
        .Text("id", "machine", m => m.Id)
        .Words("kind", "kind", m => m.Asynchronous ? "motor" : "generator", m => m.Asynchronous ? "motor" : "generator")
        .Number("ikPu", "I''k", "pu", m => m.CurrentPu, 4)
        .Number("ratedRatio", "I''k/I_r", null, m => m.RatedRatio, 2)
        .Number("dropOverC", "ΔU''/c", null, m => m.DropOverC, 3)
        .Number("mu", "μ", null, m => DecayFactors.Mu(tMinS, m.RatedRatio), 3)
        .Number("q", "q", null, m => m.Asynchronous ? DecayFactors.Q(tMinS, m.MwPerPolePair) : 1.0, 3)
        .Number("decayPu", "decay", "pu", m => m.DecayPu(tMinS), 4);

    /// <summary>The Faults tab's selection of the same columns: the currents first, so they show on a narrow screen.</summary>
    public static ColumnSpec<ShortCircuitLevel> ScreenLevels(bool perUnitOnly) => perUnitOnly
        ? Levels(true).Select("bus", "type", "ikPu", "skMva", "xOverR", "kappa", "ipPu", "earthCurrentPu", "Z1", "Z0")
        : Levels(false).Select("bus", "type", "ikKa", "skMva", "xOverR", "kappa", "ipKa", "earthCurrentKa", "kv", "Z1", "Z0");

    /// <summary>
    /// The Faults tab's one row per fault: the currents switchgear is rated against first (I''k, I_b, i_DC,
    /// I_b,asym, I_k, I_th, i_p), then the level's other columns, so a narrow screen shows the duty currents.
    /// </summary>
    public static ColumnSpec<ShortCircuitLevel> ScreenFaults(bool perUnitOnly)
    {
        string k = perUnitOnly ? "Pu" : "Ka";
        string[] duty = [$"ib{k}", $"idc{k}", "dcPercent", $"ibAsym{k}", $"ikSteady{k}", $"ith{k}"];
        var all = new ColumnSpec<ShortCircuitLevel>().Include(Levels(perUnitOnly), f => f).Include(Duty(perUnitOnly).Select(duty), f => f);
        return all.Select([
            "bus", "type", $"ik{k}", .. duty, $"ip{k}", "skMva", "xOverR", "kappa", $"earthCurrent{k}", .. perUnitOnly ? new string[0] : ["kv"], "Z1", "Z0"]);
    }

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
        .Text("branch", "branch", b => b.Branch)
        .Number("dutyPercent", "duty", "%", b => b.DutyPercent, 1, mark: b => b.DutyPercent is null ? "" : " " + Marks.Duty(b.Status))
        .Words("status", "status", b => b.Status.Code(), b => Marks.DutyWords(b.Status))
        .Number("ikKa", "I''k", "kA", b => b.IkKa, 2)
        .Number("interruptingKa", "rated", "kA", b => b.InterruptingKa, 1)
        .Number("ipKa", "i_p", "kA", b => b.IpKa, 2)
        .Number("peakKa", "peak", "kA", b => b.PeakKa, 1)
        .Text("governingKind", "worst type", b => b.GoverningKind?.Code());

    /// <summary>Each check of each breaker as its own line, with the fault type and the side that give the largest current.</summary>
    public static ColumnSpec<(BreakerDuty Breaker, DutyCheck Check)> Checks { get; } = new ColumnSpec<(BreakerDuty Breaker, DutyCheck Check)>()
        .Text("breaker", "breaker", r => r.Breaker.Id, namesGroup: true)
        .Words("check", "check", r => r.Check.Check.Code(), r => CheckWords(r.Check.Check))
        .Number("requiredKa", "required", "kA", r => r.Check.RequiredKa, 2)
        .Number("ratedKa", "rated", "kA", r => r.Check.RatedKa, 2)
        .Number("dutyPercent", "duty", "%", r => r.Check.DutyPercent, 1, mark: r => r.Check.DutyPercent is null ? "" : " " + Marks.Duty(r.Check.Status))
        .Words("status", "status", r => r.Check.Status.Code(), r => Marks.DutyWords(r.Check.Status))
        .Text("type", "worst type", r => r.Check.Kind?.Code())
        .Words("side", "worst side", r => r.Check.Side.Code(), r => r.Check.Side.Code())
        .Words(null, "DC now / rated", _ => null, r => r.Check.Check == DutyCheckKind.BreakingAsym
            ? $"{Numbers.Fixed(r.Check.DcPercent, 1)} / {Numbers.Fixed(r.Check.RatedDcPercent, 1)} %" : "", Align.Right)
        .CsvOnly("dcPercent", r => r.Check.DcPercent).CsvOnly("ratedDcPercent", r => r.Check.RatedDcPercent)
        .CsvOnly("tMinS", r => r.Breaker.TMinS);

    /// <summary>The rows of <see cref="Checks"/>: every check of every breaker, in order.</summary>
    public static IEnumerable<(BreakerDuty Breaker, DutyCheck Check)> CheckRows(IEnumerable<BreakerDuty> breakers) =>
        breakers.SelectMany(b => b.Checks.Select(c => (b, c)));

    private static string CheckWords(DutyCheckKind check) => check switch
    {
        DutyCheckKind.Breaking => "breaking I_b",
        DutyCheckKind.BreakingAsym => "breaking asym.",
        DutyCheckKind.Making => "making i_p",
        _ => "short-time I_th",
    };

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
