// Every key of the network file can be edited in the TUI: each element kind's form has a field for it.
using System.Reflection;
using System.Text.Json.Serialization;
using Study.App.Tui.Editing;
using Study.Core.Model;

namespace Study.App.Tests.Tui;

/// <summary>
/// The keys come from the model records themselves (the names the file reader uses: camel case, nested
/// records as dotted paths such as "tap.regulate.bus" or "z0.r"), so a key added to the file without a
/// form field fails here instead of being uneditable in silence.
/// </summary>
public sealed class FieldCoverageTests
{
    public static TheoryData<ElementKind, Type> Kinds => new()
    {
        { ElementKind.Bus, typeof(Bus) }, { ElementKind.Supply, typeof(Supply) }, { ElementKind.Generator, typeof(Generator) },
        { ElementKind.Load, typeof(Load) }, { ElementKind.Shunt, typeof(Shunt) }, { ElementKind.Line, typeof(Line) },
        { ElementKind.Transformer, typeof(Transformer) }, { ElementKind.ThreeWindingTransformer, typeof(ThreeWindingTransformer) },
        { ElementKind.Motor, typeof(Motor) }, { ElementKind.Breaker, typeof(Breaker) }, { ElementKind.Scenario, typeof(Scenario) },
    };

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Every_key_of_the_file_has_a_field_in_the_form(ElementKind kind, Type record)
    {
        var keys = ElementFields.For(kind).Select(f => f.Key).OfType<string>().ToHashSet(StringComparer.Ordinal);
        var paths = new List<string>();
        Walk(record, "", paths);
        Assert.NotEmpty(paths);
        string[] missing = paths.Where(p => !keys.Contains(p) && !keys.Contains(Parent(p))).ToArray();
        Assert.True(missing.Length == 0, $"{kind}: no form field for {string.Join(", ", missing)}");
    }

    /// <summary>A field may edit a small record whole ("zip" as three numbers): its parts count as covered.</summary>
    private static string Parent(string path) => path.Contains('.') ? path[..path.LastIndexOf('.')] : path;

    private static void Walk(Type type, string prefix, List<string> paths)
    {
        foreach (PropertyInfo p in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            if (p.SetMethod is null || p.GetCustomAttribute<JsonIgnoreAttribute>() is not null) continue;
            string name = p.GetCustomAttribute<JsonPropertyNameAttribute>()?.Name ?? char.ToLowerInvariant(p.Name[0]) + p.Name[1..];
            Type t = Nullable.GetUnderlyingType(p.PropertyType) ?? p.PropertyType;
            if (t.Namespace == typeof(Bus).Namespace && t.IsClass) Walk(t, prefix + name + ".", paths);
            else paths.Add(prefix + name);
        }
    }
}
