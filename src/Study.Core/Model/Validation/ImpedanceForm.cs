// Which keys of one impedance form a transformer gives, for the "exactly one form" rule.
namespace Study.Core.Model.Validation;

/// <summary>One way of stating an impedance (per km, ohm totals, per unit, nameplate) and the keys given in it.</summary>
internal sealed record ImpedanceForm(string Name, IReadOnlyList<string> GivenKeys)
{
    public bool IsGiven => GivenKeys.Count > 0;

    public static ImpedanceForm Of(string name, params ReadOnlySpan<(string Key, double? Value)> keys)
    {
        var given = new List<string>();
        foreach ((string key, double? value) in keys)
        {
            if (value.HasValue) given.Add(key);
        }
        return new ImpedanceForm(name, given);
    }

    /// <summary>"ohm totals (rOhm, xOhm)".</summary>
    public string Describe() => $"{Name} ({string.Join(", ", GivenKeys)})";

    /// <summary>Reports a mix of forms; returns the one form given, or null when none or several are.</summary>
    public static ImpedanceForm? Single(ElementScope at, string noneMessage, params ImpedanceForm[] forms)
    {
        // Runs once per branch: the one-form case, by far the common one, is found without allocating.
        ImpedanceForm? only = null;
        int count = 0;
        foreach (ImpedanceForm f in forms)
        {
            if (!f.IsGiven) continue;
            only = f;
            count++;
        }
        if (count == 1) return only;
        ImpedanceForm[] given = forms.Where(f => f.IsGiven).ToArray();
        if (given.Length == 0)
            at.Error(null, noneMessage);
        else
            at.Error(given[1].GivenKeys[0],
                $"mixes impedance forms: {string.Join(" and ", given.Select(f => f.Describe()))}; keep exactly one form");
        return null;
    }
}
