// Reads the candidates file of the bank-choice study: JSON, read as strictly as a network file.
using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.Json.Serialization.Metadata;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.Core.Io;

/// <summary>
/// <c>{"format": "study-candidates", "version": 1, "transformer": "CQ-T1", "candidates": [{"id", "mva",
/// "units", "zPercent", "xr", "tap", "noLoad", "loadLossKw", "price", "description"}]}</c>. Unknown keys,
/// wrong types, duplicate keys and syntax errors are input errors at their line and column; the
/// candidates' own rules are checked by the study against the network they go into.
/// </summary>
public static class CandidatesFile
{
    /// <summary>A candidates file is a few kilobytes; beyond this it is not one.</summary>
    private const long MaxBytes = 16L * 1024 * 1024;

    private static JsonTypeInfo<BankCandidates> Info => CandidatesJsonContext.Default.BankCandidates;

    /// <exception cref="InputException">The file cannot be read, or is not a candidates file (with line and column).</exception>
    public static BankCandidates Read(string path)
    {
        byte[] bytes;
        try
        {
            if (Directory.Exists(path)) throw new InputException("is a directory, not a candidates file", path);
            if (new FileInfo(path) is { Exists: true, Length: > MaxBytes } big)
                throw new InputException($"the file is {big.Length / (1024 * 1024)} MB; a candidates file is a few kB", path);
            bytes = File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException($"cannot read the candidates file: {e.Message}", path);
        }
        return Parse(bytes, path);
    }

    /// <exception cref="InputException">The text is not a candidates file (with line and column).</exception>
    public static BankCandidates Parse(ReadOnlySpan<byte> utf8, string? fileName = null)
    {
        byte[] bytes = utf8.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]) ? utf8[3..].ToArray() : utf8.ToArray();
        BankCandidates? file;
        try
        {
            file = JsonSerializer.Deserialize(bytes, Info);
        }
        catch (JsonException e)
        {
            throw NetworkFile.Translate(e, fileName);
        }
        if (file is null) throw new InputException("the file holds 'null', not a candidates file", fileName, 1, 1);
        if (file.Format != BankCandidates.FormatName)
            throw new InputException($"'format' is '{file.Format}', expected '{BankCandidates.FormatName}'", fileName, 1, 1);
        if (file.Version != 1)
            throw new InputException($"candidates file version {file.Version} is not one this program reads (1)", fileName, 1, 1);
        if (file.Candidates.Count == 0)
            throw new InputException("the file offers no candidates: give at least one in 'candidates'", fileName, 1, 1);
        var lines = CandidateLines(bytes);
        for (int i = 0; i < file.Candidates.Count; i++)
        {
            BankCandidate? c = file.Candidates[i];
            if (c is null) throw new InputException($"entry {i + 1} of candidates is null: remove it or give the candidate", fileName);
            if (string.IsNullOrWhiteSpace(c.Id))
                throw new InputException($"entry {i + 1} of candidates has no id", fileName, lines.GetValueOrDefault($"#{i}"));
            for (int j = 0; j < i; j++)
                if (file.Candidates[j].Id == c.Id)
                    throw new InputException($"candidate id '{c.Id}' is used twice", fileName, lines.GetValueOrDefault($"#{i}"));
        }
        return file with
        {
            Source = fileName,
            Lines = file.Candidates.Select((c, i) => (c.Id, Line: lines.GetValueOrDefault($"#{i}"))).ToDictionary(x => x.Id, x => x.Line),
        };
    }

    /// <summary>The line where each entry of the candidates array starts, keyed "#index".</summary>
    private static Dictionary<string, int> CandidateLines(byte[] utf8)
    {
        var lines = new Dictionary<string, int>();
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip });
        bool inCandidates = false;
        int index = 0;
        while (reader.Read())
        {
            if (reader.CurrentDepth == 1 && reader.TokenType == JsonTokenType.PropertyName)
                inCandidates = reader.ValueTextEquals("candidates"u8);
            else if (inCandidates && reader.CurrentDepth == 2 && reader.TokenType == JsonTokenType.StartObject)
            {
                int line = 1;
                for (long k = 0; k < reader.TokenStartIndex; k++) if (utf8[k] == (byte)'\n') line++;
                lines[$"#{index++}"] = line;
            }
        }
        return lines;
    }
}

[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
    UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow,
    RespectRequiredConstructorParameters = true,
    AllowTrailingCommas = false,
    AllowDuplicateProperties = false,
    ReadCommentHandling = JsonCommentHandling.Skip,
    Converters = [typeof(NamedEnumConverter<TapWinding>)])]
[JsonSerializable(typeof(BankCandidates))]
internal sealed partial class CandidatesJsonContext : JsonSerializerContext;
