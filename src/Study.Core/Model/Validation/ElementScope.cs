// The checks every rule file needs, bound to one element so each call names only the key and the value.
namespace Study.Core.Model.Validation;

/// <summary>Reports problems about one element and runs the common field checks on it.</summary>
internal readonly struct ElementScope(ValidationContext context, ElementKind kind, string? id)
{
    /// <summary>Above this a "kV" value is almost certainly volts: no AC system runs above 1200 kV.</summary>
    public const double HighestPlausibleKv = 1200;

    public ValidationContext Context => context;

    public void Error(string? field, string message) => context.Add(Severity.Error, kind, id, field, message);

    public void Warning(string? field, string message) => context.Add(Severity.Warning, kind, id, field, message);

    /// <summary>A warning that becomes an error when the value is a unit slip (about 1000 times off), which no study can use.</summary>
    public void WarningUnlessUnitSlip(bool unitSlip, string? field, string message) =>
        context.Add(unitSlip ? Severity.Error : Severity.Warning, kind, id, field, message);

    /// <summary>Reports every NaN or infinite value; absent (null) values are fine. True when all are finite.</summary>
    public bool AllFinite(params ReadOnlySpan<(string Field, double? Value)> values)
    {
        bool all = true;
        foreach ((string field, double? value) in values)
        {
            if (value is double v && !double.IsFinite(v))
            {
                Error(field, $"{field} is {Numbers.Show(v)}: give a finite number");
                all = false;
            }
        }
        return all;
    }

    /// <summary>The bus a reference names, or null after reporting it missing (with a near match, if any).</summary>
    public Bus? BusRef(string field, string? busId)
    {
        if (string.IsNullOrWhiteSpace(busId))
        {
            Error(field, $"{field} is empty: name the id of the bus this connects to");
            return null;
        }
        if (context.BusesById.TryGetValue(busId, out Bus? bus)) return bus;
        string? near = IdSuggestion.Closest(busId, context.BusesById.Keys);
        string hint = near is null ? "" : $": did you mean '{near}'?";
        Error(field, $"{field} names bus '{busId}', which is not in the network{hint}");
        return null;
    }

    /// <summary>
    /// A kV value: negative is an error, above 1200 is taken for volts. Zero is "not stated" when
    /// <paramref name="zeroAllowed"/> (a bus base kV), otherwise an error. True when usable as kV.
    /// </summary>
    public bool Kv(string field, double? kv, bool zeroAllowed)
    {
        if (kv is not double v || !double.IsFinite(v)) return false;
        if (v < 0)
        {
            Error(field, $"{field} is {Numbers.Show(v)}: a voltage in kV cannot be negative");
            return false;
        }
        if (v == 0)
        {
            if (!zeroAllowed) Error(field, $"{field} is 0: give the rated voltage in kV");
            return false;
        }
        if (v > HighestPlausibleKv)
        {
            Error(field, $"{field} {Numbers.Show(v)} looks like volts: did you mean {Numbers.Show(v / 1000)} kV?");
            return false;
        }
        return true;
    }

    /// <summary>Error unless the value (when given and finite) is above zero.</summary>
    public void Positive(string field, double? value, string what)
    {
        if (value is double v && double.IsFinite(v) && v <= 0)
            Error(field, $"{field} is {Numbers.Show(v)}: {what} must be above 0");
    }

    /// <summary>Error when the value (when given and finite) is below zero.</summary>
    public void NotNegative(string field, double? value, string what)
    {
        if (value is double v && double.IsFinite(v) && v < 0)
            Error(field, $"{field} is {Numbers.Show(v)}: {what} cannot be negative");
    }

    /// <summary>Error when a branch's two named ends are the same bus.</summary>
    public void DistinctEnds(string aField, string? a, string bField, string? b)
    {
        if (!string.IsNullOrWhiteSpace(a) && string.Equals(a, b, StringComparison.Ordinal))
            Error(bField, $"{aField} and {bField} are both bus '{a}': a branch must join two different buses");
    }
}
