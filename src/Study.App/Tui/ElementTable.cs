// The table of one element kind: a column per field, headers with units, one row per element.
using Study.Core.Model;

namespace Study.App.Tui;

/// <summary>Builds the text table of a kind from its field list (the same list the edit form uses).</summary>
public static class ElementTable
{
    public static TextTableSource Build(Network network, ElementKind kind)
    {
        IReadOnlyList<ElementField> fields = ElementFields.For(kind);
        var rows = ElementLists.Of(kind).Items(network).Select(e => fields.Select(f => f.Read(e)).ToArray()).ToList();
        return new TextTableSource(fields.Select(f => f.Header).ToArray(), rows);
    }
}
