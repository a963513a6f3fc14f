// One problem found in a network, with enough location for a user to find and fix it.
using System.Globalization;

namespace Study.Core.Model.Validation;

/// <summary>
/// A validation finding. <see cref="Field"/> is the network-file key (camelCase, dotted for nested
/// objects such as "tap.position"); <see cref="Message"/> is the sentence to act on, with the values.
/// </summary>
public sealed record Problem(
    Severity Severity,
    ElementKind? Kind,
    string? ElementId,
    string? Field,
    string Message,
    string? File = null,
    int? Line = null)
{
    public bool IsError => Severity == Severity.Error;

    /// <summary>"file:line: error: transformer T1 (hvKv): message", with whatever parts are known.</summary>
    public string Describe()
    {
        string where = (File, Line) switch
        {
            ({ } file, { } line) => $"{file}:{line.ToString(CultureInfo.InvariantCulture)}: ",
            ({ } file, null) => $"{file}: ",
            (null, { } line) => $"line {line.ToString(CultureInfo.InvariantCulture)}: ",
            _ => "",
        };
        string severity = Severity == Severity.Error ? "error" : "warning";
        return $"{where}{severity}: {Subject()}{Message}";
    }

    public override string ToString() => Describe();

    private string Subject()
    {
        string field = Field is null ? "" : $" ({Field})";
        if (Kind is not ElementKind kind) return Field is null ? "" : $"{Field}: ";
        string element = string.IsNullOrWhiteSpace(ElementId)
            ? $"{ElementKinds.Label(kind)} with no id"
            : $"{ElementKinds.Label(kind)} {ElementId}";
        return $"{element}{field}: ";
    }
}

/// <summary>An error makes the network unusable for a study; a warning is data worth a second look.</summary>
public enum Severity
{
    Error,
    Warning,
}
