// A conductor's resistance at another temperature, for minimum fault levels at the end-of-fault temperature.
using Study.Core.Model;

namespace Study.Core.Units;

/// <summary>
/// R_θ = [1 + α·(θ − 20 °C)]·R_20 (IEC 60909-0:2016 minimum short-circuit currents, from memory), with
/// the resistance in the file taken at 20 °C. α is the usual coefficient at 20 °C: 0.00393 /K for copper
/// and 0.00403 /K for aluminium (IEC 60228 values, from memory); 0.004 /K when the material is not given,
/// the value IEC 60909-0 gives for copper, aluminium and aluminium alloy alike (from memory).
/// </summary>
public static class ConductorResistance
{
    public const double ReferenceC = 20;
    public const double CopperPerK = 0.00393, AluminiumPerK = 0.00403, UnstatedPerK = 0.004;

    public static double Coefficient(ConductorMaterial? material) => material switch
    {
        ConductorMaterial.Copper => CopperPerK,
        ConductorMaterial.Aluminium => AluminiumPerK,
        _ => UnstatedPerK,
    };

    /// <summary>R_θ / R_20 for coefficient α at <paramref name="temperatureC"/>.</summary>
    public static double Factor(double alphaPerK, double temperatureC) => 1 + alphaPerK * (temperatureC - ReferenceC);
}
