// Tap changer of a transformer: which winding it is on, its range, and optional on-load regulation.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>The winding that carries the taps.</summary>
[JsonConverter(typeof(JsonStringEnumConverter<TapWinding>))]
public enum TapWinding
{
    [JsonStringEnumMemberName("hv")]
    Hv,
    [JsonStringEnumMemberName("lv")]
    Lv,
    [JsonStringEnumMemberName("mv")]
    Mv,
}

/// <summary>The positions a tap changer can take, <see cref="Lowest"/> to <see cref="Highest"/>; written as [lowest, highest].</summary>
[JsonConverter(typeof(TapRangeConverter))]
public readonly record struct TapRange(int Lowest, int Highest)
{
    /// <summary>Number of positions (0 when the range is reversed).</summary>
    public int Count => Math.Max(0, Highest - Lowest + 1);

    public bool Contains(int position) => position >= Lowest && position <= Highest;
}

/// <summary>On-load regulation: hold the voltage of a (local or remote) bus inside a dead band around VTarget.</summary>
public sealed record TapRegulation
{
    public TapRegulation() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal TapRegulation(string bus, double vTarget = 1.0, double bandPu = 0.015)
    {
        Bus = bus;
        VTarget = vTarget;
        BandPu = bandPu;
    }

    public required string Bus { get; init; }
    public double VTarget { get; init; } = 1.0;

    /// <summary>Width of the dead band, per unit: the tap rests while |V − vTarget| ≤ bandPu / 2.</summary>
    public double BandPu { get; init; } = 0.015;
}

/// <summary>
/// A tap changer. At position p the tapped winding's voltage is multiplied by 1 + p·PercentPerStep/100,
/// so position 0 is the rated ratio. Without <see cref="Regulate"/> it is a fixed (off-circuit) tap.
/// </summary>
public sealed record TapChanger
{
    public TapWinding Winding { get; init; } = TapWinding.Hv;

    /// <summary>Voltage change of one step, percent of the winding's rated voltage.</summary>
    public double PercentPerStep { get; init; }

    public TapRange Range { get; init; }

    /// <summary>The position now (for an on-load changer, where the load flow starts).</summary>
    public int Position { get; init; }

    public TapRegulation? Regulate { get; init; }

    /// <summary>The tapped winding's voltage factor at a position: 1 + position·PercentPerStep/100.</summary>
    public double FactorAt(int position) => 1.0 + position * PercentPerStep / 100.0;
}

/// <summary>Reads and writes a <see cref="TapRange"/> as a JSON array of two whole numbers, [lowest, highest].</summary>
internal sealed class TapRangeConverter : JsonConverter<TapRange>
{
    public override TapRange Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        if (reader.TokenType != JsonTokenType.StartArray)
            throw new JsonException("range must be an array of two whole numbers, [lowest, highest]");
        var values = new List<int>(2);
        while (reader.Read() && reader.TokenType != JsonTokenType.EndArray)
        {
            if (reader.TokenType != JsonTokenType.Number || !reader.TryGetInt32(out int v) || values.Count == 2)
                throw new JsonException("range must be an array of two whole numbers, [lowest, highest]");
            values.Add(v);
        }
        if (values.Count != 2) throw new JsonException("range must be an array of two whole numbers, [lowest, highest]");
        return new TapRange(values[0], values[1]);
    }

    public override void Write(Utf8JsonWriter writer, TapRange value, JsonSerializerOptions options)
    {
        // One line, as a person writes it: "range": [-8, 8].
        writer.WriteRawValue($"[{value.Lowest}, {value.Highest}]");
    }
}
