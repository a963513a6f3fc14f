// Why a candidate bank fails, with the constraint it fails, so no reader has to parse the sentence.
namespace Study.Core.Cases;

/// <summary>The constraints a candidate bank is held to.</summary>
public enum BankConstraint
{
    /// <summary>The candidate's own figures cannot be, or make the network invalid.</summary>
    CandidateData,
    /// <summary>The watched buses in their band (the tap study, or the on-load changer's regulation).</summary>
    VoltageBand,
    /// <summary>The bank's own loading with everything in service.</summary>
    Loading,
    /// <summary>A breaker check at the bank's buses or the buses it feeds.</summary>
    BreakerDuty,
    /// <summary>The bank, its parallel units or the lines it feeds with one element out.</summary>
    Outage,
}

/// <summary>One reason a candidate fails: the constraint, and the sentence that says it ("CB-CS11 breaking duty 104 %").</summary>
public sealed record CandidateReason(BankConstraint Constraint, string Text)
{
    public override string ToString() => Text;
}
