// Reads a load profile from CSV: a time column (ISO 8601) and either one "scale" column or one column per load id.
using System.Globalization;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.Core.Io;

/// <summary>
/// The profile CSV: a header row, then one row per step. Columns: <c>time</c> (ISO 8601, strictly
/// increasing; each row holds until the next one, the last for as long as the one before), and either
/// <c>scale</c> or one column per load id, each a scale on that load's P and Q (finite, not negative).
/// With a step length given, the time column may be left out. Every problem names the file, line and
/// column.
/// </summary>
public static class ProfileFile
{
    /// <summary>More rows than a year at one-minute steps is not a profile but a mistake (or a hostile file).</summary>
    public const int MaxSteps = 600_000;

    /// <summary>Files beyond this are refused before reading.</summary>
    public const long MaxBytes = 256L * 1024 * 1024;

    private static readonly string[] TimeFormats =
    [
        "yyyy-MM-dd'T'HH:mm:ssK", "yyyy-MM-dd'T'HH:mm:ss", "yyyy-MM-dd'T'HH:mmK", "yyyy-MM-dd'T'HH:mm",
        "yyyy-MM-dd HH:mm:ssK", "yyyy-MM-dd HH:mm:ss", "yyyy-MM-dd HH:mmK", "yyyy-MM-dd HH:mm", "yyyy-MM-dd",
        "yyyy-MM-dd'T'HH:mm:ss.FFFFFFFK", "yyyy-MM-dd'T'HH:mm:ss.FFFFFFF",
    ];

