// The --json shape of `study check`.
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.App.Cli.Files;

public sealed record CheckProblemJson(string Severity, string? Kind, string? Id, string? Field, int? Line, string Message);

public sealed record CheckJson(string File, int Errors, int Warnings, IReadOnlyList<CheckProblemJson> Problems)
{
    public static CheckJson From(string file, ValidationReport report)
    {
        var problems = report.Problems.Select(p => new CheckProblemJson(
            p.Severity == Severity.Error ? "error" : "warning",
            p.Kind is ElementKind k ? ElementKinds.Label(k) : null,
            p.ElementId, p.Field, p.Line, p.Message)).ToList();
        int errors = problems.Count(p => p.Severity == "error");
        return new CheckJson(file, errors, problems.Count - errors, problems);
    }
}
