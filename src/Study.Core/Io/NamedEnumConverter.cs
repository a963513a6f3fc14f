// Reads enum keys of the network file by their names only: "mode": 0 must not quietly mean "slack".
using System.Text.Json.Serialization;

namespace Study.Core.Io;

/// <summary>
/// The file's enum keys ("mode", "side") by name, as the model's names are spelled; a number is a
/// wrong type of value, not an index into the enum (which would also admit values with no meaning).
/// </summary>
internal sealed class NamedEnumConverter<TEnum>() : JsonStringEnumConverter<TEnum>(namingPolicy: null, allowIntegerValues: false)
    where TEnum : struct, Enum;
