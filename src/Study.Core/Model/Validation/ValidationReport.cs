// Everything validation found in one network, errors and warnings together.
namespace Study.Core.Model.Validation;

/// <summary>All problems of a network, in file order by element kind, network-wide (island) problems last.</summary>
public sealed class ValidationReport
{
    public ValidationReport(IReadOnlyList<Problem> problems)
    {
        Problems = problems;
    }

    public IReadOnlyList<Problem> Problems { get; }

    /// <summary>True when at least one problem is an error: the network cannot be studied as it is.</summary>
    public bool HasErrors => Problems.Any(p => p.Severity == Severity.Error);

    public IEnumerable<Problem> Errors => Problems.Where(p => p.Severity == Severity.Error);

    public IEnumerable<Problem> Warnings => Problems.Where(p => p.Severity == Severity.Warning);

    /// <summary>The problems of one element, as an edit form shows them.</summary>
    public IEnumerable<Problem> For(ElementKind kind, string id) =>
        Problems.Where(p => p.Kind == kind && p.ElementId == id);

    /// <summary>One <see cref="Problem.Describe"/> line per problem.</summary>
    public string Describe() => string.Join('\n', Problems.Select(p => p.Describe()));
}
