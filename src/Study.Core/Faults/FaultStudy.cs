// Entry point of fault studies: sequence networks once, then every requested bus and fault type, then breaker duty.
using System.Numerics;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// <c>FaultStudy.Run(model, request) -> FaultResult</c>: builds and factorises each sequence network
/// once (<see cref="SequenceNetworks"/>), takes one Z-bus column per network per faulted bus
/// (<see cref="FaultScan"/>), and checks every breaker (<see cref="BreakerDutyCheck"/>). A power-station
/// unit's generator bus is scanned on networks of its own, with the factors for a fault at the terminals.
/// </summary>
public static class FaultStudy
{
    /// <summary>The caution every fault output carries (DEVELOPERS.md, Algorithms), shown alike by the CLI and the TUI.</summary>
    public const string Caution =
        "fault levels, equipment duty and protection settings from this program are planning estimates; they must be "
        + "confirmed by a licensed protection engineer against the governing local code and the utility's data before "
        + "equipment is specified, set or energised.";

    public static FaultResult Run(PerUnitModel model, FaultRequest? request = null, CancellationToken cancel = default)
    {
        request ??= FaultRequest.Default;
        request.Validate();
        int[] buses = SelectBuses(model, request.Buses);
        var notes = new List<string>();

        Complex[]? preFault = null;
        double[]? voltage = null;
        if (request.Method == FaultMethod.LoadFlow)
        {
            LoadFlowResult flow = request.PreFault
                ?? LoadFlowSolver.Solve(model, (request.LoadFlowOptions ?? LoadFlowOptions.Default) with { IncludeInternalBuses = true }, cancel);
            if (!flow.Converged)
                return new FaultResult
                {
                    Method = request.Method, Level = request.Level, PerUnitOnly = model.PerUnitOnly,
                    Failure = $"the pre-fault load flow did not converge: {flow.Message} (the iec60909 method needs no load flow)",
                };
            // The load flow may have moved on-load taps; the fault sees the network at those positions.
            model = model.WithSolvedTaps(flow);
            (preFault, voltage) = Voltages(model, flow);
            notes.Add("load-flow method: branch contributions are the fault-induced change, without the pre-fault load current");
        }

        bool earth = false;
        foreach (FaultKind kind in request.Kinds) earth |= kind.InvolvesEarth();
        // Power-station units take their own factor for both machines; a fault at a unit's generator
        // terminals sees K_G,S and K_T,S for that unit instead (IEC 60909-0 §6.7, from memory).
        IReadOnlyList<PowerStationUnit> units = request.Method == FaultMethod.Iec60909 ? PowerStationUnits.Find(model, notes) : [];
        double? lineC = request.Level == FaultLevel.Min ? request.LineTemperatureC : null;
        bool zeroRequired = earth && !request.LeaveOutEarthFaultsWithoutZeroSequence;
        SequenceNetworks Networks(PowerStationUnit? atTerminals) => SequenceNetworks.Build(model, request.Method, request.Level, zeroRequired, voltage, notes,
            units.ToDictionary(u => u.Source, u => u == atTerminals ? u.GeneratorAtTerminals : u.Unit),
            units.ToDictionary(u => u.Branch, u => u == atTerminals ? u.TransformerAtTerminals : u.Unit), lineC);
        SequenceNetworks networks = Networks(null);
        // Only reached without a zero sequence when the request allows it: the other kinds still run.
        IReadOnlyList<FaultKind> leftOut = earth && networks.Zero is null ? request.Kinds.Where(k => k.InvolvesEarth()).ToList() : [];
        if (leftOut.Count > 0) request = request with { Kinds = request.Kinds.Where(k => !k.InvolvesEarth()).ToList() };
        var scan = new FaultScan(model, networks, request, preFault);
        var terminalScans = new Dictionary<int, FaultScan>();
        var faults = new List<ShortCircuitLevel>(buses.Length * request.Kinds.Count);
        foreach (int bus in buses)
        {
            cancel.ThrowIfCancellationRequested();
            FaultScan at = scan;
            if (units.FirstOrDefault(u => u.GeneratorBus == bus) is { } unit)
            {
                if (!terminalScans.TryGetValue(bus, out at!))
                    terminalScans[bus] = at = new FaultScan(model, Networks(unit), request, preFault);
            }
            at.At(bus, faults);
        }
        if (request.Level == FaultLevel.Min)
            notes.Add("minimum levels: breaker duty below is against minimum fault levels; switchgear is rated against the maximum");
        if (model.Motors.Count > 0 && request.Level == FaultLevel.Max)
            notes.Add("steady-state I_k: I''k with the motors left out (far from generators: generators' decay not modelled)");
        foreach (PuBreaker b in model.Breakers.Where(b => b.BranchId is not null && b.Branch is null))
            notes.Add($"{b.Id}: branch {b.BranchId} is out of service (or not at bus {b.BusId}): its duty is that of its bus");
        if (request.Breaking == BreakingCurrent.Conservative)
            notes.Add("breaking current: I_b = I''k everywhere (conservative)");
        else if (faults.Any(f => f.BreakerCurrents.Any(c => !c.DecayCredited)))
            notes.Add("a breaker whose branch does not split the network takes I_b = I''k on both sides: no machine's decay is credited to either");
        return new FaultResult
        {
            Method = request.Method, Level = request.Level, Faults = faults,
            TMinS = request.TMinS, TkS = request.DurationS, Breaking = request.Breaking, LineTemperatureC = lineC,
            FrequencyHz = model.FrequencyHz,
            Breakers = BreakerDutyCheck.Evaluate(model.Breakers, faults, request.DurationS, model.BaseMva),
            Notes = notes.Distinct().ToList(), PerUnitOnly = model.PerUnitOnly,
            LeftOut = leftOut,
            MissingZeroSequence = leftOut.Count == 0 ? [] : networks.ZeroProblems.Select(p => new MissingData(p.ElementId ?? "", p.Message)).ToList(),
        };
    }

