// One audited step of a per-unit conversion, as `study explain` and the TUI show it.
namespace Study.Core.Units;

/// <summary>
/// One step from nameplate data towards a system per-unit value: what it is, the formula with its
/// numbers substituted, and the result. <paramref name="Note"/> is set when the value is a default
/// or an assumption rather than data, so nobody mistakes it for data.
/// </summary>
public sealed record DerivationStep(string Label, string Formula, double Value, string Unit, string? Note = null);
