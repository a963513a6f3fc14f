// The bank-choice study: each constraint alone makes a candidate infeasible, the cost arithmetic by hand, a stable ranking.
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Synthetic;

namespace Study.Core.Tests.Cases;

public sealed class BankChoiceTests
{
    private static readonly TapChanger OffCircuit = new() { PercentPerStep = 2.5, Range = new TapRange(-2, 2), Position = 0 };

    /// <summary>
    /// A 33 kV supply (300 MVA) feeding an 11 kV board LV through bank T (optionally with a second unit T2 in
    /// parallel), a short line to END with 10 MW + 3 Mvar, and a breaker on the board rated <paramref name="breakerKa"/>.
    /// </summary>
    private static Network Substation(bool parallel = false, double breakerKa = 12) => new()
    {
        Name = "test substation",
        Buses = [new Bus { Id = "SRC", Kv = 33 }, new Bus { Id = "LV", Kv = 11 }, new Bus { Id = "END", Kv = 11 }],
        Supplies = [new Supply { Id = "GRID", Bus = "SRC", ScMvaMax = 300, Xr = 10 }],
        Transformers = new[] { "T", "T2" }.Take(parallel ? 2 : 1).Select(id => new Transformer
        {
            Id = id, Hv = "SRC", Lv = "LV", Mva = 15, HvKv = 33, LvKv = 11, ZPercent = 8, Xr = 12, VectorGroup = "Dyn11",
            LvNeutral = new Earthing { Grounded = true }, Tap = OffCircuit, NoLoad = new NoLoadLoss { I0Percent = 0.3, P0Kw = 10 },
        }).ToList(),
        Lines = [new Line { Id = "FEED", From = "LV", To = "END", RatingMva = 20, Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.05, X = 0.1 },
            Z0 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.15, X = 0.3 } }],
        Loads = [new Load { Id = "L1", Bus = "END", PMw = 10, QMvar = 3 }],
        Breakers = [new Breaker { Id = "CB-LV", Bus = "LV", InterruptingKa = breakerKa, PeakKa = breakerKa * 2.5 }],
    };

    /// <summary>A unit that meets every constraint of <see cref="Substation"/>: 15 MVA, 10 %, taps ±2 × 2.5 %.</summary>
    private static BankCandidate Good(string id = "GOOD") => new()
    {
        Id = id, Mva = 15, ZPercent = 10, Tap = OffCircuit, NoLoad = new NoLoadLoss { I0Percent = 0.3, P0Kw = 11 }, LoadLossKw = 80, Price = 400_000,
    };

    private static BankChoiceRequest Request(double? llf = 0.35) => new()
    {
        TransformerId = "T", NoLoadRate = 5000, LoadRate = 1500, LossLoadFactor = llf,
    };

    private static BankChoiceResult Choose(Network network, params BankCandidate[] candidates) =>
        StudyCase.Of(network).Choose(Request(), new BankCandidates { Candidates = candidates });

    private static CandidateAssessment Only(BankChoiceResult r, string id) => r.Candidates.Single(c => c.Id == id);

    [Fact]
    public void A_suitable_unit_meets_every_constraint_and_is_recommended()
    {
        BankChoiceResult r = Choose(Substation(), Good());
        CandidateAssessment good = Only(r, "GOOD");
        Assert.True(good.Feasible, string.Join("; ", good.Reasons));
        Assert.Equal("GOOD", r.Recommended);
        Assert.NotNull(good.BestTap);
        Assert.True(good.MarginPu > 0);
        Assert.InRange(good.MaxDutyPercent!.Value, 10, 90);
        Assert.Equal("CB-LV", good.MaxDutyBreaker);
    }

    [Fact]
    public void A_unit_too_weak_for_the_band_fails_on_the_band_alone()
    {
        // 30 % and no taps: about 0.08 pu of drop at 10 MW + 3 Mvar, below the board's 0.95.
        var weak = Good("WEAK") with { ZPercent = 30, Tap = null };
        CandidateAssessment a = Only(Choose(Substation(), weak), "WEAK");
        CandidateReason only = Assert.Single(a.Reasons);
        Assert.Equal(BankConstraint.VoltageBand, only.Constraint);
        string reason = only.Text;
        Assert.StartsWith("with no tap range the bank leaves", reason);
        Assert.Contains("outside 0.95–1.05", reason);
        Assert.True(a.MarginPu < 0);
    }

    [Fact]
    public void A_unit_with_taps_that_cannot_reach_the_band_names_the_bus_and_the_best_position()
    {
        var weak = Good("WEAK") with { ZPercent = 30, Tap = OffCircuit with { PercentPerStep = 0.5 } };
        string reason = Assert.Single(Only(Choose(Substation(), weak), "WEAK").Reasons).Text;
        Assert.StartsWith("no tap position holds ", reason);
        Assert.Contains("(best ", reason);
    }

    [Fact]
    public void A_unit_too_small_for_the_load_fails_on_its_loading_alone()
    {
        // 8 MVA against 10.4 MVA of load; 6 % on 8 MVA is about the impedance in ohms of the 15 MVA unit at 8 %, so band and duty hold.
        var small = Good("SMALL") with { Mva = 8, ZPercent = 6, LoadLossKw = 50 };
        CandidateAssessment a = Only(Choose(Substation(), small), "SMALL");
        CandidateReason only = Assert.Single(a.Reasons);
        Assert.Equal(BankConstraint.Loading, only.Constraint);
        string reason = only.Text;
        Assert.Matches(@"^T loaded 1[23]\d % of its 8\.0 MVA with the loads as entered$", reason);
    }

    [Fact]
    public void A_unit_too_stiff_for_the_switchgear_fails_on_breaker_duty_alone()
    {
        // 30 MVA at 4 %: about 0.16 Ω at 11 kV against 0.65 Ω for the existing unit; the board's earth fault then exceeds 12 kA.
        var stiff = Good("STIFF") with { Mva = 30, ZPercent = 4, LoadLossKw = 120 };
        BankChoiceResult r = Choose(Substation(), stiff);
        CandidateAssessment a = Only(r, "STIFF");
        Assert.True(a.Reasons.Count > 0, $"duty {a.MaxDutyPercent}; notes: {string.Join("; ", r.Notes)}");
        // One reason per check over its rating, and nothing but breaker checks.
        Assert.All(a.Reasons, reason => Assert.Matches(@"^CB-LV (breaking|asymmetric breaking|making|short-time) duty \d+ %$", reason.Text));
        Assert.Contains(a.Reasons, reason => reason.Text.StartsWith("CB-LV breaking duty"));
        Assert.All(a.Reasons, reason => Assert.Equal(BankConstraint.BreakerDuty, reason.Constraint));
        Assert.True(a.MaxDutyPercent > 100);
    }

    [Fact]
    public void A_breaker_over_its_rating_with_the_existing_bank_as_well_is_a_note_not_a_reason()
    {
        // A 3 kA breaker on the board falls short whatever bank feeds it: the choice cannot hinge on it.
        BankChoiceResult r = Choose(Substation(breakerKa: 3), Good());
        CandidateAssessment a = Only(r, "GOOD");
        Assert.True(a.Feasible, string.Join("; ", a.Reasons));
        Assert.True(a.MaxDutyPercent > 100);
        Assert.Contains(r.Notes, n => n.StartsWith("CB-LV breaking duty is ") && n.EndsWith("with the existing T as well: its switchgear falls short whichever bank is bought"));
    }

    [Fact]
    public void A_unit_that_cannot_carry_the_load_with_its_parallel_unit_out_fails_on_n1_alone()
    {
        // 8 MVA at 8 % beside a 15 MVA unit: about a third of the load intact, all of it with T2 out.
        var half = Good("HALF") with { Mva = 8, ZPercent = 8, LoadLossKw = 50 };
        CandidateAssessment a = Only(Choose(Substation(parallel: true, breakerKa: 25), half), "HALF");
        CandidateReason only = Assert.Single(a.Reasons);
        Assert.Equal(BankConstraint.Outage, only.Constraint);
        string reason = only.Text;
        Assert.Matches(@"^with T2 out T is loaded 1\d\d % with the loads as entered$", reason);
        Assert.StartsWith("T2 out, T", a.N1WorstCase);
        Assert.True(a.N1WorstPct > 100);
    }

    [Fact]
    public void Data_a_candidate_contradicts_is_its_reason_with_the_file_line()
    {
        var odd = Good("ODD") with { Xr = 3 };  // 80 kW on 15 MVA at 10 % gives X/R ≈ 18.7
        BankChoiceResult r = StudyCase.Of(Substation()).Choose(Request(),
            new BankCandidates { Candidates = [odd], Source = "offers.json", Lines = new Dictionary<string, int> { ["ODD"] = 7 } });
        CandidateReason only = Assert.Single(Only(r, "ODD").Reasons);
        Assert.Equal(BankConstraint.CandidateData, only.Constraint);
        string reason = only.Text;
        Assert.StartsWith("offers.json:7: candidate ODD: xr 3.00 disagrees with its load loss", reason);
        Assert.Null(r.Recommended);
    }

    [Fact]
    public void Total_owning_cost_is_price_plus_capitalised_no_load_and_load_loss()
    {
        // Total owning cost = price + A·P0 + B·Pk, the usual utility loss evaluation (common practice).
        // Two units of 12 kW no-load and 90 kW load loss each, A = 5000 and B = 1500 per kW, price 500 000:
        // 500 000 + 5000 × 24 + 1500 × 180 = 500 000 + 120 000 + 270 000 = 890 000 (worked by hand).
        var pair = Good("PAIR") with { Mva = 7.5, Units = 2, NoLoad = new NoLoadLoss { I0Percent = 0.3, P0Kw = 12 }, LoadLossKw = 90, Price = 500_000 };
        CandidateAssessment a = Only(Choose(Substation(), pair), "PAIR");
        Assert.Equal(24, a.NoLoadLossKw, 9);
        Assert.Equal(180, a.LoadLossKw, 9);
        Assert.Equal(390_000, a.CapitalisedLosses, 6);
        Assert.Equal(890_000, a.TotalOwningCost, 6);
    }

    [Fact]
    public void Peak_load_loss_is_the_rated_load_loss_scaled_by_the_square_of_the_current()
    {
        // Load loss at current I is Pk·(I/I_r)² (IEC 60076-1, load loss referred to rated current). The
        // bank here has no taps, so its lv current is the winding current; I_r = S_r / (√3 · 11 kV).
        var fixedRatio = Good("FIXED") with { Tap = null, ZPercent = 8 };
        CandidateAssessment a = Only(Choose(Substation(), fixedRatio), "FIXED");

        double xr = Math.Sqrt(0.08 * 0.08 - Math.Pow(80.0 / 15000, 2)) / (80.0 / 15000);
        Network replaced = Substation() with
        {
            Transformers = [Substation().Transformers[0] with { ZPercent = 8, Xr = xr, Tap = null, NoLoad = fixedRatio.NoLoad }],
        };
        LoadFlowResult flow = StudyCase.Of(replaced).Solve(new SolveRequest());
        double amps = flow.Branches.Single(b => b.Id == "T").IToA!.Value;
        double rated = 15e6 / (Math.Sqrt(3) * 11e3);
        double expected = 80 * Math.Pow(amps / rated, 2);
        Assert.Equal(expected, a.PeakLoadLossKw!.Value, expected * 0.005);

        // E = 8.76 · (P0 + LLF · P_peak) MWh with kW (the loss-load factor method, common practice).
        Assert.Equal(8.76 * (11 + 0.35 * a.PeakLoadLossKw.Value), a.EnergyLossMwh!.Value, 1e-9);
    }

    [Fact]
    public void A_flat_profile_over_a_year_gives_the_energy_of_a_loss_load_factor_of_one()
    {
        var flat = new LoadProfile { Steps = [new ProfileStep(null, 8760, [1.0])] };
        StudyCase study = StudyCase.Of(Substation());
        var candidates = new BankCandidates { Candidates = [Good() with { Tap = null, ZPercent = 8 }] };
        double byFactor = study.Choose(Request(llf: 1.0), candidates).Candidates[0].EnergyLossMwh!.Value;
        double byProfile = study.Choose(Request(llf: null), candidates, flat).Candidates[0].EnergyLossMwh!.Value;
        // The profile weighs no-load loss by (V_hv / hvKv)²; the supply holds the hv bus at 1.00 pu, so the two agree.
        Assert.Equal(byFactor, byProfile, byFactor * 0.002);
    }

    [Fact]
    public void The_ranking_puts_feasible_units_first_by_cost_and_does_not_depend_on_the_file_order()
    {
        BankCandidate[] offered =
        [
            Good("C-DEAR") with { Price = 480_000 },
            Good("A-CHEAP") with { Price = 380_000 },
            Good("B-SAME") with { Price = 380_000 },                     // equal cost: ordered by id
            Good("D-SMALL") with { Mva = 8, ZPercent = 6, Price = 1 },   // cheapest, but overloaded
        ];
        string[] Order(IEnumerable<BankCandidate> c) => Choose(Substation(), c.ToArray()).Candidates.Select(x => x.Id).ToArray();
        string[] expected = ["A-CHEAP", "B-SAME", "C-DEAR", "D-SMALL"];
        Assert.Equal(expected, Order(offered));
        Assert.Equal(expected, Order(offered.Reverse()));
        Assert.Equal(expected, Order([offered[2], offered[0], offered[3], offered[1]]));
        Assert.Equal("A-CHEAP", Choose(Substation(), offered).Recommended);
    }

    [Fact]
    public void On_a_generated_grid_a_per_unit_transformer_takes_candidates_and_the_missing_duty_is_a_note()
    {
        // The generated grid gives transformers in per unit between buses of one kV and no breakers:
        // the candidate takes the buses' kV as its nameplate, and the result says duty was not checked.
        Network grid = SyntheticGrid.Generate(new SyntheticGridOptions { Buses = 300, Seed = 3 }).Network;
        Transformer bank = grid.Transformers[0];
        BankCandidate unit(string id, double mva) => new()
        {
            Id = id, Mva = mva, ZPercent = 10, LoadLossKw = mva * 3, NoLoad = new NoLoadLoss { P0Kw = mva / 4, I0Percent = 0.2 }, Price = mva * 10_000,
            Tap = new TapChanger { PercentPerStep = 1.25, Range = new TapRange(-8, 8) },
        };
        BankChoiceResult r = StudyCase.Of(grid).Choose(Request() with { TransformerId = bank.Id },
            new BankCandidates { Candidates = [unit("BIG", 400), unit("MID", 200)] });
        Assert.Equal(2, r.Candidates.Count);
        Assert.All(r.Candidates, c => Assert.NotNull(c.EnergyLossMwh));
        Assert.All(r.Candidates, c => Assert.Null(c.MaxDutyPercent));
        Assert.Contains(r.Notes, n => n.EndsWith("fault duty not checked", StringComparison.Ordinal));
        Assert.Equal("MID", r.Recommended);
    }

    [Fact]
    public void Requests_the_study_cannot_answer_are_refused_with_the_reason()
    {
        StudyCase study = StudyCase.Of(Substation());
        var candidates = new BankCandidates { Candidates = [Good()] };
        Assert.Contains("no two-winding transformer with id NOPE",
            Assert.Throws<InputException>(() => study.Choose(Request() with { TransformerId = "NOPE" }, candidates)).Message);
        Assert.Contains("--loss-load-factor",
            Assert.Throws<InputException>(() => study.Choose(Request(llf: null), candidates)).Message);
        Assert.Contains("loss-load factor 1.5",
            Assert.Throws<InputException>(() => study.Choose(Request(llf: 1.5), candidates)).Message);
        Assert.Contains("loss rates",
            Assert.Throws<InputException>(() => study.Choose(Request() with { LoadRate = -1 }, candidates)).Message);
        Assert.Contains("is for transformer T9",
            Assert.Throws<InputException>(() => study.Choose(Request(), candidates with { Transformer = "T9" })).Message);
        Assert.Contains("watched bus X1",
            Assert.Throws<InputException>(() => study.Choose(Request() with { WatchBuses = ["X1"] }, candidates)).Message);
    }
}
