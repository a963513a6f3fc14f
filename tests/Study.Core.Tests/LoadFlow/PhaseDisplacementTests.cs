// A bank's vector-group clock number is its phase displacement in the load flow (IEC 60076-1 clock
// notation: the lv winding lags the hv winding by clock × 30°, from memory); phaseShiftDeg replaces it.
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Units;

namespace Study.Core.Tests.LoadFlow;

public class PhaseDisplacementTests
{
    private static Network Radial(string? group, double? phaseShiftDeg = null) => new()
    {
        Name = "132/33 kV radial",
        Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "LV", Kv = 33 }, new Bus { Id = "FAR", Kv = 33 }],
        Supplies = [new Supply { Id = "GRID", Bus = "HV", ScMvaMax = 3000, Xr = 12, Z0Z1 = 1 }],
        Transformers =
        [
            new Transformer
            {
                Id = "T1", Hv = "HV", Lv = "LV", Mva = 45, HvKv = 132, LvKv = 33, ZPercent = 12.5, Xr = 30,
                VectorGroup = group, PhaseShiftDeg = phaseShiftDeg, LvNeutral = new Earthing { Grounded = true },
            },
        ],
        Lines =
        [
            new Line
            {
                Id = "F1", From = "LV", To = "FAR", Km = 4,
                Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.35 },
                Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.3, X = 1.1 },
            },
        ],
        Loads = [new Load { Id = "L1", Bus = "FAR", PMw = 20, QMvar = 8 }],
    };

    private static LoadFlowResult Solve(Network n)
    {
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(n));
        Assert.True(r.Converged, r.Message);
        return r;
    }

    [Theory]
    [InlineData("Dyn1", -30)]
    [InlineData("Dyn11", 30)]
    [InlineData("YNd5", -150)]
    [InlineData("YNyn0", 0)]
    public void The_lv_side_sits_clock_times_30_degrees_behind_and_nothing_else_changes(string group, double turn)
    {
        LoadFlowResult plain = Solve(Radial(null));
        LoadFlowResult grouped = Solve(Radial(group));
        for (int i = 0; i < plain.Buses.Count; i++)
        {
            Assert.Equal(plain.Buses[i].VPu, grouped.Buses[i].VPu, 9);
            double expected = plain.Buses[i].AngleDeg + (plain.Buses[i].Id == "HV" ? 0 : turn);
            Assert.Equal(expected, grouped.Buses[i].AngleDeg, 6);
        }
        // A pure turn of the angles beyond the bank carries the same power: losses and flows agree.
        Assert.Equal(plain.Totals.LossMw, grouped.Totals.LossMw, 9);
        Assert.Equal(plain.Branches.Single(b => b.Id == "T1").PFromMw, grouped.Branches.Single(b => b.Id == "T1").PFromMw, 9);
    }

    [Fact]
    public void A_given_phase_shift_replaces_the_vector_groups_and_is_warned_when_they_differ()
    {
        Network n = Radial("Dyn1", phaseShiftDeg: 0);
        LoadFlowResult r = Solve(n);
        Assert.Equal(Solve(Radial(null)).Buses[1].AngleDeg, r.Buses[1].AngleDeg, 9);
        Problem p = NetworkValidator.Validate(n).Problems.Single(x => x.Field == "phaseShiftDeg");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("does not use the displacement of vector group Dyn1 (30°", p.Message);
        Assert.DoesNotContain(NetworkValidator.Validate(Radial("Dyn1", 30)).Problems, x => x.Field == "phaseShiftDeg");
    }

    [Fact]
    public void Explain_states_the_displacement_and_where_it_comes_from()
    {
        ElementExplanation e = Explainer.Explain(Radial("Dyn11"), "T1");
        DerivationStep phi = e.Steps.Single(s => s.Label == "φ");
        Assert.Equal(-30 * Math.PI / 180, phi.Value, 12);
        Assert.Contains("vector group Dyn11: lv lags hv by clock · 30° = 11 · 30°, i.e. it leads by 30°; phaseShiftDeg not given", phi.Formula);
        Assert.Contains("given, so the vector group Dyn11 does not set it", Explainer.Explain(Radial("Dyn11", 5), "T1").Steps.Single(s => s.Label == "φ").Formula);
    }

    [Fact]
    public void Banks_in_parallel_with_different_clock_numbers_are_an_error_naming_both()
    {
        Network n = Radial("Dyn1");
        n = n with { Transformers = [.. n.Transformers, n.Transformers[0] with { Id = "T2", VectorGroup = "Dyn11" }] };
        Problem p = Assert.Single(NetworkValidator.Validate(n).Errors);
        Assert.Equal("T2", p.ElementId);
        Assert.Contains("parallel paths through transformers", p.Message);
        Assert.Contains("T1 (Dyn1)", p.Message);
        Assert.Contains("T2 (Dyn11)", p.Message);
        Assert.Contains("differ in phase displacement by 60°", p.Message);
        // Equal clock numbers run in parallel.
        Network same = n with { Transformers = [n.Transformers[0], n.Transformers[0] with { Id = "T2" }] };
        Assert.False(NetworkValidator.Validate(same).HasErrors);
    }

    [Fact]
    public void A_loop_closed_by_a_line_through_two_banks_of_different_groups_is_an_error()
    {
        Network n = Radial("Dyn1");
        n = n with
        {
            Buses = [.. n.Buses, new Bus { Id = "LV2", Kv = 33 }],
            Transformers = [.. n.Transformers, n.Transformers[0] with { Id = "T2", Lv = "LV2", VectorGroup = "YNd11" }],
            Lines = [.. n.Lines, n.Lines[0] with { Id = "TIE", From = "LV2", To = "FAR" }],
        };
        Problem p = Assert.Single(NetworkValidator.Validate(n).Errors);
        Assert.Contains("T1 (Dyn1)", p.Message);
        Assert.Contains("T2 (YNd11)", p.Message);
        Assert.Contains("differ in phase displacement by 60°", p.Message);
    }

    [Fact]
    public void A_three_winding_banks_windings_sit_behind_by_their_own_clock_numbers()
    {
        Network Bank(string group) => new()
        {
            Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "MV", Kv = 33 }, new Bus { Id = "LV", Kv = 11 }],
            Supplies = [new Supply { Id = "GRID", Bus = "HV", ScMvaMax = 5000, Xr = 15 }],
            ThreeWindingTransformers =
            [
                new ThreeWindingTransformer
                {
                    Id = "T3", Hv = "HV", Mv = "MV", Lv = "LV", HvKv = 132, MvKv = 33, LvKv = 11, MvaHv = 60, MvaMv = 60, MvaLv = 20,
                    ZHmPercent = 12, ZHlPercent = 20, ZMlPercent = 7, ZBaseMva = 60, Xr = 30, VectorGroup = group,
                },
            ],
            Loads = [new Load { Id = "LMV", Bus = "MV", PMw = 30, QMvar = 10 }, new Load { Id = "LLV", Bus = "LV", PMw = 6, QMvar = 2 }],
        };
        LoadFlowResult plain = Solve(Bank("YNyn0yn0"));
        LoadFlowResult grouped = Solve(Bank("YNyn0d1"));
        Assert.Equal(plain.Buses[2].VPu, grouped.Buses[2].VPu, 9);
        Assert.Equal(plain.Buses[1].AngleDeg, grouped.Buses[1].AngleDeg, 6);
        Assert.Equal(plain.Buses[2].AngleDeg - 30, grouped.Buses[2].AngleDeg, 6);
    }

    [Fact]
    public void Fault_levels_do_not_depend_on_the_clock_number_in_either_method()
    {
        // Dyn1 and Dyn11 have the same windings, so the same zero-sequence circuit; only the displacement
        // differs, and a radial network's currents are blind to it (symmetrical components, any text).
        foreach (FaultMethod method in new[] { FaultMethod.Iec60909, FaultMethod.LoadFlow })
        {
            var request = new FaultRequest { Method = method, Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth, FaultKind.LineToLine] };
            FaultResult a = FaultStudy.Run(PerUnitModel.Build(Radial("Dyn1")), request);
            FaultResult b = FaultStudy.Run(PerUnitModel.Build(Radial("Dyn11")), request);
            for (int i = 0; i < a.Faults.Count; i++)
            {
                Assert.Equal(a.Faults[i].IkKa!.Value, b.Faults[i].IkKa!.Value, 9);
                // At the faulted bus itself no displacement is crossed: its phase voltages agree exactly.
                PhaseVoltages va = a.Faults[i].Voltages[0], vb = b.Faults[i].Voltages[0];
                Assert.Equal((va.VaPu, va.VbPu, va.VcPu), (vb.VaPu, vb.VbPu, vb.VcPu), (x, y) =>
                    Math.Abs(x.Item1 - y.Item1) < 1e-9 && Math.Abs(x.Item2 - y.Item2) < 1e-9 && Math.Abs(x.Item3 - y.Item3) < 1e-9);
            }
        }
    }
}
