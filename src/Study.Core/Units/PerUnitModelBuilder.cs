// Compiles a Network (engineering units) into the indexed per-unit PerUnitModel the solvers read.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

public sealed partial record PerUnitModel
{
    /// <summary>Things the build accepted but an engineer should see (negative series reactance, unregulated taps).</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>
    /// In-service buses are indexed 0..n−1 in file order, internal star buses after them; every
    /// in-service element whose buses are all in service is converted by the one routine for its kind.
    /// </summary>
    public static PerUnitModel Build(Network network, Scenario? scenario = null)
    {
        double baseMva = network.BaseMva;
        if (!(baseMva > 0) || !double.IsFinite(baseMva))
            throw new InputException($"baseMva must be positive (got {N(baseMva)})");

        var buses = new List<PuBus>();
        var index = new Dictionary<string, int>();
        var busById = new Dictionary<string, Bus>();
        foreach (var bus in network.Buses)
        {
            if (!busById.TryAdd(bus.Id, bus))
                throw new InputException($"bus id {bus.Id} is used twice", elementId: bus.Id);
            if (!bus.InService) continue;
            index[bus.Id] = buses.Count;
            buses.Add(new PuBus { Id = bus.Id, BaseKv = bus.Kv, VMin = bus.VMin, VMax = bus.VMax });
        }

        // Resolves a bus reference: false when the bus is out of service (the element is left out).
        bool Live(string busId, string elementId, out Bus bus)
        {
            if (!busById.TryGetValue(busId, out bus!))
                throw new InputException($"bus {busId} not found", elementId: elementId);
            return bus.InService;
        }

        var branches = new List<PuBranch>();
        var taps = new List<PuTap>();
        var warnings = new List<string>();
        var regulations = new List<(int Tap, string ElementId, TapRegulation Regulation)>();

        foreach (var line in network.Lines)
        {
            if (!line.InService || !Live(line.From, line.Id, out var from) || !Live(line.To, line.Id, out _)) continue;
            var c = LineImpedance.Convert(line, from, baseMva, recordSteps: false);
            branches.Add(new PuBranch
            {
                Id = line.Id, Kind = BranchKind.Line, From = index[line.From], To = index[line.To],
                Z = c.ZPu, B = c.BPu, Z0 = c.Z0Pu, B0 = c.B0Pu, RatingMva = line.RatingMva,
                ResistanceCoefficient = ConductorResistance.Coefficient(line.Conductor),
            });
        }

        foreach (var t in network.Transformers)
        {
            if (!t.InService || !Live(t.Hv, t.Id, out var hv) || !Live(t.Lv, t.Id, out var lv)) continue;
            var c = TransformerImpedance.Convert(t, hv, lv, baseMva, recordSteps: false);
            int? tapIndex = null;
            if (t.Tap is { } tap)
            {
                tapIndex = taps.Count;
                taps.Add(NewTap(t.Id, branches.Count, tap, c.HvFactor, c.LvFactor, factorAtFrom: false));
                if (tap.Regulate is { } reg) regulations.Add((tapIndex.Value, t.Id, reg));
            }
            PuNeutral hvNeutral = PuNeutral.Compile(t.HvNeutral, hv.Kv, baseMva, t.Id, "hvNeutral");
            PuNeutral lvNeutral = PuNeutral.Compile(t.LvNeutral, lv.Kv, baseMva, t.Id, "lvNeutral");
            branches.Add(new PuBranch
            {
                Id = t.Id, Kind = BranchKind.Transformer, From = index[t.Hv], To = index[t.Lv],
                Z = c.ZPu, Z0 = c.Z0Pu, B = c.BPu, Ratio = c.Ratio, ShiftRad = c.ShiftRad,
                GroupShiftRad = c.ShiftFromGroup ? c.ShiftRad : 0,
                MagnetisingY = c.MagnetisingY, RatingMva = c.RatingMva, Tap = tapIndex,
                Rating = TransformerRating.Of(t), Units = t.Units,
                Windings = PuWindings.Compile(t.Id, t.VectorGroup, threeWinding: false, hvNeutral, PuNeutral.NotStated, lvNeutral),
            });
        }

        foreach (var t in network.ThreeWindingTransformers)
        {
            if (!t.InService || !Live(t.Hv, t.Id, out var hv) || !Live(t.Mv, t.Id, out var mv) || !Live(t.Lv, t.Id, out var lv)) continue;
            var c = ThreeWindingStar.Convert(t, hv, mv, lv, baseMva, recordSteps: false);
            string starId = ThreeWindingStar.StarBusId(t.Id);
            if (index.ContainsKey(starId))
                throw new InputException($"bus id {starId} is reserved for the star point of {t.Id}", elementId: t.Id);
            int star = buses.Count;
            index[starId] = star;
            buses.Add(new PuBus { Id = starId, BaseKv = c.StarBaseKv, IsInternal = true });
            var windings = PuWindings.Compile(t.Id, t.VectorGroup, threeWinding: true,
                PuNeutral.Compile(t.HvNeutral, hv.Kv, baseMva, t.Id, "hvNeutral"),
                PuNeutral.Compile(t.MvNeutral, mv.Kv, baseMva, t.Id, "mvNeutral"),
                PuNeutral.Compile(t.LvNeutral, lv.Kv, baseMva, t.Id, "lvNeutral"));
            var rating = ThreeWindingRating.Of(t, mv.Kv, lv.Kv);
            foreach (var (w, terminal) in new[] { (c.Hv, t.Hv), (c.Mv, t.Mv), (c.Lv, t.Lv) })
            {
                int? tapIndex = null;
                if (t.Tap is { } tap && WindingName(tap.Winding) == w.Winding)
                {
                    tapIndex = taps.Count;
                    taps.Add(NewTap(t.Id, branches.Count, tap, w.WindingFactor, 1.0, factorAtFrom: true));
                    if (tap.Regulate is { } reg) regulations.Add((tapIndex.Value, t.Id, reg));
                }
                branches.Add(new PuBranch
                {
                    Id = t.Id, Kind = BranchKind.ThreeWindingTransformer, From = index[terminal], To = star,
                    Z = w.ZPu, Z0 = w.ZPu, Ratio = w.Ratio, ShiftRad = w.ShiftRad, GroupShiftRad = w.ShiftRad, RatingMva = w.RatingMva, Winding = w.Winding, Tap = tapIndex,
                    MagnetisingY = w.Winding == "hv" ? c.MagnetisingY : Complex.Zero,
                    ThreeWindingRating = rating, Windings = windings,
                });
            }
        }

        foreach (var b in branches.Where(b => b.Z.Imaginary < 0))
            warnings.Add($"{b.Id}{(b.Winding is null ? "" : $" ({b.Winding} winding)")}: negative series reactance {N(b.Z.Imaginary)} pu accepted");

        foreach (var (tapIndex, elementId, reg) in regulations)
        {
            if (!Live(reg.Bus, elementId, out _))
            {
                warnings.Add($"{elementId}: regulated bus {reg.Bus} is out of service; tap held at its position");
                continue;
            }
            taps[tapIndex] = taps[tapIndex] with { RegulatedBus = index[reg.Bus], VTarget = reg.VTarget, BandPu = reg.BandPu };
        }

        var sources = new List<PuSource>();
        foreach (var s in network.Supplies)
        {
            if (!s.InService || !Live(s.Bus, s.Id, out _)) continue;
            sources.Add(new PuSource
            {
                Id = s.Id, Kind = ElementKind.Supply, Bus = index[s.Bus], Mode = GeneratorMode.Slack,
                VSet = s.VSet, AngleRad = s.AngleDeg * Math.PI / 180.0, FaultData = SupplyFaultData.Of(s),
            });
        }
        double generationScale = scenario?.GenerationScale ?? 1.0;
        foreach (var g in network.Generators)
        {
            if (!g.InService || !Live(g.Bus, g.Id, out var bus)) continue;
            var c = GeneratorConversion.Convert(g, bus, baseMva, generationScale, recordSteps: false);
            sources.Add(new PuSource
            {
                Id = g.Id, Kind = ElementKind.Generator, Bus = index[g.Bus], Mode = g.Mode,
                P = c.P, Q = c.Q, VSet = c.VSet, AngleRad = c.AngleRad, QMin = c.QMin, QMax = c.QMax, Z1 = c.Z1Pu, Z2 = c.Z2Pu, Z0 = c.Z0Pu,
                Rating = GeneratorRating.Of(g), Neutral = PuNeutral.Compile(g.Neutral, bus.Kv, baseMva, g.Id, "neutral"),
            });
        }

        double loadScale = scenario?.LoadScale ?? 1.0;
        var loads = new List<PuLoad>();
        foreach (var l in network.Loads)
        {
            if (!l.InService || !Live(l.Bus, l.Id, out _)) continue;
            var c = LoadConversion.Convert(l, loadScale, baseMva, recordSteps: false);
            loads.Add(new PuLoad { Id = l.Id, Bus = index[l.Bus], P = c.P, Q = c.Q, Zip = c.Zip });
        }
        // A running motor is a constant-power load to every load flow, scaled by the scenario like the other loads.
        var motors = new List<PuMotor>();
        foreach (var m in network.Motors)
        {
            if (!m.InService || !Live(m.Bus, m.Id, out var bus)) continue;
            var c = MotorConversion.Convert(m, bus, baseMva, loadScale, recordSteps: false);
            loads.Add(new PuLoad { Id = m.Id, Bus = index[m.Bus], P = c.P, Q = c.Q, Motor = true });
            motors.Add(new PuMotor
            {
                Id = m.Id, Bus = index[m.Bus], ZPu = c.ZPu, ROverX = c.ROverX, RatedCurrentPu = c.RatedCurrentPu, RatedMva = c.RatedMva,
                MwPerPolePair = c.MwPerPolePair, LowVoltage = c.LowVoltage, LockedRotorZPu = c.LockedRotorZPu, CurrentRatio = c.CurrentRatio,
                Starter = m.Starter ?? new MotorStarter(), Units = m.Units,
            });
        }
        var shunts = new List<PuShunt>();
        foreach (var s in network.Shunts)
        {
            if (!s.InService || !Live(s.Bus, s.Id, out _)) continue;
            var c = ShuntConversion.Convert(s, baseMva, recordSteps: false);
            shunts.Add(new PuShunt { Id = s.Id, Bus = index[s.Bus], G = c.G, B = c.B });
        }

        var breakers = new List<PuBreaker>();
        foreach (var b in network.Breakers)
        {
            if (!b.InService || !Live(b.Bus, b.Id, out _)) continue;
            int busIndex = index[b.Bus];
            // The branch's end at the breaker's bus (for a three-winding bank, the winding there).
            int? branch = null;
            if (b.Branch is string branchId)
                for (int k = 0; k < branches.Count && branch is null; k++)
                    if (branches[k].Id == branchId && (branches[k].From == busIndex || branches[k].To == busIndex)) branch = k;
            breakers.Add(new PuBreaker
            {
                Id = b.Id, Bus = busIndex, BusId = b.Bus, BranchId = b.Branch, Branch = branch,
                InterruptingKa = b.InterruptingKa, PeakKa = b.PeakKa, DcPercent = b.DcPercent,
                ShortTimeKa = b.ShortTimeKa, ShortTimeS = b.ShortTimeS ?? 1.0, MinTripS = b.MinTripS,
            });
        }

        return new PerUnitModel
        {
            Name = network.Name, Scenario = scenario, BaseMva = baseMva, FrequencyHz = network.FrequencyHz,
            PerUnitOnly = network.IsPerUnitOnly,
            OutOfServiceBuses = network.Buses.Where(b => !b.InService).Select(b => b.Id).ToHashSet(),
            Buses = buses, Branches = branches, Sources = sources, Loads = loads, Shunts = shunts, Taps = taps,
            Breakers = breakers, Motors = motors, BusIndex = index, Warnings = warnings,
        };
    }

