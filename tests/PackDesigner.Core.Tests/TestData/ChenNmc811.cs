using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Tests.TestData;

/// <summary>
/// The published open-circuit-voltage fit of Chen et al., J. Electrochem. Soc. 167 (2020) 080534, for an
/// NMC811 positive and a graphite-SiOx negative electrode, written out independently of Core. Cell OCV =
/// U_p(y) − U_n(x) with the stoichiometries running linearly from x = 0.0279 → 0.9014 and y = 0.9084 → 0.2661
/// between 0 and 100 % state of charge (the windows are medium confidence, from memory, see REFERENCES.md).
/// </summary>
public static class ChenNmc811
{
    private const double X0 = 0.0279, X100 = 0.9014, Y0 = 0.9084, Y100 = 0.2661;

    public static double PositiveElectrode(double y) =>
        -0.8090 * y + 4.4875 - 0.0428 * Math.Tanh(18.5138 * (y - 0.5542))
        - 17.7326 * Math.Tanh(15.7890 * (y - 0.3117)) + 17.5842 * Math.Tanh(15.9308 * (y - 0.3120));

    public static double NegativeElectrode(double x) =>
        1.9793 * Math.Exp(-39.3631 * x) + 0.2482 - 0.0909 * Math.Tanh(29.8538 * (x - 0.1234))
        - 0.04478 * Math.Tanh(14.9159 * (x - 0.2769)) - 0.0205 * Math.Tanh(30.4444 * (x - 0.6103));

    /// <summary>Cell OCV at state of charge <paramref name="soc"/> (fraction), V.</summary>
    public static double CellVoltage(double soc) =>
        PositiveElectrode(Y0 + (Y100 - Y0) * soc) - NegativeElectrode(X0 + (X100 - X0) * soc);

    /// <summary>A fine table of the fit: <paramref name="points"/> rows evenly spaced from 0 to 100 %.</summary>
    public static OcvPoint[] Table(int points) =>
        Enumerable.Range(0, points)
            .Select(i => i == points - 1 ? 100.0 : 100.0 * i / (points - 1))
            .Select(soc => new OcvPoint(soc, CellVoltage(soc / 100)))
            .ToArray();

    public static OcvCurve Curve(int points) => OcvCurve.Create(Table(points));
}
