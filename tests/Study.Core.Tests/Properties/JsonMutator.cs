// Damages a network file the ways hand edits and broken transfers do: at the text level and at the JSON value level.
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using CsCheck;

namespace Study.Core.Tests.Properties;

internal static class JsonMutator
{
    private const string Raw = "@@raw@@";

    /// <summary>Values put in place of any JSON value: wrong types, extreme and non-finite numbers, odd strings.</summary>
    private static readonly string[] Replacements =
    [
        "\"text\"", "0", "-1", "1.5", "-0", "1e308", "-1e308", "1e400", "-1e400", "4e-320", "2147483648",
        "-2147483649", "9223372036854775808", "\"NaN\"", "\"Infinity\"", "\"-Infinity\"", "NaN", "Infinity",
        "null", "[]", "{}", "[{}]", "[null]", "true", "false", "\"\"", "\" \"", "\"Ωmega-bus é 变电站 🔌\"",
        "\"12\"", "[1, 2]", "{\"id\": \"X\"}", "\"slack\"", "\"mv\"", "3", "1e20", "-1e20", "1E+2", "\"\\u0000\"",
    ];

    /// <summary>Text put into the file at any place.</summary>
    private static readonly string[] Snippets =
    [
        "NaN", "Infinity", "null", "[]", "{}", ",", "\"", ":", "\uFEFF", "\r\n", "\r", "\t", "/*", "*/", "//c\n",
        "\"id\": \"B1\", ", "\"unknownKey\": 1, ", "\"inService\": false, ", "\\", "\\u12", "é", "\u0000", "-", "e", "1e999",
        "{\"id\": null}, ", "null, ", "{}, ",
    ];

    private static readonly char[] Palette =
        ['{', '}', '[', ']', '"', ',', ':', '0', '9', '-', 'e', '.', '\\', '\u0000', '\uFFFD', 'é', ' ', '\n', 'x', 'n', 't', '\u00A0', '\u2028'];

    public static Gen<MutationStep> Step { get; } =
        Gen.Select(Gen.Int[0, 11], Gen.Int[0, int.MaxValue], Gen.Int[0, 1000], Gen.Int[0, 1000],
            (kind, where, what, extra) => new MutationStep(kind, where, what, extra));

    /// <summary>A seed text (by index) and one to four edits.</summary>
    public static Gen<(int Seed, MutationStep[] Steps)> Mutations(int seedCount) =>
        Gen.Select(Gen.Int[0, seedCount - 1], Step.Array[1, 4], (seed, steps) => (seed, steps));

    public static string Apply(string text, IEnumerable<MutationStep> steps)
    {
        foreach (MutationStep step in steps) text = Apply(text, step);
        return text;
    }

    public static string Apply(string text, MutationStep s) => s.Kind switch
    {
        0 => text[..(s.Where % (text.Length + 1))],
        1 => Replace(text, s.Where, 1, Palette[s.What % Palette.Length].ToString()),
        2 => Replace(text, s.Where, 1 + s.Extra % 16, ""),
        3 => Replace(text, s.Where, 0, Snippets[s.What % Snippets.Length]),
        4 => LineEndings(text, s),
        5 => (s.What % 3) switch { 0 => "\uFEFF" + text, 1 => "\uFEFF\uFEFF" + text, _ => " \n\uFEFF" + text },
        6 => Structural(text, s, ReplaceValue),
        7 => Structural(text, s, RemoveKey),
        8 => Structural(text, s, EditArray),
        9 => Structural(text, s, AddKey),
        10 => Structural(text, s, CopyId),
        _ => FlipByte(text, s),
    };

    private static string Replace(string text, int where, int count, string with)
    {
        int at = where % (text.Length + 1);
        count = Math.Min(count, text.Length - at);
        return string.Concat(text.AsSpan(0, at), with, text.AsSpan(at + count));
    }

    private static string LineEndings(string text, MutationStep s)
    {
        string lf = text.Replace("\r\n", "\n");
        return (s.What % 4) switch
        {
            0 => lf.Replace("\n", "\r\n"),
            1 => lf.Replace("\n", "\r"),
            2 => MixedEndings(lf, s.Extra),
            _ => lf,
        };
    }

    private static string MixedEndings(string lf, int pattern)
    {
        var sb = new StringBuilder(lf.Length + 64);
        int k = 0;
        foreach (char c in lf)
        {
            if (c == '\n')
            {
                sb.Append(((pattern >> (k % 10)) & 1) == 1 ? "\r\n" : "\n");
                k++;
            }
            else sb.Append(c);
        }
        return sb.ToString();
    }

    /// <summary>A random byte of the UTF-8 encoding changed, read back as a file reader would (invalid bytes become U+FFFD).</summary>
    private static string FlipByte(string text, MutationStep s)
    {
        byte[] bytes = Encoding.UTF8.GetBytes(text);
        if (bytes.Length == 0) return text;
        int at = s.Where % bytes.Length;
        bytes[at] = (byte)(s.Extra % 2 == 0 ? bytes[at] ^ (1 << (s.What % 8)) : s.What % 256);
        return Encoding.UTF8.GetString(bytes);
    }