    /// <summary>
    /// The same model with one tap at another position: only that tap's Position and its branch's
    /// Ratio change, so a tap study or a regulation loop can step positions without a rebuild.
    /// </summary>
    public PerUnitModel WithTapPosition(int tapIndex, int position)
    {
        if (tapIndex < 0 || tapIndex >= Taps.Count)
            throw new ArgumentOutOfRangeException(nameof(tapIndex), tapIndex, $"the model has {Taps.Count} taps");
        var tap = Taps[tapIndex];
        if (position < tap.Min || position > tap.Max)
            throw new ArgumentOutOfRangeException(nameof(position), position, $"tap {tap.Id} ranges {tap.Min}..{tap.Max}");
        var newTaps = Taps.ToArray();
        newTaps[tapIndex] = tap with { Position = position };
        var newBranches = Branches.ToArray();
        newBranches[tap.Branch] = newBranches[tap.Branch] with { Ratio = tap.RatioAt(position) };
        return this with { Taps = newTaps, Branches = newBranches };
    }

    /// <summary>The same model with each tap at the position a solved load flow left it (on-load changers may have moved).</summary>
    public PerUnitModel WithSolvedTaps(LoadFlow.LoadFlowResult flow)
    {
        PerUnitModel model = this;
        for (int t = 0; t < Taps.Count && t < flow.Taps.Count; t++)
            if (flow.Taps[t].Id == Taps[t].Id && flow.Taps[t].Position != Taps[t].Position)
                model = model.WithTapPosition(t, flow.Taps[t].Position);
        return model;
    }

