// Entry point of fault studies: sequence networks once, then every requested bus and fault type, then breaker duty.
using System.Numerics;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// <c>FaultStudy.Run(model, request) -> FaultResult</c>: builds and factorises each sequence network
/// once (<see cref="SequenceNetworks"/>), takes one Z-bus column per network per faulted bus
/// (<see cref="FaultScan"/>), and checks every breaker (<see cref="BreakerDutyCheck"/>).
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
            model = WithSolvedTaps(model, flow);
            (preFault, voltage) = Voltages(model, flow);
            notes.Add("load-flow method: branch contributions are the fault-induced change, without the pre-fault load current");
        }

        bool earth = false;
        foreach (FaultKind kind in request.Kinds) earth |= kind.InvolvesEarth();
        var networks = SequenceNetworks.Build(model, request.Method, request.Level,
            earth && !request.LeaveOutEarthFaultsWithoutZeroSequence, voltage, notes);
        // Only reached without a zero sequence when the request allows it: the other kinds still run.
        IReadOnlyList<FaultKind> leftOut = earth && networks.Zero is null ? request.Kinds.Where(k => k.InvolvesEarth()).ToList() : [];
        if (leftOut.Count > 0) request = request with { Kinds = request.Kinds.Where(k => !k.InvolvesEarth()).ToList() };
        var scan = new FaultScan(model, networks, request, preFault);
        var faults = new List<ShortCircuitLevel>(buses.Length * request.Kinds.Count);
        foreach (int bus in buses)
        {
            cancel.ThrowIfCancellationRequested();
            scan.At(bus, faults);
        }
        if (request.Level == FaultLevel.Min)
            notes.Add("minimum levels: breaker duty below is against minimum fault levels; switchgear is rated against the maximum");
        return new FaultResult
        {
            Method = request.Method, Level = request.Level, Faults = faults,
            Breakers = BreakerDutyCheck.Evaluate(model.Breakers, faults),
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

    // The load flow may have moved on-load taps; the fault sees the network at those positions.
    private static PerUnitModel WithSolvedTaps(PerUnitModel model, LoadFlowResult flow)
    {
        for (int t = 0; t < model.Taps.Count && t < flow.Taps.Count; t++)
            if (flow.Taps[t].Id == model.Taps[t].Id && flow.Taps[t].Position != model.Taps[t].Position)
                model = model.WithTapPosition(t, flow.Taps[t].Position);
        return model;
    }

    private static (Complex[] PreFault, double[] Magnitude) Voltages(PerUnitModel model, LoadFlowResult flow)
    {
        int n = model.Buses.Count;
        var pre = new Complex[n];
        var magnitude = new double[n];
        foreach (BusResult b in flow.Buses)
        {
            if (!model.BusIndex.TryGetValue(b.Id, out int i) || !b.Energised) continue;
            pre[i] = Complex.FromPolarCoordinates(b.VPu, b.AngleDeg * Math.PI / 180);
            magnitude[i] = b.VPu;
        }
        return (pre, magnitude);
    }
}
