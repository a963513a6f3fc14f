// The load flow on random small networks: either a converged state whose books balance, or a clear failure.
using System.Collections;
using System.Reflection;
using Study.Core.Io;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Units;
using Xunit.Abstractions;

namespace Study.Core.Tests.Properties;

public class LoadFlowProperties(ITestOutputHelper output)
{
    [Fact]
    public void A_small_valid_network_converges_with_balanced_books_or_fails_with_a_message()
    {
        int converged = 0, failed = 0;
        int iterations = PropertyRun.Iterations(400);
        PropertyRun.ForAll("load flow on small networks", SmallSolvableNetworks.Gen, iterations,
            network =>
            {
                ValidationReport report = NetworkValidator.Validate(network);
                if (report.HasErrors) throw new InvalidOperationException($"generated network is invalid:\n{report.Describe()}");
                LoadFlowResult result = LoadFlowSolver.Solve(PerUnitModel.Build(network));
                RequireFinite(result, "result");
                if (result.Converged)
                {
                    converged++;
                    RequireBalancedBooks(result);
                }
                else
                {
                    failed++;
                    if (string.IsNullOrWhiteSpace(result.Message)) throw new InvalidOperationException("no convergence, and no message");
                }
            },
            NetworkFile.ToJson);
        output.WriteLine($"{iterations} networks: {converged} converged, {failed} did not");
        Assert.True(converged > iterations / 2, "fewer than half of the small valid networks converged");
        Assert.True(failed > 0, "no network failed to converge: the overloaded cases did not reach the failure path");
    }

    /// <summary>
    /// Generation = load + losses + shunt power, within 1e-6 of the largest quantity in MW; each branch's
    /// two end flows add up to exactly its loss; the totals are the sums of the bus and branch rows.
    /// </summary>
    private static void RequireBalancedBooks(LoadFlowResult r)
    {
        LoadFlowTotals t = r.Totals;
        double scale = Math.Max(1, Math.Max(Math.Abs(t.GenerationMw), Math.Abs(t.LoadMw)) + Math.Abs(t.LossMw) + Math.Abs(t.ShuntMw));
        double imbalance = t.GenerationMw - (t.LoadMw + t.LossMw + t.ShuntMw);
        if (Math.Abs(imbalance) > 1e-6 * scale)
            throw new InvalidOperationException($"power balance open by {imbalance:R} MW (generation {t.GenerationMw:R}, " +
                $"load {t.LoadMw:R}, losses {t.LossMw:R}, shunts {t.ShuntMw:R})");
        foreach (BranchResult b in r.Branches)
        {
            if (b.PFromMw + b.PToMw != b.LossMw)
                throw new InvalidOperationException($"branch {b.Id}: pFromMw {b.PFromMw:R} + pToMw {b.PToMw:R} is not lossMw {b.LossMw:R}");
        }
        Near("sum of branch losses", r.Branches.Sum(b => b.LossMw), t.LossMw, scale);
        Near("sum of bus generation", r.Buses.Sum(b => b.PGenMw), t.GenerationMw, scale);
        Near("sum of bus load", r.Buses.Sum(b => b.PLoadMw), t.LoadMw, scale);
        foreach (BusResult b in r.Buses)
            if (!(b.VPu > 0)) throw new InvalidOperationException($"bus {b.Id}: voltage {b.VPu:R} pu in a converged result");
    }

    private static void Near(string what, double actual, double expected, double scale)
    {
        if (Math.Abs(actual - expected) > 1e-9 * scale)
            throw new InvalidOperationException($"{what} is {actual:R}, the total says {expected:R}");
    }

    /// <summary>No NaN or infinity in any number of the result, nested lists included.</summary>
    internal static void RequireFinite(object? value, string path)
    {
        switch (value)
        {
            case null or string or bool or Enum:
                return;
            case double d:
                if (!double.IsFinite(d)) throw new InvalidOperationException($"{path} is {d}");
                return;
            case int or long:
                return;
            case IEnumerable list:
                int i = 0;
                foreach (object? item in list) RequireFinite(item, $"{path}[{i++}]");
                return;
        }
        foreach (PropertyInfo p in value.GetType().GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            if (p.GetIndexParameters().Length == 0) RequireFinite(p.GetValue(value), $"{path}.{p.Name}");
        }
    }
}
