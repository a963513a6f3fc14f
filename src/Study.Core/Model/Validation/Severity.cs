// How serious a validation problem is: errors stop a study, warnings are shown and the study runs.
namespace Study.Core.Model.Validation;

/// <summary>An error makes the network unusable for a study; a warning is data worth a second look.</summary>
public enum Severity
{
    Error,
    Warning,
}
