// Writing a shard's part and merging parts: the bookkeeping around the engine's OutageMerge.
using System.Security.Cryptography;
using System.Text.Json;
using System.Text.Json.Serialization.Metadata;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Cli.Shards;

public static class OutageParts
{
    // Parts are read strictly: a missing or unknown key means the file is not a part.
    private static readonly JsonSerializerOptions ReadOptions = new(CliJsonContext.Default.Options)
    {
        TypeInfoResolver = CliJsonContext.Default,
        RespectRequiredConstructorParameters = true,
        RespectNullableAnnotations = true,
        UnmappedMemberHandling = System.Text.Json.Serialization.JsonUnmappedMemberHandling.Disallow,
    };

    /// <summary>SHA-256 of a file's bytes, lower-case hex.</summary>
    /// <exception cref="InputException">The file cannot be read.</exception>
    public static string Sha256(string path)
    {
        try
        {
            using FileStream stream = File.OpenRead(path);
            return Convert.ToHexStringLower(SHA256.HashData(stream));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"cannot read the file: {e.Message}", path);
        }
    }

    /// <summary>The part of one shard's result.</summary>
    public static OutagePartJson Of(OutageScreeningResult result, string network, string sha256, OutageScreeningRequest request, LoadFlowOptions options) =>
        new(new OutagePartHeaderJson(OutagePartHeaderJson.FormatName, result.Shard.Number, result.Shard.Count, network, sha256,
                OutagePartOptionsJson.Of(request, options), result.OutageCount, result.Elements),
            result.Scenarios.Select(OutagePartRecords.From).ToList());

    /// <summary>
    /// Reads the parts and joins them (<see cref="OutageMerge"/>) after checking they come from the same
    /// network file (by content) and the same options. The order of <paramref name="files"/> does not matter.
    /// </summary>
    /// <exception cref="InputException">A file cannot be read or is not a part, or the parts do not make one screening.</exception>
    public static (OutageScreeningResult Result, OutagePartHeaderJson Header) Merge(IReadOnlyList<string> files)
    {
        if (files.Count == 0) throw new InputException("no parts given: 'study merge PART...' takes the files 'study outages --shard K/N --json' wrote");
        var parts = files.Select(f => (File: f, Part: Read(f))).OrderBy(p => p.Part.Part.Shard).ToList();
        var (firstFile, first) = parts[0];
        foreach (var (file, part) in parts.Skip(1))
        {
            if (part.Part.NetworkSha256 != first.Part.NetworkSha256)
                throw new InputException($"{file} was screened on another network than {firstFile} "
                    + $"({part.Part.Network} and {first.Part.Network} differ in content)");
            if (!part.Part.Options.SameAs(first.Part.Options))
                throw new InputException($"{file} and {firstFile} were screened with different options (elements, scenarios or load-flow settings)");
        }
        OutageScreeningResult merged = OutageMerge.Merge(parts.Select(p => (p.File, OutagePartRecords.ToResult(p.Part, p.File))).ToList());
        return (merged, first.Part);
    }

    private static OutagePartJson Read(string file)
    {
        byte[] bytes;
        try
        {
            bytes = File.ReadAllBytes(file);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"cannot read the part: {e.Message}", file);
        }
        OutagePartJson? part;
        try
        {
            part = JsonSerializer.Deserialize(bytes, (JsonTypeInfo<OutagePartJson>)ReadOptions.GetTypeInfo(typeof(OutagePartJson)));
        }
        catch (JsonException e)
        {
            int line = (int)(e.LineNumber ?? 0) + 1, column = (int)(e.BytePositionInLine ?? 0) + 1;
            throw new InputException($"not a part written by 'study outages --shard K/N --json': {FirstSentence(e.Message)}", file, line, column);
        }
        if (part?.Part is null || part.Part.Format != OutagePartHeaderJson.FormatName)
            throw new InputException("not a part written by 'study outages --shard K/N --json' (its \"part\" header is missing)", file);
        return part;
    }

    // The parser's message without its hints to .NET programmers.
    private static string FirstSentence(string message)
    {
        int end = message.IndexOf(". ", StringComparison.Ordinal);
        return end > 0 ? message[..end] : message.TrimEnd('.');
    }
}
