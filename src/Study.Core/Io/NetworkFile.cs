// Reading and writing networks: the JSON network file, and imported IEEE Common Format cases.
using System.Text;
using System.Text.Json;
using System.Text.Json.Serialization.Metadata;
using System.Text.RegularExpressions;
using Study.Core.Model;

namespace Study.Core.Io;

/// <summary>
/// Reads a network from either format (recognised by content, not by file name) and writes the
/// network file with stable key order and two-space indentation.
/// </summary>
public static partial class NetworkFile
{
    private static readonly JsonSerializerOptions Options = new(NetworkJsonContext.Default.Options)
    {
        TypeInfoResolver = NetworkJsonContext.Default.WithAddedModifier(OmitInServiceWhenTrue),
    };

    /// <summary>Version 1 files name a line's impedance and a tap changer by other keys (<see cref="LineVersion1Converter"/>).</summary>
    private static readonly JsonSerializerOptions Version1Options = new(Options)
    {
        Converters = { new LineVersion1Converter(), new TapChangerVersion1Converter() },
    };

    private static JsonTypeInfo<Network> NetworkInfo => (JsonTypeInfo<Network>)Options.GetTypeInfo(typeof(Network));

    private static JsonTypeInfo<Network> Version1Info => (JsonTypeInfo<Network>)Version1Options.GetTypeInfo(typeof(Network));

    /// <summary>The one-line note a version 1 file carries (in <see cref="SourceMap.Notes"/>).</summary>
    public static string Version1Note(string? file) =>
        $"{file ?? "the file"} is a version 1 network file; 'study convert {file ?? "IN"} OUT' writes it as version {Network.CurrentVersion}";

    /// <summary>Reads a network file or an IEEE Common Format case from disk.</summary>
    /// <exception cref="InputException">The path, the file or its content cannot be used (see <see cref="InputFile"/>), or the content is not a network.</exception>
    public static Network Read(string path)
    {
        byte[] bytes = InputFile.ReadAllBytes(path);
        // A UTF-8 network file goes to the JSON reader as the bytes it is: decoding it to a string and
        // encoding it back cost about a tenth of the read of a 5 MB file. Anything else (a Common
        // Format case, a UTF-16 file) is decoded as File.ReadAllText would.
        ReadOnlySpan<byte> utf8 = bytes.AsSpan();
        bool bom = utf8.StartsWith(Utf8Bom);
        if (bom) utf8 = utf8[Utf8Bom.Length..];
        ReadOnlySpan<byte> body = utf8.TrimStart(" \t\r\n"u8);
        if (!body.IsEmpty && body[0] == (byte)'{') return ParseJson(bom ? utf8.ToArray() : bytes, path);
        using var decoder = new StreamReader(new MemoryStream(bytes), Encoding.UTF8, detectEncodingFromByteOrderMarks: true);
        return Parse(decoder.ReadToEnd(), path);
    }

    private static ReadOnlySpan<byte> Utf8Bom => [0xEF, 0xBB, 0xBF];

    /// <summary>Parses text in either format; <paramref name="fileName"/> is used in messages only.</summary>
    public static Network Parse(string text, string? fileName = null)
    {
        string body = text.TrimStart('\uFEFF', ' ', '\t', '\r', '\n');
        if (body.StartsWith('{')) return ParseJson(Encoding.UTF8.GetBytes(text.TrimStart('\uFEFF')), fileName);
        if (text.Contains("BUS DATA FOLLOWS", StringComparison.Ordinal)) return CommonFormatReader.Parse(text, fileName);
        throw new InputException(
            "not a network file (a JSON object) nor an IEEE Common Format case (no 'BUS DATA FOLLOWS' section)",
            fileName, 1, 1);
    }

    /// <summary>The network file text: always the current version, keys in a stable order, two-space indentation.</summary>
    public static string ToJson(Network network) =>
        JsonSerializer.Serialize(network with { Format = Network.FormatName, Version = Network.CurrentVersion }, NetworkInfo) + "\n";

    /// <summary>Writes the network file atomically (temporary file, flush, rename).</summary>
    public static void Write(Network network, string path) => AtomicFile.WriteAllText(path, ToJson(network));

    private static Network ParseJson(byte[] utf8, string? fileName)
    {
        int version = DeclaredVersion(utf8, fileName);
        Network? network;
        try
        {
            network = JsonSerializer.Deserialize(utf8, version == 1 ? Version1Info : NetworkInfo);
        }
        catch (JsonException e)
        {
            throw Translate(e, fileName);
        }
        if (network is null) throw new InputException("the file holds 'null', not a network", fileName, 1, 1);
        if (network.Format != Network.FormatName)
        {
            (int line, int column) = TopLevelValue(utf8, "format");
            throw new InputException($"'format' is '{network.Format}', expected '{Network.FormatName}'", fileName, line, column);
        }
        IReadOnlyList<string> notes = version == 1 ? [Version1Note(fileName)] : [];
        if (version == 1) network = Version1Transformers(network);
        // The lines are only needed for messages: found on the first look-up, so a clean file skips the scan.
        return network with { Version = Network.CurrentVersion, Source = new SourceMap(fileName, () => ElementLines(utf8)) { Notes = notes } };
    }

