// The readable report of `study fault`: the caution first, then fault levels per bus, then breaker duty.
using System.Numerics;
using System.Text;
using static Study.App.Cli.Format;
using Study.App.Cli.Solve;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Cli.Faults;

public static class FaultReport
{
    /// <param name="detail">Also list post-fault voltages and branch contributions of every fault (for a few buses).</param>
    public static string Render(string path, Network network, FaultResult r, bool detail = false)
    {
        var sb = new StringBuilder();
        sb.Append($"CAUTION: {r.Caution}\n\n");
        string level = r.Level == FaultLevel.Max ? "maximum (c_max, scMvaMax)" : "minimum (c_min, scMvaMin)";
        string method = r.Method == FaultMethod.Iec60909 ? "IEC 60909 equivalent voltage source" : "pre-fault voltages from the load flow";
        sb.Append($"Fault levels: {LoadFlowReport.Title(network, path)}\n");
        sb.Append($"method {r.Method.Code()} ({method}), {level} levels; kappa by the equivalent frequency f_c (IEC 60909-0 method C)\n");
        if (r.PerUnitOnly) sb.Append("kV not stated in this case: currents in per unit of the bus base current, ohm values not given\n");
        foreach (string note in r.Notes) sb.Append($"note: {note}\n");

        bool pu = r.PerUnitOnly;
        var table = new TextTable().Left("bus").Column("kV").Left("type").Column(pu ? "I''k pu" : "I''k kA").Column("S''k MVA")
            .Column(pu ? "earth pu" : "3I0 kA").Column("X/R").Column("kappa").Column(pu ? "ip pu" : "ip kA")
            .Column(pu ? "Z1 pu" : "Z1 ohm").Column(pu ? "Z0 pu" : "Z0 ohm");
        foreach (ShortCircuitLevel f in r.Faults)
        {
            bool kv = f.Kv > 0;
            table.Row(f.Bus, kv ? F(f.Kv, 1) : "-", f.Kind.Code(),
                kv ? F(f.IkKa, 3) : F(f.IkPu, 3), F(f.SkMva, 1),
                f.Kind.InvolvesEarth() ? (kv ? F(f.EarthCurrentKa, 3) : F(f.EarthCurrentPu, 3)) : "",
                f.XOverR is double xr ? F(xr, 2) : "inf", F(f.Kappa, 3),
                kv ? F(f.IpKa, 2) : F(f.IpPu, 2),
                Impedance(kv ? f.Z1Ohm : f.Z1Pu), Impedance(kv ? f.Z0Ohm : f.Z0Pu));
        }
        sb.Append($"\nFaults ({r.Faults.Count}); Z0 'open' = no zero-sequence path to earth at the bus\n").Append(table.Render("  "));

        if (detail)
            foreach (ShortCircuitLevel f in r.Faults) AppendDetail(sb, f);

        var breakers = new TextTable().Left("breaker").Left("bus").Column("I''k kA").Column("rated kA").Column("ip kA")
            .Column("peak kA").Column("duty %").Left("status").Left("worst type");
        foreach (BreakerDuty b in r.Breakers)
            breakers.Row(b.Id, b.Bus, F(b.IkKa, 2), F(b.InterruptingKa, 1), F(b.IpKa, 2), F(b.PeakKa, 1),
                F(b.DutyPercent, 1), b.Status.Code() + (b.Status == DutyStatus.Over ? " !" : ""), b.GoverningKind?.Code() ?? "");
        sb.Append($"\nBreaker duty ({r.Breakers.Count}): larger of I''k/interruptingKa and ip/peakKa; warning above 90 %, over above 100 %\n");
        sb.Append(r.Breakers.Count == 0 ? "  no breakers at the faulted buses\n" : breakers.Render("  "));
        return sb.ToString();
    }

    private static void AppendDetail(StringBuilder sb, ShortCircuitLevel f)
    {
        bool kv = f.Kv > 0;
        sb.Append($"\n{f.Kind.Code()} at {f.Bus}: phase voltages after the fault (pu)\n");
        var v = new TextTable().Left("bus").Column("Va").Column("Vb").Column("Vc");
        foreach (PhaseVoltages p in f.Voltages)
            v.Row(p.Bus + (p.Faulted ? " (faulted)" : ""), F(p.VaPu, 3), F(p.VbPu, 3), F(p.VcPu, 3));
        sb.Append(v.Render("  "));
        var c = new TextTable().Left("branch").Left("from bus").Column(kv ? "I kA" : "I pu").Left("direction");
        foreach (BranchContribution b in f.Contributions)
            c.Row(b.Branch, b.OtherBus, kv ? F(b.IkKa, 3) : F(b.IkPu, 3),
                b.Direction switch
                {
                    ContributionDirection.IntoFault => "into the faulted bus",
                    ContributionDirection.AwayFromFault => "away from it",
                    _ => "no fault current",
                });
        sb.Append("  branch contributions (fault-induced current at the faulted end, largest phase)\n").Append(c.Render("  "));
    }

    private static string Impedance(Complex? z) => z is Complex v
        ? $"{F(v.Real, 4)}{(v.Imaginary < 0 ? "-" : "+")}j{F(Math.Abs(v.Imaginary), 4)}"
        : "open";
}