    /// <summary>
    /// The same model with every branch of element <paramref name="id"/> taken out (a line, a
    /// transformer, or the three winding branches of a three-winding bank, whose star bus is then left
    /// on its own and de-energised). Tap changers of the element go with it; the other branches and taps
    /// keep their order, so results list them as a build without the element would.
    /// </summary>
    public PerUnitModel WithoutBranch(string id)
    {
        var keptBranches = new List<PuBranch>(Branches.Count);
        var newIndex = new int[Branches.Count];
        for (int k = 0; k < Branches.Count; k++)
        {
            newIndex[k] = -1;
            if (Branches[k].Id == id) continue;
            newIndex[k] = keptBranches.Count;
            keptBranches.Add(Branches[k]);
        }
        if (keptBranches.Count == Branches.Count) return this;
        var keptTaps = new List<PuTap>(Taps.Count);
        var tapIndex = new int?[Taps.Count];
        for (int t = 0; t < Taps.Count; t++)
        {
            if (newIndex[Taps[t].Branch] < 0) continue;
            tapIndex[t] = keptTaps.Count;
            keptTaps.Add(Taps[t] with { Branch = newIndex[Taps[t].Branch] });
        }
        for (int k = 0; k < keptBranches.Count; k++)
            if (keptBranches[k].Tap is int t) keptBranches[k] = keptBranches[k] with { Tap = tapIndex[t] };
        // A breaker on the removed branch switches nothing now: its duty becomes that of its bus.
        var breakers = Breakers.Select(b => b.Branch is int k ? b with { Branch = newIndex[k] < 0 ? null : newIndex[k] } : b).ToList();
        return this with { Branches = keptBranches, Taps = keptTaps, Breakers = breakers };
    }

    private static PuTap NewTap(string id, int branch, TapChanger tap, double hvFactor, double lvFactor, bool factorAtFrom) => new()
    {
        Id = id, Branch = branch, Winding = tap.Winding, PercentPerStep = tap.PercentPerStep,
        Min = tap.Range.Lowest, Max = tap.Range.Highest, Position = tap.Position,
        HvFactor = hvFactor, LvFactor = lvFactor, FactorAtFrom = factorAtFrom, OnLoad = tap.Regulate is not null,
    };

    private static string WindingName(TapWinding winding) => winding switch
    {
        TapWinding.Hv => "hv",
        TapWinding.Mv => "mv",
        _ => "lv",
    };
}