    /// <summary>
    /// Version 1 files carry "phaseShiftDeg": 0 on every transformer, because its writer always wrote the
    /// key; a 0 there says nothing, so it reads as not given and the vector group sets the displacement.
    /// </summary>
    private static Network Version1Transformers(Network network) =>
        network.Transformers.Any(t => t is { PhaseShiftDeg: 0 })
            ? network with { Transformers = network.Transformers.Select(t => t is { PhaseShiftDeg: 0 } ? t with { PhaseShiftDeg = null } : t).ToList() }
            : network;

    /// <summary>
    /// The top-level "version" (the current one when absent), read before the rest because the keys of
    /// the file depend on it. Only versions this program knows are read.
    /// </summary>
    private static int DeclaredVersion(byte[] utf8, string? fileName)
    {
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip });
        int? version = null;
        try
        {
            while (reader.Read())
            {
                if (reader.CurrentDepth != 1 || reader.TokenType != JsonTokenType.PropertyName || !reader.ValueTextEquals("version")) continue;
                reader.Read();
                version = reader.TokenType == JsonTokenType.Number && reader.TryGetInt32(out int v) ? v : int.MinValue;
            }
        }
        catch (JsonException)
        {
            // A syntax error: the deserializer reports it with its line and column.
            return Network.CurrentVersion;
        }
        if (version is null) return Network.CurrentVersion;
        if (version is 1 or Network.CurrentVersion) return version.Value;
        (int line, int column) = TopLevelValue(utf8, "version");
        string shown = version == int.MinValue ? "not a whole number" : version.Value.ToString(System.Globalization.CultureInfo.InvariantCulture);
        throw new InputException(
            version > Network.CurrentVersion
                ? $"file version {shown} is newer than this program reads (1 and {Network.CurrentVersion})"
                : $"file version {shown} is not a version of the network file (this program reads 1 and {Network.CurrentVersion})",
            fileName, line, column);
    }

    /// <summary>Rewrites a serializer message into one that names the key, the line and the column.</summary>
    internal static InputException Translate(JsonException e, string? fileName)
    {
        int? line = e.LineNumber is long l ? (int)l + 1 : null;
        int? column = e.BytePositionInLine is long c ? (int)c + 1 : null;
        string path = e.Path ?? "$";
        string message = e.Message;
        Match unknown = UnknownKey().Match(message);
        Match missing = MissingKeys().Match(message);
        Match duplicate = DuplicateKey().Match(message);
        if (unknown.Success)
            message = $"unknown key '{unknown.Groups[1].Value}' at {path}";
        else if (missing.Success)
            message = $"missing required key(s) {missing.Groups[1].Value} in the object ending at {path}";
        else if (duplicate.Success)
            message = $"key '{duplicate.Groups[1].Value}' is given twice in one object (at {ParentOf(path)}): "
                + "the reader would keep only one of the values; remove the other";
        else if (message.Contains("could not be converted", StringComparison.Ordinal))
            message = $"wrong type of value at {path}";
        else
            message = $"JSON syntax: {PlainSyntax(message)}";
        return new InputException(message, fileName, line, column);
    }

    /// <summary>
    /// The reader's own sentence about the syntax, without what only a programmer could act on: the
    /// path suffix, reader options, buffer flags and .NET type names.
    /// </summary>
    private static string PlainSyntax(string message)
    {
        string m = message;
        int cut = m.IndexOf(" Path:", StringComparison.Ordinal);
        if (cut > 0) m = m[..cut];
        if (m.Contains("trailing comma", StringComparison.Ordinal))
            return "a comma before a closing bracket or brace (JSON allows none there)";
        if (m.Contains("maximum configured depth", StringComparison.Ordinal))
            return "objects and arrays are nested deeper than a network file ever is (64 levels)";
        if (m.Contains("does not contain any JSON tokens", StringComparison.Ordinal))
            return "the text ends before any value";
        m = ReaderHint().Replace(m, "").Trim();
        m = TypeName().Replace(m, "");
        return m.Length == 0 ? "the text is not valid JSON" : m;
    }

    /// <summary>"$.buses[0]" for "$.buses[0].id": the object that holds the key.</summary>
    private static string ParentOf(string path)
    {
        int dot = path.LastIndexOf('.');
        return dot > 1 ? path[..dot] : "$";
    }

    [GeneratedRegex(@"\s*(Change the reader options\.|[^.]*\bisFinalBlock\b[^.]*\.|[^.]*JsonSerializerOptions[^.]*\.|[^.]*JsonReaderOptions[^.]*\.)")]
    private static partial Regex ReaderHint();

    [GeneratedRegex(@"\s*(of|for) type '[^']*'")]
    private static partial Regex TypeName();

    [GeneratedRegex("Duplicate property '([^']*)'")]
    private static partial Regex DuplicateKey();

    [GeneratedRegex("The JSON property '([^']*)' could not be mapped")]
    private static partial Regex UnknownKey();

    [GeneratedRegex("missing required properties including: (.*)\\.?$", RegexOptions.Singleline)]
    private static partial Regex MissingKeys();

    /// <summary>Finds the line of each element object in the top-level arrays, keyed as <see cref="SourceMap.Key"/>.</summary>
    private static Dictionary<string, int> ElementLines(byte[] utf8)
    {
        var lines = new Dictionary<string, int>();
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip });
        ElementFamily? family = null;
        string keyPrefix = "";
        int objectStartLine = 0;
        // Lines are counted forward from the previous object, so the whole scan reads the file once.
        long counted = 0;
        int line = 1;
        while (reader.Read())
        {
            int depth = reader.CurrentDepth;
            JsonTokenType token = reader.TokenType;
            if (depth == 1 && token == JsonTokenType.PropertyName)
            {
                // The family and the key prefix are worked out once per array, not once per element.
                family = FamilyOfArray(reader.GetString());
                keyPrefix = family is ElementFamily f ? SourceMap.Key(f, "") : "";
            }
            else if (family is null && depth == 1 && token is JsonTokenType.StartArray or JsonTokenType.StartObject)
                reader.Skip();
            else if (depth == 2 && token == JsonTokenType.StartObject)
            {
                long offset = reader.TokenStartIndex;
                line += utf8.AsSpan((int)counted, (int)(offset - counted)).Count((byte)'\n');
                counted = offset;
                objectStartLine = line;
            }
            else if (depth == 3 && token == JsonTokenType.PropertyName && family is ElementFamily known)
            {
                bool isId = reader.ValueTextEquals("id"u8);
                if (!isId && !(known == ElementFamily.Scenario && reader.ValueTextEquals("name"u8)))
                {
                    // Nested values (a tap changer, a scenario's scales) hold no element ids.
                    reader.Read();
                    if (reader.TokenType is JsonTokenType.StartArray or JsonTokenType.StartObject) reader.Skip();
                    continue;
                }
                reader.Read();
                if (reader.TokenType == JsonTokenType.String)
                    lines.TryAdd(string.Concat(keyPrefix, reader.GetString()), objectStartLine);
            }
        }
        return lines;
    }

    /// <summary>Line and column of the value of a top-level key (the last one, as the reader keeps the last); 1, 1 when absent.</summary>
    private static (int Line, int Column) TopLevelValue(byte[] utf8, string key)
    {
        (int, int) found = (1, 1);
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip });
        while (reader.Read())
        {
            if (reader.CurrentDepth != 1 || reader.TokenType != JsonTokenType.PropertyName || !reader.ValueTextEquals(key)) continue;
            reader.Read();
            int line = LineAt(utf8, reader.TokenStartIndex);
            long lineStart = reader.TokenStartIndex;
            while (lineStart > 0 && utf8[lineStart - 1] != (byte)'\n') lineStart--;
            found = (line, (int)(reader.TokenStartIndex - lineStart) + 1);
        }
        return found;
    }

    private static int LineAt(byte[] utf8, long offset)
    {
        int line = 1;
        for (long i = 0; i < offset; i++) if (utf8[i] == (byte)'\n') line++;
        return line;
    }

    private static ElementFamily? FamilyOfArray(string? array) => array switch
    {
        "buses" => ElementFamily.Bus,
        "supplies" or "generators" => ElementFamily.Source,
        "lines" or "transformers" or "threeWindingTransformers" => ElementFamily.Branch,
        "loads" or "shunts" or "motors" => ElementFamily.LoadOrShunt,
        "breakers" => ElementFamily.Breaker,
        "scenarios" => ElementFamily.Scenario,
        _ => null,
    };

    /// <summary>In service is the default; only <c>"inService": false</c> is written, to keep files short.</summary>
    private static void OmitInServiceWhenTrue(JsonTypeInfo info)
    {
        foreach (JsonPropertyInfo property in info.Properties)
        {
            if (property.Name == "inService" && property.PropertyType == typeof(bool))
                property.ShouldSerialize = (_, value) => value is false;
        }
    }
}
