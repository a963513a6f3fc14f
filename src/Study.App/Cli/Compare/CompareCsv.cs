// `--csv DIR` for a comparison: buses.csv, branches.csv, violations.csv (appeared or cleared) and totals.csv.
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Cli.Compare;

public static class CompareCsv
{
    public static void Write(CaseComparisonResult r, string dir) => CsvTable.WriteSet(dir,
        ("buses.csv", CsvTable.Of(CompareColumns.Buses, r.Buses)),
        ("branches.csv", CsvTable.Of(CompareColumns.Branches, r.Branches)),
        ("violations.csv", CsvTable.Of(CompareColumns.Violations, CompareColumns.ViolationChanges(r))),
        ("totals.csv", CsvTable.Of(CompareColumns.Totals, CompareColumns.TotalChanges(r))));
}
