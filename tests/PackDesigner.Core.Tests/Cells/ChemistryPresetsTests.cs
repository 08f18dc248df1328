using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Cells;

/// <summary>Preset figures against trade conventions (common practice; no single published source) and the published NMC fit.</summary>
public sealed class ChemistryPresetsTests
{
    [Fact]
    public void Lfp_Voltages_AreCommonPractice()
    {
        // Common practice: LFP/graphite 3.65 V maximum charge, 2.5 V minimum, 3.2–3.3 V nominal.
        Assert.Equal(3.65, ChemistryPresets.Lfp.MaxChargeVoltage);
        Assert.Equal(2.5, ChemistryPresets.Lfp.MinDischargeVoltage);
        Assert.InRange(ChemistryPresets.Lfp.NominalVoltage, 3.2, 3.3);
    }

    [Fact]
    public void Nmc_Voltages_AreCommonPractice()
    {
        // Common practice: NMC 4.2 V / 2.5–3.0 V / 3.6–3.7 V.
        Assert.Equal(4.2, ChemistryPresets.Nmc.MaxChargeVoltage);
        Assert.InRange(ChemistryPresets.Nmc.MinDischargeVoltage, 2.5, 3.0);
        Assert.InRange(ChemistryPresets.Nmc.NominalVoltage, 3.6, 3.7);
    }

    [Fact]
    public void Nca_Voltages_AreCommonPractice()
    {
        // Common practice (from memory): NCA as NMC, 4.2 V / 2.5–3.0 V / 3.6–3.7 V.
        Assert.Equal(4.2, ChemistryPresets.Nca.MaxChargeVoltage);
        Assert.InRange(ChemistryPresets.Nca.MinDischargeVoltage, 2.5, 3.0);
        Assert.InRange(ChemistryPresets.Nca.NominalVoltage, 3.6, 3.7);
    }

    [Fact]
    public void Lto_VoltagesAndColdCharging_AreCommonPractice()
    {
        // Common practice: LTO 2.7–2.8 V / 1.5–1.8 V / 2.3–2.4 V, and it can charge below 0 °C.
        Assert.InRange(ChemistryPresets.Lto.MaxChargeVoltage, 2.7, 2.8);
        Assert.InRange(ChemistryPresets.Lto.MinDischargeVoltage, 1.5, 1.8);
        Assert.InRange(ChemistryPresets.Lto.NominalVoltage, 2.3, 2.4);
        Assert.True(ChemistryPresets.Lto.ChargeTemperatureMinC < 0);
    }

    [Theory]
    [InlineData(Chemistry.Lfp)]
    [InlineData(Chemistry.Nmc)]
    [InlineData(Chemistry.Nca)]
    public void GraphiteAnodePresets_ChargeMinimum_IsZeroCelsius(Chemistry chemistry)
    {
        // Common practice: graphite anodes take no charge below 0 °C (lithium plating); charge 0–45 °C, discharge −20–60 °C.
        var preset = ChemistryPresets.For(chemistry)!;

        Assert.Equal(0, preset.ChargeTemperatureMinC);
        Assert.Equal(45, preset.ChargeTemperatureMaxC);
        Assert.Equal(-20, preset.DischargeTemperatureMinC);
        Assert.Equal(60, preset.DischargeTemperatureMaxC);
    }

    [Fact]
    public void All_EveryPreset_IsReturnedByForAndCustomHasNone()
    {
        Assert.Equal(4, ChemistryPresets.All.Count);
        Assert.All(ChemistryPresets.All, p => Assert.Same(p, ChemistryPresets.For(p.Chemistry)));
        Assert.Null(ChemistryPresets.For(Chemistry.Custom));
    }

    [Fact]
    public void All_EveryPreset_HasCurveInsideItsOwnVoltageRangeAndConsistentFigures()
    {
        foreach (var p in ChemistryPresets.All)
        {
            Assert.Empty(OcvCurve.Validate(p.OcvCurve, p.MinDischargeVoltage, p.MaxChargeVoltage));
            Assert.True(p.MinDischargeVoltage < p.NominalVoltage && p.NominalVoltage < p.MaxChargeVoltage, p.Description);
            Assert.True(p.PeakDischargeCurrentA >= p.MaxDischargeCurrentA, p.Description);
            Assert.True(p.Sources.ContainsKey("*"), p.Description);
        }
    }

    [Fact]
    public void Nmc_CurveRows_MatchChenFitWithinOneMillivolt()
    {
        // The NMC preset table is sampled from Chen et al., J. Electrochem. Soc. 167 (2020) 080534; Core documents
        // that its 0 % row is 2.500 V instead of the fit's 2.498 V so that it sits at the preset's minimum.
        foreach (var row in ChemistryPresets.Nmc.OcvCurve)
        {
            var fit = ChenNmc811.CellVoltage(row.SocPercent / 100);
            var allowed = row.SocPercent == 0 ? 0.003 : 0.001;
            Assert.True(Math.Abs(row.Voltage - fit) <= allowed, $"{row.SocPercent} %: preset {row.Voltage} V, fit {fit:0.0000} V.");
        }

        Assert.Equal(2.5, ChemistryPresets.Nmc.OcvCurve[0].Voltage);
        Assert.Contains("Chen et al.", ChemistryPresets.Nmc.Sources["ocvCurve"], StringComparison.Ordinal);
    }

    [Fact]
    public void Nmc_PresetCurveEnergy_MatchesChenFitWithinSamplingError()
    {
        // Chen et al. 2020 fit, 5 Ah cell: 18.47 Wh over 0–100 %, 14.90 Wh over 10–90 %. The 5 % table with
        // straight segments between rows loses some curvature (18.45 Wh over 0–100 %): allow 0.2 %.
        var curve = OcvCurve.Create(ChemistryPresets.Nmc.OcvCurve);

        Reference.AssertClose(ReferenceValues.ChenEnergy0To100Wh, ReferenceValues.ChenCellCapacityAh * curve.EnergyIntegral(0, 1), 2e-3);
        Reference.AssertClose(ReferenceValues.ChenEnergy10To90Wh, ReferenceValues.ChenCellCapacityAh * curve.EnergyIntegral(0.1, 0.9), 2e-3);
    }
}