    private static string Structural(string text, MutationStep s, Func<JsonNode, MutationStep, bool> edit)
    {
        string json;
        try
        {
            JsonNode? root = JsonNode.Parse(text, documentOptions: new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip });
            if (root is null || !edit(root, s)) return text;
            json = root.ToJsonString(new JsonSerializerOptions { WriteIndented = s.Extra % 2 == 0 });
        }
        catch (Exception e) when (e is JsonException or ArgumentException or InvalidOperationException)
        {
            // Not (or no longer) a JSON document the node model accepts: damage the text instead.
            return Replace(text, s.Where, 0, Snippets[s.What % Snippets.Length]);
        }
        int raw = json.IndexOf($"\"{Raw}", StringComparison.Ordinal);
        if (raw < 0) return json;
        int end = json.IndexOf('"', raw + 1);
        int index = int.Parse(json.AsSpan(raw + 1 + Raw.Length, end - raw - 1 - Raw.Length), System.Globalization.CultureInfo.InvariantCulture);
        return string.Concat(json.AsSpan(0, raw), Replacements[index], json.AsSpan(end + 1));
    }

    /// <summary>Every node below the root with its parent, in document order.</summary>
    private static List<(JsonNode? Node, JsonNode Parent, string? Key, int Index)> Nodes(JsonNode root)
    {
        var all = new List<(JsonNode?, JsonNode, string?, int)>();
        void Walk(JsonNode node)
        {
            if (node is JsonObject o)
                foreach ((string key, JsonNode? child) in o.ToList())
                {
                    all.Add((child, o, key, -1));
                    if (child is not null) Walk(child);
                }
            else if (node is JsonArray a)
                for (int i = 0; i < a.Count; i++)
                {
                    all.Add((a[i], a, null, i));
                    if (a[i] is JsonNode child) Walk(child);
                }
        }
        Walk(root);
        return all;
    }

    private static bool ReplaceValue(JsonNode root, MutationStep s)
    {
        var nodes = Nodes(root);
        if (nodes.Count == 0) return false;
        var (_, parent, key, index) = nodes[s.Where % nodes.Count];
        JsonNode placeholder = JsonValue.Create($"{Raw}{s.What % Replacements.Length}");
        if (parent is JsonObject o) o[key!] = placeholder;
        else ((JsonArray)parent)[index] = placeholder;
        return true;
    }

    private static bool RemoveKey(JsonNode root, MutationStep s)
    {
        var keys = Nodes(root).Where(n => n.Key is not null).ToList();
        if (keys.Count == 0) return false;
        var (_, parent, key, _) = keys[s.Where % keys.Count];
        return ((JsonObject)parent).Remove(key!);
    }

    /// <summary>Duplicate an element (same id twice), insert a null entry, or empty the array.</summary>
    private static bool EditArray(JsonNode root, MutationStep s)
    {
        var arrays = Nodes(root).Where(n => n.Node is JsonArray).Select(n => (JsonArray)n.Node!).ToList();
        if (arrays.Count == 0) return false;
        JsonArray array = arrays[s.Where % arrays.Count];
        switch (s.What % 3)
        {
            case 0 when array.Count > 0:
                array.Add(array[s.Extra % array.Count]?.DeepClone());
                break;
            case 1:
                array.Insert(s.Extra % (array.Count + 1), null);
                break;
            default:
                array.Clear();
                break;
        }
        return true;
    }

    /// <summary>An unknown key, or a known key in the wrong object, with a value from the replacement list.</summary>
    private static bool AddKey(JsonNode root, MutationStep s)
    {
        string[] keys = ["id", "bus", "kv", "inService", "tap", "zip", "noLoad", "neutral", "regulate", "position", "surplus", "Id", "format", "version"];
        var objects = Nodes(root).Where(n => n.Node is JsonObject).Select(n => (JsonObject)n.Node!).Prepend((JsonObject)root).ToList();
        JsonObject target = objects[s.Where % objects.Count];
        target[keys[s.Extra % keys.Length]] = JsonValue.Create($"{Raw}{s.What % Replacements.Length}");
        return true;
    }

    /// <summary>One string value copied over another: duplicate ids, references to the wrong family, swapped buses.</summary>
    private static bool CopyId(JsonNode root, MutationStep s)
    {
        var strings = Nodes(root).Where(n => n.Node is JsonValue v && v.GetValueKind() == JsonValueKind.String).ToList();
        if (strings.Count < 2) return false;
        var (source, _, _, _) = strings[s.What % strings.Count];
        var (_, parent, key, index) = strings[s.Where % strings.Count];
        JsonNode copy = source!.DeepClone();
        if (parent is JsonObject o) o[key!] = copy;
        else ((JsonArray)parent)[index] = copy;
        return true;
    }
}
