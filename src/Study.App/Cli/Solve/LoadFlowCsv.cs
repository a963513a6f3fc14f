// `--csv DIR` for the load flow: one table per file.
using Study.App.Reports;
using Study.Core.LoadFlow;

namespace Study.App.Cli.Solve;

public static class LoadFlowCsv
{
    public static void Write(LoadFlowResult r, string dir)
    {
        Directory.CreateDirectory(dir);
        CsvTable.Of(LoadFlowColumns.Buses(), r.Buses).Write(Path.Combine(dir, "buses.csv"));
        CsvTable.Of(LoadFlowColumns.Branches, r.Branches).Write(Path.Combine(dir, "branches.csv"));
        CsvTable.Of(LoadFlowColumns.Taps, r.Taps).Write(Path.Combine(dir, "taps.csv"));
        CsvTable.Of(LoadFlowColumns.Violations, r.Violations).Write(Path.Combine(dir, "violations.csv"));
    }
}
