// An asynchronous motor (or a group of small low-voltage motors treated as one): a running load in the
// load flow, a source of fault current in fault studies, and a locked-rotor impedance when it starts.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>How a motor is started: straight on the line, or through a device that lowers its starting current.</summary>
[JsonConverter(typeof(JsonStringEnumConverter<StarterMethod>))]
public enum StarterMethod
{
    /// <summary>"direct": on line at full voltage; draws its whole locked-rotor current.</summary>
    [JsonStringEnumMemberName("direct")]
    Direct,

    /// <summary>"starDelta": started in star, so each winding sees 1/√3 of the voltage and the line current is one third.</summary>
    [JsonStringEnumMemberName("starDelta")]
    StarDelta,

    /// <summary>"autotransformer": started at <see cref="MotorStarter.TapPercent"/> of the voltage; the line current is (tap/100)² of direct.</summary>
    [JsonStringEnumMemberName("autotransformer")]
    Autotransformer,

    /// <summary>"softStarter": the current is held at <see cref="MotorStarter.CurrentLimit"/> times rated.</summary>
    [JsonStringEnumMemberName("softStarter")]
    SoftStarter,
}

/// <summary>The locked-rotor (starting) data of a motor.</summary>
public sealed record LockedRotor
{
    /// <summary>Locked-rotor current over rated current, I_LR/I_rM (5 to 7 is usual).</summary>
    public double? CurrentRatio { get; init; }

    /// <summary>Locked-rotor power factor; 0.3 taken when not given.</summary>
    public double? PowerFactor { get; init; }
}

/// <summary>The starter of a motor; absent means direct on line.</summary>
public sealed record MotorStarter
{
    public StarterMethod Method { get; init; } = StarterMethod.Direct;

    /// <summary>Autotransformer: the tap the motor starts on, percent of the line voltage.</summary>
    public double? TapPercent { get; init; }

    /// <summary>Soft starter: the current it holds, in multiples of the motor's rated current.</summary>
    public double? CurrentLimit { get; init; }
}

/// <summary>
/// A motor: rated mechanical output <see cref="Mw"/> at <see cref="Kv"/> with its rated power factor and
/// efficiency, <see cref="Units"/> identical machines in parallel (or, with <see cref="LowVoltageGroup"/>,
/// a group of small low-voltage motors given as one).
/// </summary>
public sealed record Motor
{
    public Motor() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Motor(string id, string bus, int units = 1, bool lowVoltageGroup = false, bool inService = true)
    {
        Id = id;
        Bus = bus;
        Units = units;
        LowVoltageGroup = lowVoltageGroup;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }

    /// <summary>Rated mechanical output P_rM of one unit, MW (of the whole group for a low-voltage group).</summary>
    public double? Mw { get; init; }

    /// <summary>Rated voltage U_rM, kV.</summary>
    public double? Kv { get; init; }

    /// <summary>Rated power factor cos φ_r.</summary>
    public double? PowerFactor { get; init; }

    /// <summary>Rated efficiency η_r (a fraction, 0.96 for 96 %).</summary>
    public double? Efficiency { get; init; }

    /// <summary>Pole pairs p; 1 taken when not given.</summary>
    public int? PolePairs { get; init; }

    /// <summary>Identical motors in parallel: they run, feed faults and start together.</summary>
    public int Units { get; init; } = 1;

    /// <summary>A group of small motors on a low-voltage board, treated as one (IEC 60909-0 gives such groups their own R/X).</summary>
    public bool LowVoltageGroup { get; init; }

    /// <summary>Running mechanical load in percent of rated output; 100 taken when not given.</summary>
    public double? LoadPercent { get; init; }

    public LockedRotor? LockedRotor { get; init; }
    public MotorStarter? Starter { get; init; }
    public bool InService { get; init; } = true;
}
