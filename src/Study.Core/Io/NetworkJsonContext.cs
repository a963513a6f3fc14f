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
    ReadCommentHandling = System.Text.Json.JsonCommentHandling.Skip,
    Converters = [typeof(NamedEnumConverter<GeneratorMode>), typeof(NamedEnumConverter<TapSide>)])]
[JsonSerializable(typeof(Network))]
internal sealed partial class NetworkJsonContext : JsonSerializerContext;
