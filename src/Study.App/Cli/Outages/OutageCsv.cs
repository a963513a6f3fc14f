// `--csv DIR` for the outage screening: outages.csv (one row per outage and scenario) and new-violations.csv.
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Cli.Outages;

public static class OutageCsv
{
    public static void Write(OutageScreeningResult r, string dir) => CsvTable.WriteSet(dir,
        ("outages.csv", CsvTable.Of(OutageColumns.Outages, OutageColumns.Ranked(r))),
        ("new-violations.csv", CsvTable.Of(OutageColumns.NewViolations, OutageColumns.Violations(r))));
}