    private static int[] SelectBuses(PerUnitModel model, IReadOnlyList<string>? ids)
    {
        var selected = new List<int>();
        if (ids is null)
        {
            for (int i = 0; i < model.Buses.Count; i++) if (!model.Buses[i].IsInternal) selected.Add(i);
            return selected.ToArray();
        }
        foreach (string id in ids)
        {
            if (!model.BusIndex.TryGetValue(id, out int i) || model.Buses[i].IsInternal)
            {
                bool outOfService = model.OutOfServiceBuses.Contains(id);
                throw new InputException(outOfService ? $"bus {id} is out of service" : $"bus {id} not found", elementId: id);
            }
            if (!selected.Contains(i)) selected.Add(i);
        }
        return selected.ToArray();
    }

    private static (Complex[] PreFault, double[] Magnitude) Voltages(PerUnitModel model, LoadFlowResult flow)
    {
        int n = model.Buses.Count;
        var pre = new Complex[n];
        var magnitude = new double[n];
        // The load flow carries each bank's clock displacement in its ratio; the sequence networks leave it
        // out and turn voltages by the clock lag instead (SequenceBranches), so a solved voltage is taken into
        // their frame by undoing the displacements on the way to its bus (a turn of a whole island changes no magnitude).
        double[] frame = Admittance.PhaseShifts.Accumulated(model, b => b.GroupShiftRad, []);
        foreach (BusResult b in flow.Buses)
        {
            if (!model.BusIndex.TryGetValue(b.Id, out int i) || !b.Energised) continue;
            pre[i] = Complex.FromPolarCoordinates(b.VPu, b.AngleDeg * Math.PI / 180 + frame[i]);
            magnitude[i] = b.VPu;
        }
        return (pre, magnitude);
    }
}
