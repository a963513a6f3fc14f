// Network files of version 1 name a line's impedance and a tap changer by other keys; these converters
// read those keys into today's model, so every older file still opens (study convert writes version 2).
using System.Text.Json;
using System.Text.Json.Serialization;
using Study.Core.Model;

namespace Study.Core.Io;

/// <summary>
/// Version 1 line keys: <c>lengthKm</c> with <c>rOhmPerKm</c>, <c>xOhmPerKm</c>, <c>bUsPerKm</c> (and
/// the zero-sequence <c>r0OhmPerKm</c>…), or totals <c>rOhm</c>, <c>xOhm</c>, <c>bUs</c>…, or system per
/// unit <c>rPu</c>, <c>xPu</c>, <c>bPu</c>…, one form per line. They map to <c>km</c>, <c>z1</c> and
/// <c>z0</c> on the matching basis.
/// </summary>
internal sealed class LineVersion1Converter : JsonConverter<Line>
{
    private static readonly string[] Keys =
    [
        "id", "from", "to", "lengthKm", "ratingMva", "inService",
        "rOhmPerKm", "xOhmPerKm", "bUsPerKm", "r0OhmPerKm", "x0OhmPerKm", "b0UsPerKm",
        "rOhm", "xOhm", "bUs", "r0Ohm", "x0Ohm", "b0Us",
        "rPu", "xPu", "bPu", "r0Pu", "x0Pu", "b0Pu",
    ];

    public override Line Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var values = Version1Object.Read(ref reader, Keys, numeric: k => k is not ("id" or "from" or "to" or "inService"));
        string id = values.Text("id"), from = values.Text("from"), to = values.Text("to");
        var forms = new List<(ImpedanceBasis Per, string Suffix)>();
        if (values.AnyOf("OhmPerKm", "UsPerKm")) forms.Add((ImpedanceBasis.PerKm, "PerKm"));
        if (values.AnyOf("Ohm", "Us")) forms.Add((ImpedanceBasis.WholeLine, ""));
        if (values.AnyOf("Pu")) forms.Add((ImpedanceBasis.PerUnit, "Pu"));
        if (forms.Count > 1)
            throw new JsonException("impedance given in more than one form (per km, ohm totals, per unit): give exactly one");
        SequenceImpedance? z1 = null, z0 = null;
        if (forms.Count == 1)
        {
            var (per, _) = forms[0];
            z1 = values.Sequence(per, "");
            z0 = values.Sequence(per, "0");
        }
        return new Line
        {
            Id = id, From = from, To = to, Km = values.Number("lengthKm"), Z1 = z1, Z0 = z0,
            RatingMva = values.Number("ratingMva"), InService = values.Flag("inService") ?? true,
        };
    }

    public override void Write(Utf8JsonWriter writer, Line value, JsonSerializerOptions options) =>
        throw new NotSupportedException("version 1 is only read; files are written as version 2");
}

/// <summary>
/// Version 1 tap keys: <c>side</c>, <c>stepPercent</c>, <c>min</c>, <c>max</c>, <c>neutral</c>,
/// <c>position</c>, <c>regulate</c>. Positions are counted from the neutral (ratio 1) position, so a
/// version 1 changer with neutral n and range min..max becomes range [min − n, max − n].
/// </summary>
internal sealed class TapChangerVersion1Converter : JsonConverter<TapChanger>
{
    private static readonly string[] Keys = ["side", "stepPercent", "min", "max", "neutral", "position", "regulate"];

    public override TapChanger Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        TapRegulation? regulate = null;
        var values = Version1Object.Read(ref reader, Keys, numeric: k => k is not ("side" or "regulate"),
            nested: (string key, ref Utf8JsonReader r) =>
            {
                regulate = JsonSerializer.Deserialize(ref r, (System.Text.Json.Serialization.Metadata.JsonTypeInfo<TapRegulation>)options.GetTypeInfo(typeof(TapRegulation)));
            });
        int neutral = values.Whole("neutral") ?? 0;
        string side = values.TextOrNull("side") ?? "hv";
        TapWinding winding = side switch
        {
            "hv" => TapWinding.Hv,
            "mv" => TapWinding.Mv,
            "lv" => TapWinding.Lv,
            _ => throw new JsonException("The JSON value could not be converted: side is \"hv\", \"mv\" or \"lv\""),
        };
        return new TapChanger
        {
            Winding = winding,
            PercentPerStep = values.Number("stepPercent") ?? 0,
            Range = new TapRange((values.Whole("min") ?? 0) - neutral, (values.Whole("max") ?? 0) - neutral),
            Position = (values.Whole("position") ?? 0) - neutral,
            Regulate = regulate,
        };
    }

    public override void Write(Utf8JsonWriter writer, TapChanger value, JsonSerializerOptions options) =>
        throw new NotSupportedException("version 1 is only read; files are written as version 2");
}

