// What `study explain` and the TUI show for one element: its inputs and the per-unit derivation.
using Study.Core.Model;

namespace Study.Core.Units;

/// <summary>One input as the file gives it, value already formatted (invariant culture) with its unit.</summary>
public sealed record ExplainedInput(string Name, string Value, string Unit);

/// <summary>
/// An element traced from its data to the system-base per-unit values the engine uses. Steps whose
/// <see cref="DerivationStep.Note"/> is set are defaults or assumptions, not data.
/// </summary>
public sealed record ElementExplanation(
    string Id, ElementKind Kind, string Title, IReadOnlyList<ExplainedInput> Inputs, IReadOnlyList<DerivationStep> Steps);
