// The marks that make a violation or a duty readable without colour, in every output.
using Study.Core.Faults;
using Study.Core.LoadFlow;

namespace Study.App.Reports;

public static class Marks
{
    public const string Low = "▼";
    public const string High = "▲";
    /// <summary>A breaker above its rating.</summary>
    public const string Over = "▲";
    /// <summary>A breaker above 90 % of its rating.</summary>
    public const string Near = "△";
    /// <summary>The plain-text report's mark for a loading or duty above its rating.</summary>
    public const string Exceeded = " !";

    /// <summary>▼ for low, ▲ for high or overloaded, nothing otherwise.</summary>
    public static string Of(ViolationKind v) => v switch
    {
        ViolationKind.Low => Low,
        ViolationKind.High or ViolationKind.Overload => High,
        _ => "",
    };

    /// <summary>As <see cref="Of(ViolationKind)"/>, with a space where there is no mark, so marked and plain numbers line up.</summary>
    public static string Padded(ViolationKind v) => v == ViolationKind.None ? " " : Of(v);

    /// <summary>A voltage against its band: ▼ below, ▲ above, a space inside.</summary>
    public static string Band(double vPu, double lowPu, double highPu) => vPu < lowPu ? Low : vPu > highPu ? High : " ";

    public static string Duty(DutyStatus s) => s switch
    {
        DutyStatus.Over => Over,
        DutyStatus.Warning => Near,
        _ => " ",
    };

    /// <summary>Over-duty in capitals with its mark, so that the row stands out without colour.</summary>
    public static string DutyWords(DutyStatus s) => s switch
    {
        DutyStatus.Over => Over + " OVER",
        DutyStatus.Warning => Near + " near (>90 %)",
        _ => s.Code(),
    };
}
