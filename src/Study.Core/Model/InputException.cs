// The one exception type for bad input: it always says where (file, line, column or element id).
namespace Study.Core.Model;

/// <summary>An input problem a user can act on: a message with its location in a file or an element id.</summary>
public sealed class InputException : Exception
{
    public InputException(string message, string? file = null, int? line = null, int? column = null, string? elementId = null)
        : base(message)
    {
        File = file;
        Line = line;
        Column = column;
        ElementId = elementId;
    }

    public string? File { get; }
    public int? Line { get; }
    public int? Column { get; }
    public string? ElementId { get; }

    /// <summary>"file:line:column: message", with whatever parts are known.</summary>
    public string Describe()
    {
        var where = new List<string>();
        if (File is not null) where.Add(File);
        if (Line is not null) where.Add(Line.Value.ToString(System.Globalization.CultureInfo.InvariantCulture));
        if (Line is not null && Column is not null) where.Add(Column.Value.ToString(System.Globalization.CultureInfo.InvariantCulture));
        string prefix = where.Count > 0 ? string.Join(':', where) + ": " : "";
        string element = ElementId is not null ? $"{ElementId}: " : "";
        return prefix + element + Message;
    }
}
