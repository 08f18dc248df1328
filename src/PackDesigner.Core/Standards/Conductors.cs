namespace PackDesigner.Core.Standards;

/// <summary>Conductor resistance from the International Annealed Copper Standard (IEC 60028).</summary>
public static class Conductors
{
    /// <summary>Resistivity of annealed copper at 20 °C, Ω·mm²/m (1/58, IEC 60028).</summary>
    public const double CopperResistivityOhmMm2PerM = 1.0 / 58.0;

    /// <summary>R = ρ·L/A, in Ω, for a copper conductor of <paramref name="lengthM"/> m and <paramref name="crossSectionMm2"/> mm² at 20 °C.</summary>
    public static double CopperResistanceOhm(double crossSectionMm2, double lengthM) =>
        CopperResistivityOhmMm2PerM * lengthM / crossSectionMm2;
}
