// `--csv DIR` for the load flow: one table per file.
using Study.App.Reports;
using Study.Core.LoadFlow;

namespace Study.App.Cli.Solve;

public static class LoadFlowCsv
{
    public static void Write(LoadFlowResult r, string dir) => CsvTable.WriteSet(dir,
        ("buses.csv", CsvTable.Of(LoadFlowColumns.Buses(), r.Buses)),
        ("branches.csv", CsvTable.Of(LoadFlowColumns.Branches, r.Branches)),
        ("taps.csv", CsvTable.Of(LoadFlowColumns.Taps, r.Taps)),
        ("violations.csv", CsvTable.Of(LoadFlowColumns.Violations, r.Violations)));
}
