// `--csv DIR` for the tap study: every position in every scenario, and the recommended positions.
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Cli.Taps;

public static class TapStudyCsv
{
    public static void Write(TapStudyResult r, string dir) => CsvTable.WriteSet(dir,
        ("positions.csv", CsvTable.Of(TapStudyColumns.Points(r), r.Points)),
        ("recommended.csv", CsvTable.Of(TapStudyColumns.Recommended, TapStudyColumns.Ranked(r))));
}
