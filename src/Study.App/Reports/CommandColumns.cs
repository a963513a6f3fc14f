// The columns of the small tables the tool commands print: explain's data, bench's sizes and times, --timings.
using Study.App.Cli;
using Study.Core.LoadFlow;
using Study.Core.Units;

namespace Study.App.Reports;

/// <summary>One size of `study bench`: the network, the best of the repeated solves, and the fault scan when run.</summary>
public sealed record BenchRow(int Buses, int Branches, double GenerateMs, double BuildMs, LoadFlowResult Best, double? MaxErrorPu, double? ScanMs)
{
    public LoadFlowTimings Timings => Best.Timings!;
}

public static class CommandColumns
{
    /// <summary>The nameplate data of one element as `study explain` lists it.</summary>
    public static ColumnSpec<ExplainedInput> ExplainInputs { get; } = new ColumnSpec<ExplainedInput>()
        .Text("input", "input", i => i.Name)
        .Text("value", "value", i => i.Value, Align.Right)
        .Text("unit", "unit", i => i.Unit);

    public static ColumnSpec<BenchRow> Bench { get; } = new ColumnSpec<BenchRow>()
        .Integer("buses", "buses", null, b => b.Buses)
        .Integer("branches", "branches", null, b => b.Branches)
        .Integer("jacobianSize", "J size", null, b => b.Timings.JacobianSize)
        .Integer("jacobianNonZeros", "J nnz", null, b => b.Timings.JacobianNonZeros)
        .Integer("factorNonZeros", "L+U nnz", null, b => b.Timings.FactorNonZeros)
        .Integer("iterations", "iter", null, b => b.Best.Iterations, reads: b => b.Best.Converged ? Numbers.Integer(b.Best.Iterations) : "failed")
        .Number("generateMs", "generate", "ms", b => b.GenerateMs, 0)
        .Number("buildMs", "build", "ms", b => b.BuildMs, 1)
        .Number("admittanceMs", "Y", "ms", b => b.Timings.AdmittanceMs, 1)
        .Number("analyseMs", "analyse", "ms", b => b.Timings.AnalyseMs, 1)
        .Number("jacobianMs", "jacobian", "ms", b => b.Timings.JacobianMs, 1)
        .Number("factorMs", "factor", "ms", b => b.Timings.FactorMs, 1)
        .Number("solveMs", "solve", "ms", b => b.Timings.SolveMs, 1)
        .Number("totalMs", "total", "ms", b => b.Timings.TotalMs, 1)
        .Number("maxErrorPu", "max |dV|", "pu", b => b.MaxErrorPu, 1, reads: b => b.MaxErrorPu is double e ? Numbers.Exponent(e) : Numbers.Blank)
        .Number("faultScanMs", "3ph scan", "ms", b => b.ScanMs, 1);

    /// <summary>The stages of --timings; an inner stage ("solve.factor") is indented under its stage.</summary>
    public static ColumnSpec<StageTimeJson> Timings { get; } = new ColumnSpec<StageTimeJson>()
        .Words("stage", "stage", s => s.Stage, s => s.Stage.Contains('.') ? "  " + s.Stage[(s.Stage.IndexOf('.') + 1)..] : s.Stage)
        .Number("ms", "", "ms", s => s.Ms, 1);
}
