using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Tests.TestData;

/// <summary>Cells for tests: a custom cell with every figure, and curves with a known closed form.</summary>
public static class TestCells
{
    /// <summary>A custom-chemistry cell with every figure given (test scaffolding).</summary>
    public static CellInput CompleteCustom(IReadOnlyList<OcvPoint>? curve = null) => new()
    {
        Chemistry = Chemistry.Custom,
        CapacityAh = 50,
        NominalVoltage = 3.3,
        MaxChargeVoltage = 3.8,
        MinDischargeVoltage = 2.8,
        MaxChargeCurrentA = 50,
        MaxDischargeCurrentA = 100,
        PeakDischargeCurrentA = 200,
        PeakDischargeDurationS = 10,
        InternalResistanceMilliohm = 1.0,
        MassKg = 1.0,
        CapacityTolerancePercent = 5,
        ChargeTemperatureMinC = 0,
        ChargeTemperatureMaxC = 45,
        DischargeTemperatureMinC = -20,
        DischargeTemperatureMaxC = 60,
        OcvCurve = curve ?? Linear(3.0, 3.6),
    };

    /// <summary>A straight-line curve from <paramref name="emptyV"/> at 0 % to <paramref name="fullV"/> at 100 %.</summary>
    public static OcvPoint[] Linear(double emptyV, double fullV) => [new(0, emptyV), new(100, fullV)];

    public static OcvCurve LinearCurve(double emptyV, double fullV) => OcvCurve.Create(Linear(emptyV, fullV));
}
