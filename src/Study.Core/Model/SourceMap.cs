// Remembers the file and line each element was read from, so messages can point at it.
namespace Study.Core.Model;

/// <summary>File name and the line of each element, keyed by element family and id.</summary>
public sealed class SourceMap
{
    public static SourceMap Empty { get; } = new(null, new Dictionary<string, int>());

    private readonly IReadOnlyDictionary<string, int> lines;

    public SourceMap(string? file, IReadOnlyDictionary<string, int> lines)
    {
        File = file;
        this.lines = lines;
    }

    public string? File { get; }

    public static string Key(ElementFamily family, string id) => $"{family}/{id}";

    /// <summary>The 1-based line where the element starts, when known.</summary>
    public int? LineOf(ElementFamily family, string id) =>
        lines.TryGetValue(Key(family, id), out int line) ? line : null;
}
