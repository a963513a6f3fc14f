// `--csv DIR` for a comparison: buses.csv, branches.csv, violations.csv (appeared or cleared) and totals.csv.
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Cli.Compare;

public static class CompareCsv
{
    public static void Write(CaseComparisonResult r, string dir)
    {
        Directory.CreateDirectory(dir);
        CsvTable.Of(CompareColumns.Buses, r.Buses).Write(Path.Combine(dir, "buses.csv"));
        CsvTable.Of(CompareColumns.Branches, r.Branches).Write(Path.Combine(dir, "branches.csv"));
        CsvTable.Of(CompareColumns.Violations, CompareColumns.ViolationChanges(r)).Write(Path.Combine(dir, "violations.csv"));
        CsvTable.Of(CompareColumns.Totals, CompareColumns.TotalChanges(r)).Write(Path.Combine(dir, "totals.csv"));
    }
}
