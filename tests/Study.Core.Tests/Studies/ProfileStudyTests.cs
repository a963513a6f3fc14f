// The profile study against closed forms, an independent tap sweep, and the snapshot load flow.
using System.Numerics;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.Core.Tests.Studies;

public sealed class ProfileStudyTests
{
    private static LoadProfile Constant(params (double Scale, double Hours)[] steps) => new()
    {
        Steps = steps.Select(s => new ProfileStep(null, s.Hours, [s.Scale])).ToList(),
    };

    /// <summary>
    /// Supply at 132 kV, two 132/33 kV units in one bank with no-load loss, a 33 kV line of pure
    /// resistance, and a constant-impedance load: a linear circuit, so the series current has a closed form.
    /// </summary>
    private static Network LinearFeeder() => new()
    {
        Name = "linear feeder",
        Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "MV", Kv = 33, VMin = 0.5, VMax = 1.5 }, new Bus { Id = "END", Kv = 33, VMin = 0.5, VMax = 1.5 }],
        Supplies = [new Supply { Id = "GRID", Bus = "HV", ScMvaMax = 3000, Xr = 10 }],
        Transformers =
        [
            new Transformer
            {
                Id = "T1", Hv = "HV", Lv = "MV", Mva = 20, Units = 2, HvKv = 132, LvKv = 33, ZPercent = 10, Xr = 10,
                VectorGroup = "Dyn11", NoLoad = new NoLoadLoss { I0Percent = 0.4, P0Kw = 40 },
            },
        ],
        Lines = [new Line { Id = "F1", From = "MV", To = "END", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 1.5, X = 0 } }],
        Loads = [new Load { Id = "L1", Bus = "END", PMw = 12, QMvar = 4, Zip = new ZipMix { Z = 1, I = 0, P = 0 } }],
    };

    [Fact]
    public void Load_and_no_load_loss_match_the_closed_form_of_a_linear_feeder()
    {
        // Closed form (common practice, circuit theory): the slack holds the hv bus at 1 pu, so the bank's
        // magnetising branch there draws P0·units·(V_hv/hvKv)² = 2 · 40 kW; the series current is
        // I = V / (Z_T + Z_L + Z_load) with Z_load = 1/conj(S) at 1 pu, and the load loss is |I|²·(R_T + R_L).
        Network n = LinearFeeder();
        PerUnitModel model = PerUnitModel.Build(n);
        PuBranch t = model.Branches.Single(b => b.Id == "T1"), l = model.Branches.Single(b => b.Id == "F1");
        Complex zLoad = 1.0 / Complex.Conjugate(new Complex(0.12, 0.04));
        Complex current = 1.0 / (t.Z + l.Z + zLoad);
        double loadLossMw = current.Magnitude * current.Magnitude * (t.Z.Real + l.Z.Real) * 100;

        ProfileResult r = StudyCase.Of(n).Profile(new ProfileRequest(), Constant((1, 8760)));
        Assert.Equal(0, r.StepsNotConverged);
        Assert.Equal(0.080 * 8760, r.Energy.NoLoadLossMwh, 6);
        Assert.Equal(loadLossMw * 8760, r.Energy.LoadLossMwh, 4);
        ProfileTransformer bank = r.Transformers.Single(x => x.Id == "T1");
        Assert.Equal(0.080 * 8760, bank.NoLoadLossMwh, 6);
        Assert.Equal(current.Magnitude * current.Magnitude * t.Z.Real * 100 * 8760, bank.LoadLossMwh, 4);
    }

    [Fact]
    public void Delivered_plus_generated_equals_consumed_plus_lost_on_every_step_of_the_demo()
    {
        StudyCase demo = StudyCase.Of(TestNetworks.Demo);
        double[] scales = [0.3, 0.55, 0.8, 1.0, 0.9, 0.45];
        foreach (double scale in scales)
        {
            ProfileEnergy e = demo.Profile(new ProfileRequest(), Constant((scale, 1))).Energy;
            Assert.Equal(e.DeliveredMwh + e.GeneratedMwh, e.ConsumedMwh + e.LossMwh, 6);
            Assert.Equal(e.LossMwh, e.LoadLossMwh + e.NoLoadLossMwh, 9);
            Assert.True(e.GeneratedMwh > 0 && e.DeliveredMwh > 0);
        }
        ProfileEnergy all = demo.Profile(new ProfileRequest(), Constant(scales.Select(s => (s, 1.0)).ToArray())).Energy;
        Assert.Equal(all.DeliveredMwh + all.GeneratedMwh, all.ConsumedMwh + all.LossMwh, 6);
    }

    [Fact]
    public void A_profile_of_one_snapshot_reproduces_the_load_flow_and_its_losses_times_the_hours()
    {
        // With the changers held (no regulation in either), a profile of identical steps is the snapshot repeated.
        Network n = TestNetworks.Demo;
        var options = LoadFlowOptions.Default with { RegulateTaps = false };
        LoadFlowResult snapshot = StudyCase.Of(n).Solve(new SolveRequest { Scenario = "winter-peak", Options = options });
        ProfileResult r = StudyCase.Of(n).Profile(new ProfileRequest { Scenario = "winter-peak", Options = options }, Constant((1, 2), (1, 3), (1, 19)));
        Assert.Equal(24, r.Hours);
        Assert.Equal(snapshot.Totals.LossMw * 24, r.Energy.LossMwh, 9);
        Assert.Equal(snapshot.Totals.LoadMw * 24, r.Energy.ConsumedMwh - snapshot.Totals.ShuntMw * 24, 9);
        foreach (BusResult b in snapshot.Buses)
        {
            ProfileBus p = r.Buses.Single(x => x.Id == b.Id);
            Assert.Equal(b.VPu, p.VMinPu, 12);
            Assert.Equal(b.VPu, p.VMaxPu, 12);
            Assert.Equal(b.Violation == ViolationKind.None ? 0 : 24, p.HoursOutside);
        }
        Assert.All(r.Transformers, t => Assert.Equal(0, t.TapOperations));
    }

    /// <summary>A 132/33 kV bank with an on-load changer holding its 33 kV bus at 1.00 pu ± 0.0075.</summary>
    private static Network Regulated() =>
        SmallNetworks.Transformer132To33(loadMw: 20, loadMvar: 8, zPercent: 12, tap: new TapChanger
        {
            Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-10, 10), Position = 0,
            Regulate = new TapRegulation { Bus = "LV", VTarget = 1.0, BandPu = 0.015 },
        });

    [Fact]
    public void A_load_step_that_needs_several_moves_makes_them_one_position_at_a_time_each_an_operation()
    {
        Network n = Regulated();
        ProfileResult r = StudyCase.Of(n).Profile(new ProfileRequest(), Constant((0.2, 1), (2.2, 1)));
        int first = r.Series.Positions[0][0], second = r.Series.Positions[1][0];

        // Independent reference: the positions solved one by one with the changer held, walking from the
        // first step's position toward the band; the changer stops at the first position inside it.
        int Settle(double scale, int from)
        {
            Network scaled = n with { Loads = n.Loads.Select(l => l with { PMw = l.PMw * scale, QMvar = l.QMvar * scale }).ToList() };
            double V(int p) => LoadFlowSolver.Solve(PerUnitModel.Build(scaled with
            {
                Transformers = [scaled.Transformers[0] with { Tap = scaled.Transformers[0].Tap! with { Position = p } }],
            }), LoadFlowOptions.Default with { RegulateTaps = false }).Buses.Single(b => b.Id == "LV").VPu;
            int p = from;
            // A lower hv position lowers the ratio and raises the lv voltage.
            while (V(p) < 0.9925 && p > -10) p--;
            while (V(p) > 1.0075 && p < 10) p++;
            return p;
        }
        Assert.Equal(Settle(0.2, 0), first);
        Assert.Equal(Settle(2.2, first), second);
        Assert.True(Math.Abs(second - first) >= 3, $"the load step should need several moves ({first} → {second})");
        Assert.Equal(Math.Abs(first) + Math.Abs(second - first), r.Transformers.Single().TapOperations);
        Assert.InRange(r.Series.Voltages[1][0], 0.9925, 1.0075);
        Assert.Contains(second, r.Transformers.Single().PositionsUsed);
    }

    [Fact]
    public void Hours_outside_the_band_count_each_step_at_its_own_length()
    {
        Network n = SmallNetworks.Transformer132To33(loadMw: 30, loadMvar: 12, zPercent: 14)
            with { Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "LV", Kv = 33, VMin = 0.95, VMax = 1.05 }] };
        ProfileResult r = StudyCase.Of(n).Profile(new ProfileRequest(), Constant((0.1, 7), (1.8, 2.5), (0.1, 3)));
        ProfileBus lv = r.Buses.Single(b => b.Id == "LV");
        Assert.True(lv.VMinPu < 0.95);
        Assert.Equal(2.5, lv.HoursOutside, 12);
    }

    [Fact]
    public void A_column_that_names_no_load_is_an_input_error_at_its_header_cell()
    {
        LoadProfile profile = Study.Core.Io.ProfileFile.Parse("time,L1,L9\n2027-01-01T00:00,1,1\n2027-01-01T01:00,1,1\n", "p.csv");
        var e = Assert.Throws<InputException>(() => StudyCase.Of(SmallNetworks.Transformer132To33(10, 2)).Profile(new ProfileRequest(), profile));
        Assert.Contains("column 'L9' names no load", e.Message);
        Assert.Equal((1, 9), (e.Line, e.Column));
    }
}
