// The state behind an element's edit form: field texts, the element they make, its problems and per-unit preview.
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.App.Tui.Editing;

/// <summary>What the current field texts amount to.</summary>
/// <param name="Element">The element the texts make; null when a text does not parse or the id is taken.</param>
/// <param name="Problems">Every finding, "error: …" or "warning: …", fields named by their labels.</param>
/// <param name="BadFields">The fields with an error, in form order (the first gets focus on a refused Enter).</param>
public sealed record FormState(object? Element, IReadOnlyList<string> Problems, IReadOnlyList<string> Preview, IReadOnlyList<int> BadFields)
{
    public bool HasErrors => Problems.Any(p => p.StartsWith("error", StringComparison.Ordinal));

    /// <summary>True when the texts make an element the validator finds no error in (the same rules as <c>study check</c>); warnings do not block.</summary>
    public bool CanAccept => Element is not null && !HasErrors;
}

/// <summary>
/// Edits one element as text fields. Each evaluation builds the element from all texts, places it in
/// a copy of the network and asks the same validator as <c>study check</c> about that element.
/// </summary>
public sealed class ElementForm
{
    private readonly Network network;
    private readonly object start;
    private FieldWords? words;

    /// <summary>Edits <paramref name="originalId"/>, or adds a new element when it is null.</summary>
    public ElementForm(Network network, ElementKind kind, string? originalId)
    {
        this.network = network;
        Kind = kind;
        OriginalId = originalId;
        start = originalId is null
            ? ElementFields.New(network, kind)
            : ElementLists.Find(network, kind, originalId) ?? throw new ArgumentException($"no {ElementKinds.Label(kind)} '{originalId}'");
        Fields = ElementFields.For(kind);
        Texts = Fields.Select(f => f.Read(start)).ToArray();
    }

    public ElementKind Kind { get; }

    /// <summary>The network the element is edited in (bus choices, validation).</summary>
    public Network Network => network;
    public string? OriginalId { get; }
    public IReadOnlyList<ElementField> Fields { get; }

    /// <summary>The text of each field, in the order of <see cref="Fields"/>; the form writes into it.</summary>
    public string[] Texts { get; }

    public string Title => OriginalId is null
        ? $"Add {ElementKinds.Label(Kind)}"
        : $"Edit {ElementKinds.Label(Kind)} {OriginalId}";

    /// <summary>True when any text differs from what the form opened with (Esc then asks before discarding).</summary>
    public bool Changed => Fields.Select((f, i) => f.Read(start) != Texts[i]).Any(x => x);

    public FormState Evaluate()
    {
        var problems = new List<string>();
        var bad = new SortedSet<int>();
        object element = start;
        // An existing element whose texts are as they opened is the element itself: writing the texts back
        // would round values finer than a field shows and make an edit of a form nobody changed.
        if (OriginalId is null || Changed)
        {
            for (int i = 0; i < Fields.Count; i++)
            {
                try
                {
                    element = Fields[i].Write(element, Texts[i]);
                }
                catch (FormatException e)
                {
                    problems.Add("error: " + e.Message);
                    bad.Add(i);
                }
            }
            if (problems.Count > 0) return new FormState(null, problems, [], bad.ToList());
            element = ElementFields.Finish(Kind, element);
        }

        string id = ElementLists.Of(Kind).IdOf(element);
        if (!ElementLists.IsIdFree(network, Kind, id, except: OriginalId))
            return new FormState(null, [$"error: {Fields[0].Header}: '{id}' is already used in this family of elements"], [], [0]);

        Network candidate = OriginalId is null
            ? ElementLists.Add(network, Kind, element)
            : ElementLists.Replace(network, Kind, OriginalId, element);
        if (Kind == ElementKind.Bus && OriginalId is not null && id != OriginalId)
            candidate = BusReferences.Rename(candidate, OriginalId, id);
        foreach (Problem p in NetworkValidator.ValidateElement(candidate, Kind, id))
        {
            string severity = p.Severity == Severity.Error ? "error" : "warning";
            string message = InLabels(p.Message);
            problems.Add(p.Field is null ? $"{severity}: {message}" : $"{severity}: {LabelOf(p.Field)}: {message}");
            if (p.IsError && p.Field is not null && FieldOf(p.Field) is int field) bad.Add(field);
        }
        return new FormState(element, problems, PerUnitPreview.Lines(candidate, Kind, id), bad.ToList());
    }

    /// <summary>The form's label, with its unit, for a file key ("Impedance %" for zPercent); the key itself when no field edits it.</summary>
    public string LabelOf(string key) => Words.LabelOf(key) ?? key;

    /// <summary>The first field editing <paramref name="key"/> or something inside it ("z0" finds "z0.r"); null when none does.</summary>
    public int? FieldOf(string key)
    {
        int exact = Fields.ToList().FindIndex(f => f.Key == key);
        if (exact >= 0) return exact;
        int inside = Fields.ToList().FindIndex(f => f.Key is { } k && k.StartsWith(key + ".", StringComparison.Ordinal));
        if (inside >= 0) return inside;
        int outer = Fields.ToList().FindIndex(f => f.Key is { } k && key.StartsWith(k + ".", StringComparison.Ordinal));
        return outer >= 0 ? outer : null;
    }

    /// <summary>
    /// A validator message in the form's words: every file key a field edits is replaced by that field's
    /// label, so "tap.position 9 is outside the range" reads "Present position 9 …".
    /// </summary>
    public string InLabels(string message) => Words.Replace(message);

    private FieldWords Words => words ??= FieldWords.ForMessages(Fields);
}
