using PackDesigner.Core.Standards;

namespace PackDesigner.Core.Tests.Standards;

public sealed class ConductorsTests
{
    [Fact]
    public void CopperResistivity_Value_IsAnnealedCopperStandard()
    {
        Reference.AssertClose(ReferenceValues.CopperResistivity, Conductors.CopperResistivityOhmMm2PerM, 1e-15);
        Reference.AssertClose(ReferenceValues.CopperResistivityPublished, Conductors.CopperResistivityOhmMm2PerM, Reference.RoundingTolerance(0.017241, 5));
    }

    [Theory]
    [InlineData(1, 1, 0.01724137931034483)]
    [InlineData(70, 2, 0.0004926108374384236)]
    [InlineData(35, 10, 0.004926108374384236)]
    [InlineData(10, 5.8, 0.01)]
    public void CopperResistanceOhm_Conductor_IsResistivityTimesLengthOverArea(double mm2, double lengthM, double expectedOhm)
    {
        // IEC 60028: ρ = 1/58 Ω·mm²/m at 20 °C; R = ρ·L/A (expected values computed by hand from 1/58).
        Reference.AssertClose(expectedOhm, Conductors.CopperResistanceOhm(mm2, lengthM), 1e-14, "IEC 60028, R = ρL/A");
    }
}
