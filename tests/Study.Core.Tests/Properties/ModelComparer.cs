// Field-by-field comparison of model records, since records holding lists compare the lists by reference.
using System.Collections;
using System.Reflection;
using System.Text.Json.Serialization;

namespace Study.Core.Tests.Properties;

internal static class ModelComparer
{
    /// <summary>
    /// The first difference between two model objects as "path: a vs b", or null when they are the
    /// same: public properties compared recursively, lists element by element, doubles bit for bit.
    /// Properties the file does not hold ([JsonIgnore], such as the source map) are skipped.
    /// </summary>
    public static string? FirstDifference(object? a, object? b, string path = "network")
    {
        if (a is null || b is null) return a is null && b is null ? null : $"{path}: {Show(a)} vs {Show(b)}";
        Type type = a.GetType();
        // Lists compare entry by entry whatever their concrete type (an absent array reads as an empty one).
        if (a is IList first && b is IList second)
        {
            if (first.Count != second.Count) return $"{path}: {first.Count} entries vs {second.Count}";
            for (int i = 0; i < first.Count; i++)
                if (FirstDifference(first[i], second[i], $"{path}[{i}]") is string d) return d;
            return null;
        }
        if (type != b.GetType()) return $"{path}: type {type.Name} vs {b.GetType().Name}";
        if (a is double x) return BitConverter.DoubleToInt64Bits(x) == BitConverter.DoubleToInt64Bits((double)b) ? null : $"{path}: {x:R} vs {(double)b:R}";
        if (a is string || type.IsPrimitive || type.IsEnum) return Equals(a, b) ? null : $"{path}: {Show(a)} vs {Show(b)}";
        foreach (PropertyInfo p in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            if (p.GetIndexParameters().Length > 0 || p.GetCustomAttribute<JsonIgnoreAttribute>() is not null) continue;
            if (FirstDifference(p.GetValue(a), p.GetValue(b), $"{path}.{p.Name}") is string d) return d;
        }
        return null;
    }

    private static string Show(object? value) => value switch
    {
        null => "null",
        string s => $"\"{s}\"",
        _ => value.ToString() ?? "",
    };
}
