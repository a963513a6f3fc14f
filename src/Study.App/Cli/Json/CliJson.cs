// JSON output of the commands (--json): source-generated, camelCase, indented, keys always present.
using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.Json.Serialization.Metadata;

namespace Study.App.Cli;

[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    WriteIndented = true,
    IndentSize = 2,
    NumberHandling = JsonNumberHandling.Strict)]
[JsonSerializable(typeof(CheckJson))]
[JsonSerializable(typeof(SolveJson))]
[JsonSerializable(typeof(TapsJson))]
internal sealed partial class CliJsonContext : JsonSerializerContext;

public static class CliJson
{
    public static string Serialize<T>(T value)
    {
        var info = (JsonTypeInfo<T>)CliJsonContext.Default.GetTypeInfo(typeof(T))!;
        return JsonSerializer.Serialize(value, info) + "\n";
    }
}
