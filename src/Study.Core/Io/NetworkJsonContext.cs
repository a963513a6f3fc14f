// Source-generated System.Text.Json metadata for the network file.
using System.Text.Json.Serialization;
using Study.Core.Model;

namespace Study.Core.Io;

[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
    UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow,
    RespectRequiredConstructorParameters = true,
    WriteIndented = true,
    IndentSize = 2,
    AllowTrailingCommas = false,
    AllowDuplicateProperties = false,
    ReadCommentHandling = System.Text.Json.JsonCommentHandling.Skip,
    Converters = [typeof(NamedEnumConverter<GeneratorMode>), typeof(NamedEnumConverter<TapWinding>), typeof(NamedEnumConverter<ImpedanceBasis>),
        typeof(NamedEnumConverter<StarterMethod>), typeof(NamedEnumConverter<ConductorMaterial>)])]
[JsonSerializable(typeof(Network))]
internal sealed partial class NetworkJsonContext : JsonSerializerContext;

/// <summary>
/// The file's enum keys ("mode", "winding", "per", "method", "conductor") by name, as the model's names are spelled; a number is a
/// wrong type of value, not an index into the enum (which would also admit values with no meaning).
/// </summary>
internal sealed class NamedEnumConverter<TEnum>() : JsonStringEnumConverter<TEnum>(namingPolicy: null, allowIntegerValues: false)
    where TEnum : struct, Enum;
