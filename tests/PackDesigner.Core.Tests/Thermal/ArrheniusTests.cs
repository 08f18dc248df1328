using PackDesigner.Core.Thermal;

namespace PackDesigner.Core.Tests.Thermal;

public sealed class ArrheniusTests
{
    [Fact]
    public void GasConstant_Value_IsCodata()
    {
        // R = N_A·k exactly (SI 2019, CODATA 2018); Core keeps 10 significant digits.
        Reference.AssertClose(ReferenceValues.GasConstant, Arrhenius.GasConstant, 1e-9);
    }

    [Fact]
    public void RateRatio_DoublingActivationEnergy_DoublesPer10KFrom25C()
    {
        // REFERENCES.md: doubling per 10 K from 25 °C ⇔ Eₐ ≈ 52.9 kJ/mol.
        Reference.AssertClose(2.0, Arrhenius.RateRatio(ReferenceValues.ActivationEnergyDoublingPer10K.Value, 25, 35), 1e-9, ReferenceValues.ActivationEnergyDoublingPer10K.Source);
        Reference.AssertClose(ReferenceValues.ActivationEnergyDoublingPublished, ReferenceValues.ActivationEnergyDoublingPer10K.Value, Reference.RoundingTolerance(52.9e3, 3));
    }

    [Fact]
    public void ActivationEnergyFromResistances_HalvingResistancePer10KFrom25C_GivesDoublingEnergy()
    {
        // A resistance that halves from 15 °C to 25 °C follows exp(Eₐ/R·(1/T − 1/T₂₅)) with the doubling Eₐ between 288.15 and 298.15 K.
        var ea = Arrhenius.ActivationEnergyFromResistances(1.0, 2.0, 15);
        var expected = ReferenceValues.GasConstant.Value * Math.Log(2) / (1 / 288.15 - 1 / 298.15);

        Reference.AssertClose(expected, ea, 1e-9, "Arrhenius, Eₐ = R·ln(R_cold/R₂₅)/(1/T_cold − 1/T₂₅)");
    }

    [Theory]
    [InlineData(1.0, 1.8, -10)]
    [InlineData(0.55, 6.0, -30)]
    [InlineData(2.0, 2.0, 0)]
    public void ResistanceAt_ColdTemperatureFromFittedEnergy_ReturnsTheColdResistance(double r25, double rCold, double coldC)
    {
        var ea = Arrhenius.ActivationEnergyFromResistances(r25, rCold, coldC);

        Reference.AssertClose(rCold, Arrhenius.ResistanceAt(r25, ea, coldC), 1e-12, "round trip of the Arrhenius fit");
        Reference.AssertClose(r25, Arrhenius.ResistanceAt(r25, ea, 25), 1e-14, "R(25 °C) = R₂₅");
    }

    [Fact]
    public void ResistanceAt_DefaultActivationEnergy_IsAboutSixTimesAtMinus20C()
    {
        // exp(25000/R·(1/253.15 − 1/298.15)) written out with CODATA R; the estimate Core documents as "about 6×".
        var expected = Math.Exp(25_000 / ReferenceValues.GasConstant.Value * (1 / 253.15 - 1 / 298.15));

        var ratio = Arrhenius.ResistanceAt(1.0, Arrhenius.DefaultResistanceActivationEnergyJPerMol, -20);

        Reference.AssertClose(expected, ratio, 1e-9, "Arrhenius form, Eₐ = 25 kJ/mol");
        Assert.InRange(ratio, 5.5, 6.5);
    }

    [Fact]
    public void ResistanceAt_Temperatures_FallsAsTheCellWarms()
    {
        var ea = Arrhenius.DefaultResistanceActivationEnergyJPerMol;
        double[] temperatures = [-40, -20, 0, 25, 45, 60];

        var resistances = temperatures.Select(t => Arrhenius.ResistanceAt(1.0, ea, t)).ToArray();

        Assert.All(resistances.Zip(resistances.Skip(1)), pair => Assert.True(pair.Second < pair.First));
    }

    [Fact]
    public void RateRatio_ZeroActivationEnergy_IsOne()
    {
        Assert.Equal(1.0, Arrhenius.RateRatio(0, -20, 60));
    }
}
