// JSON output of the commands (--json): source-generated, camelCase, indented, keys always present.
using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.Json.Serialization.Metadata;
using Study.App.Cli.Compare;
using Study.App.Cli.Faults;
using Study.App.Cli.Files;
using Study.App.Cli.Outages;
using Study.App.Cli.Shards;
using Study.App.Cli.Solve;
using Study.App.Cli.Taps;

namespace Study.App.Cli;

[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    WriteIndented = true,
    IndentSize = 2,
    NumberHandling = JsonNumberHandling.Strict)]
[JsonSerializable(typeof(CheckJson))]
[JsonSerializable(typeof(SolveJson))]
[JsonSerializable(typeof(TapsJson))]
[JsonSerializable(typeof(OutagesJson))]
[JsonSerializable(typeof(List<OutagesJson>))]
[JsonSerializable(typeof(OutagePartJson))]
[JsonSerializable(typeof(CompareJson))]
[JsonSerializable(typeof(FaultJson))]
[JsonSerializable(typeof(Profile.ProfileJson))]
[JsonSerializable(typeof(Choose.ChooseJson))]
[JsonSerializable(typeof(Start.StartJson))]
internal sealed partial class CliJsonContext : JsonSerializerContext;

public static class CliJson
{
    // Output is read by programs and people alike: keep apostrophes, degree signs and the like as
    // written instead of \u escapes (the text never lands inside HTML).
    private static readonly JsonSerializerOptions Options = new(CliJsonContext.Default.Options)
    {
        Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        TypeInfoResolver = CliJsonContext.Default,
    };

    public static string Serialize<T>(T value)
    {
        var info = (JsonTypeInfo<T>)Options.GetTypeInfo(typeof(T));
        return JsonSerializer.Serialize(value, info) + "\n";
    }

    /// <summary>Writes what <see cref="Serialize"/> returns to the command's output, straight to its byte stream when it has one.</summary>
    public static void Write<T>(CommandContext context, T value)
    {
        if (context.OutStream is not Stream stream)
        {
            context.Out.Write(Serialize(value));
            return;
        }
        var info = (JsonTypeInfo<T>)Options.GetTypeInfo(typeof(T));
        context.Out.Flush();
        JsonSerializer.Serialize(stream, value, info);
        stream.Write("\n"u8);
        stream.Flush();
    }
}