    /// <exception cref="InputException">The file cannot be read or is not a profile (with file, line and column).</exception>
    public static LoadProfile Read(string path, double? stepMinutes = null)
    {
        try
        {
            var info = new FileInfo(path);
            if (Directory.Exists(path)) throw new InputException("is a directory, not a profile CSV file", path);
            if (info.Exists && info.Length > MaxBytes)
                throw new InputException($"the file is {info.Length / (1024 * 1024)} MB; a profile is at most {MaxBytes / (1024 * 1024)} MB", path);
            return Parse(File.ReadAllText(path), path, stepMinutes);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"cannot read the profile: {e.Message}", path);
        }
    }

    /// <exception cref="InputException">The text is not a profile (with line and column).</exception>
    public static LoadProfile Parse(string text, string? fileName = null, double? stepMinutes = null)
    {
        if (stepMinutes is double m && !(m > 0 && m <= 525_600))
            throw new InputException($"the step of {m.ToString("G6", CultureInfo.InvariantCulture)} minutes is not between 0 and a year", fileName);
        var lines = new List<string>();
        foreach (string raw in text.TrimStart('\uFEFF').Split('\n'))
            lines.Add(raw.TrimEnd('\r'));
        while (lines.Count > 0 && lines[^1].Trim().Length == 0) lines.RemoveAt(lines.Count - 1);
        if (lines.Count == 0) throw new InputException("the profile is empty: give a header row (time and scale, or load ids) and one row per step", fileName, 1, 1);

        string[] header = lines[0].Split(',');
        int timeColumn = Array.FindIndex(header, h => h.Trim().Equals("time", StringComparison.OrdinalIgnoreCase));
        var valueColumns = Enumerable.Range(0, header.Length).Where(i => i != timeColumn).ToList();
        if (timeColumn < 0 && stepMinutes is null)
            throw new InputException("the header has no 'time' column: give ISO 8601 times, or the step length (--step-minutes)", fileName, 1, 1);
        if (valueColumns.Count == 0)
            throw new InputException("the header names no values: add a 'scale' column or one column per load id", fileName, 1, 1);
        var names = valueColumns.Select(i => header[i].Trim()).ToList();
        for (int k = 0; k < names.Count; k++)
        {
            int column = ColumnOf(lines[0], valueColumns[k]);
            if (names[k].Length == 0) throw new InputException("a header cell is empty: name a load id or 'scale'", fileName, 1, column);
            if (names.IndexOf(names[k]) != k) throw new InputException($"column '{names[k]}' is named twice", fileName, 1, column);
        }
        bool single = names.Count == 1 && names[0].Equals("scale", StringComparison.OrdinalIgnoreCase);
        if (!single && names.Any(n => n.Equals("scale", StringComparison.OrdinalIgnoreCase)))
            throw new InputException("give either one 'scale' column or one column per load id, not both",
                fileName, 1, ColumnOf(lines[0], valueColumns[names.FindIndex(n => n.Equals("scale", StringComparison.OrdinalIgnoreCase))]));

        if (lines.Count - 1 > MaxSteps)
            throw new InputException($"the profile has {lines.Count - 1} rows; at most {MaxSteps} steps are studied", fileName, MaxSteps + 2, 1);
        var times = new List<DateTimeOffset?>();
        var scales = new List<double[]>();
        for (int i = 1; i < lines.Count; i++)
        {
            string line = lines[i];
            if (line.Trim().Length == 0) throw new InputException("an empty row inside the profile", fileName, i + 1, 1);
            string[] cells = line.Split(',');
            if (cells.Length != header.Length)
                throw new InputException($"the row has {cells.Length} cells for {header.Length} columns", fileName, i + 1, 1);
            DateTimeOffset? time = null;
            if (timeColumn >= 0)
            {
                string t = cells[timeColumn].Trim();
                if (!DateTimeOffset.TryParseExact(t, TimeFormats, CultureInfo.InvariantCulture,
                        DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal, out DateTimeOffset parsed))
                    throw new InputException($"'{Shown(t)}' is not an ISO 8601 time such as 2027-01-15T18:00", fileName, i + 1, ColumnOf(line, timeColumn));
                if (times.Count > 0 && times[^1] is DateTimeOffset before && parsed <= before)
                    throw new InputException($"time {t} does not come after the row before ({before.UtcDateTime:yyyy-MM-ddTHH:mm:ss}): times must increase",
                        fileName, i + 1, ColumnOf(line, timeColumn));
                time = parsed;
            }
            var row = new double[valueColumns.Count];
            for (int k = 0; k < valueColumns.Count; k++)
            {
                string v = cells[valueColumns[k]].Trim();
                if (!double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !double.IsFinite(value))
                    throw new InputException($"'{Shown(v)}' is not a finite number (column {names[k]})", fileName, i + 1, ColumnOf(line, valueColumns[k]));
                if (value < 0)
                    throw new InputException($"scale {v} is negative (column {names[k]}): a load scale is 0 or more", fileName, i + 1, ColumnOf(line, valueColumns[k]));
                row[k] = value;
            }
            times.Add(time);
            scales.Add(row);
        }
        if (scales.Count == 0) throw new InputException("the profile has a header but no rows", fileName, 1, 1);

        var steps = new List<ProfileStep>(scales.Count);
        for (int i = 0; i < scales.Count; i++)
        {
            double hours;
            if (stepMinutes is double minutes) hours = minutes / 60;
            else if (i + 1 < scales.Count) hours = (times[i + 1]!.Value - times[i]!.Value).TotalHours;
            else if (i > 0) hours = steps[i - 1].Hours;
            else throw new InputException("a profile of one row has no step length: give --step-minutes", fileName, 2, 1);
            steps.Add(new ProfileStep(times[i], hours, scales[i]));
        }
        return new LoadProfile
        {
            Steps = steps, LoadIds = single ? null : names, Source = fileName,
            LoadColumns = single ? null : valueColumns.Select(c => ColumnOf(lines[0], c)).ToList(),
        };
    }

    /// <summary>The 1-based character column where cell <paramref name="index"/> of a comma-separated line starts.</summary>
    private static int ColumnOf(string line, int index)
    {
        int column = 1;
        for (int i = 0, cell = 0; i < line.Length && cell < index; i++, column++)
            if (line[i] == ',') cell++;
        return column;
    }

    /// <summary>A cell as a message shows it: control characters escaped, long text cut.</summary>
    private static string Shown(string text)
    {
        string cut = text.Length > 40 ? text[..40] + "…" : text;
        return string.Concat(cut.Select(c => char.IsControl(c) ? $"\\u{(int)c:x4}" : c.ToString()));
    }
}