/// <summary>
/// The keys of one version 1 object, read strictly: an unknown key, a key given twice, a wrong type or a
/// number that is not finite is a <see cref="JsonException"/> worded like the serializer's own, so the
/// reader reports it at its line and column.
/// </summary>
internal sealed class Version1Object
{
    public delegate void NestedReader(string key, ref Utf8JsonReader reader);

    private readonly Dictionary<string, double?> numbers = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string?> texts = new(StringComparer.Ordinal);
    private readonly Dictionary<string, bool?> flags = new(StringComparer.Ordinal);

    public static Version1Object Read(ref Utf8JsonReader reader, IReadOnlyList<string> keys, Func<string, bool> numeric,
        NestedReader? nested = null)
    {
        if (reader.TokenType != JsonTokenType.StartObject) throw WrongType();
        var o = new Version1Object();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        while (reader.Read() && reader.TokenType != JsonTokenType.EndObject)
        {
            string key = reader.GetString()!;
            if (!keys.Contains(key))
                throw new JsonException($"The JSON property '{key}' could not be mapped to any .NET member contained in type 'version 1'.");
            if (!seen.Add(key)) throw new JsonException($"the key '{key}' is given twice in one object");
            reader.Read();
            if (nested is not null && !numeric(key) && reader.TokenType == JsonTokenType.StartObject)
            {
                nested(key, ref reader);
                continue;
            }
            switch (reader.TokenType)
            {
                case JsonTokenType.Null:
                    break;
                case JsonTokenType.Number when numeric(key):
                    if (!reader.TryGetDouble(out double v) || !double.IsFinite(v)) throw WrongType();
                    o.numbers[key] = v;
                    break;
                case JsonTokenType.String when !numeric(key):
                    o.texts[key] = reader.GetString();
                    break;
                case JsonTokenType.True or JsonTokenType.False when !numeric(key):
                    o.flags[key] = reader.GetBoolean();
                    break;
                default:
                    throw WrongType();
            }
        }
        return o;
    }

    public string Text(string key) => TextOrNull(key)
        ?? throw new JsonException($"JSON deserialization for type 'version 1' was missing required properties including: '{key}'.");

    public string? TextOrNull(string key) => texts.GetValueOrDefault(key);

    public double? Number(string key) => numbers.GetValueOrDefault(key);

    public bool? Flag(string key) => flags.GetValueOrDefault(key);

    public int? Whole(string key)
    {
        if (Number(key) is not double v) return null;
        if (v != Math.Floor(v) || v < int.MinValue || v > int.MaxValue) throw WrongType();
        return (int)v;
    }

    /// <summary>True when any key ending in one of the suffixes (after r, x, b, r0, x0, b0) holds a number.</summary>
    public bool AnyOf(params string[] suffixes) =>
        suffixes.Any(suffix => new[] { "r", "x", "b", "r0", "x0", "b0" }.Any(q => numbers.ContainsKey(q + suffix)));

    /// <summary>
    /// The sequence (<paramref name="seq"/> "" for positive, "0" for zero) on the basis given, or null
    /// when it gives neither r nor x; r without x (or x without r) is an error.
    /// </summary>
    public SequenceImpedance? Sequence(ImpedanceBasis per, string seq)
    {
        (string r, string x, string b) = per switch
        {
            ImpedanceBasis.PerKm => ($"r{seq}OhmPerKm", $"x{seq}OhmPerKm", $"b{seq}UsPerKm"),
            ImpedanceBasis.WholeLine => ($"r{seq}Ohm", $"x{seq}Ohm", $"b{seq}Us"),
            _ => ($"r{seq}Pu", $"x{seq}Pu", $"b{seq}Pu"),
        };
        double? rv = Number(r), xv = Number(x), bv = Number(b);
        if (rv is null && xv is null)
        {
            if (bv is not null) throw new JsonException($"{b} is given without {r} and {x}: give the series impedance too");
            return null;
        }
        if (rv is null || xv is null)
            throw new JsonException($"series impedance incomplete: give both {r} and {x}");
        return new SequenceImpedance { Per = per, R = rv.Value, X = xv.Value, B = bv };
    }

    private static JsonException WrongType() => new("The JSON value could not be converted.");
}
