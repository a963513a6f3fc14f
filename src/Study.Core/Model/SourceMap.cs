// Remembers the file and line each element was read from, so messages can point at it.
namespace Study.Core.Model;

/// <summary>File name and the line of each element, keyed by element family and id.</summary>
/// <remarks>
/// The lines may be given up front or worked out on the first <see cref="LineOf"/>: most files are
/// clean, and a clean file then never pays for the scan that finds them.
/// </remarks>
public sealed class SourceMap
{
    public static SourceMap Empty { get; } = new(null, new Dictionary<string, int>());

    private readonly Lazy<IReadOnlyDictionary<string, int>> lines;

    public SourceMap(string? file, IReadOnlyDictionary<string, int> lines)
    {
        File = file;
        this.lines = new Lazy<IReadOnlyDictionary<string, int>>(lines);
    }

    /// <summary>A map whose lines are computed by <paramref name="lines"/> when first asked for (once, thread-safe).</summary>
    public SourceMap(string? file, Func<IReadOnlyDictionary<string, int>> lines)
    {
        ArgumentNullException.ThrowIfNull(lines);
        File = file;
        this.lines = new Lazy<IReadOnlyDictionary<string, int>>(lines, LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string? File { get; }

    /// <summary>What the reader noticed about the file as a whole (a version 1 file, say): one line each.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    public static string Key(ElementFamily family, string id) => $"{family}/{id}";

    /// <summary>The 1-based line where the element starts, when known.</summary>
    public int? LineOf(ElementFamily family, string id) =>
        lines.Value.TryGetValue(Key(family, id), out int line) ? line : null;
}
