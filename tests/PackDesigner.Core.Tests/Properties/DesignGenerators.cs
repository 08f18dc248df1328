using CsCheck;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;

namespace PackDesigner.Core.Tests.Properties;

/// <summary>
/// Generators of valid designs: a random chemistry preset, S 1–400, P 1–50, a random window, controller and
/// charger limits around the pack's own voltages, ambient, capacity tolerance 0–10 % and either balancing method.
/// </summary>
public static class DesignGenerators
{
    private static readonly Gen<Chemistry> Chemistries = Gen.OneOf(Chemistry.Lfp, Chemistry.Nmc, Chemistry.Nca, Chemistry.Lto);

    private static readonly Gen<(double Min, double Max)> Windows =
        Gen.Select(Gen.Double[0, 40], Gen.Double[5, 100]).Select((lo, width) => (Math.Round(lo, 1), Math.Min(100, Math.Round(lo + width, 1))))
            .Where(w => w.Item2 > w.Item1);

    private static readonly Gen<double> Steps = Gen.OneOf(0.001, 0.01, 0.05, 0.1, 0.5, 1.0);

    /// <summary>A random design that passes validation.</summary>
    public static readonly Gen<DesignInput> ValidDesigns =
        Gen.Select(
                Gen.Select(Chemistries, Gen.Int[1, 400], Gen.Int[1, 50], Gen.Double[0, 10], Gen.Enum<BalancingMethod>(), Windows),
                Gen.Select(Gen.Double[0.7, 1.3], Gen.Double[0.95, 1.25], Gen.Double[0.05, 1.6], Gen.Double[1, 3], Gen.Double[0, 1.2], Gen.Double[0, 5000], Gen.Double[0.1, 5]),
                Gen.Select(Gen.Double[0.8, 1.1], Gen.Double[0.01, 2], Steps, Gen.Bool, Gen.Double[0, 1], Gen.Bool),
                Gen.Select(Gen.Double[-30, 20], Gen.Double[0, 40], Gen.Double[0, 0.5], Gen.Bool, Gen.Double[1, 300], Gen.Double[0.2, 10]))
            .Select((cellAndPack, controller, charger, rest) => Build(cellAndPack, controller, charger, rest));

    private static DesignInput Build(
        (Chemistry Chemistry, int S, int P, double Tolerance, BalancingMethod Balancing, (double Min, double Max) Window) a,
        (double MinFactor, double MaxFactor, double ContinuousFactor, double PeakFactor, double RegenFactor, double DcLinkUf, double PrechargeS) c,
        (double ChargerFactor, double ChargerCurrentFactor, double Step, bool Float, double TargetFraction, bool UseTarget) ch,
        (double AmbientMin, double AmbientSpan, double LinkMilliohm, bool UseCable, double CableMm2, double CableM) r)
    {
        var preset = ChemistryPresets.For(a.Chemistry)!;
        var s = a.S;
        var p = a.P;
        var packMax = s * preset.MaxChargeVoltage;
        var controllerMax = Math.Min(2000, packMax * c.MaxFactor);
        var controllerMin = Math.Min(controllerMax * 0.99, s * preset.MinDischargeVoltage * c.MinFactor);
        var continuous = Math.Round(Math.Max(0.1, p * preset.MaxDischargeCurrentA * c.ContinuousFactor), 2);
        var peak = Math.Round(continuous * c.PeakFactor, 2);
        var emptyV = preset.OcvCurve[0].Voltage;
        double? target = ch.UseTarget ? emptyV + 0.001 + (preset.MaxChargeVoltage - emptyV - 0.001) * ch.TargetFraction : null;
        return new DesignInput
        {
            Cell = new CellInput { Chemistry = a.Chemistry, CapacityTolerancePercent = Math.Round(a.Tolerance, 2) },
            Series = s,
            Parallel = p,
            LinkResistanceMilliohm = r.LinkMilliohm,
            Cable = r.UseCable ? new CableInput(r.CableMm2, r.CableM) : null,
            Balancing = a.Balancing,
            SocWindow = new SocWindowInput(a.Window.Min, a.Window.Max),
            Controller = new ControllerInput(
                MinVoltage: Math.Max(0.1, controllerMin),
                MaxVoltage: controllerMax,
                ContinuousCurrentA: continuous,
                PeakCurrentA: peak,
                PeakDurationS: 10,
                RegenCurrentA: Math.Round(continuous * c.RegenFactor, 2),
                DcLinkCapacitanceMicrofarad: Math.Round(c.DcLinkUf),
                PrechargeTimeS: c.PrechargeS),
            Charger = new ChargerInput(
                MaxVoltage: Math.Min(2000, packMax * ch.ChargerFactor),
                MaxCurrentA: Math.Min(10_000, Math.Max(0.1, p * preset.MaxChargeCurrentA * ch.ChargerCurrentFactor)),
                VoltageStepV: ch.Step,
                FloatStage: ch.Float,
                TargetCellVoltage: target),
            Ambient = new AmbientInput(r.AmbientMin, r.AmbientMin + r.AmbientSpan),
        };
    }

    /// <summary>Values that no field accepts: not a number, infinite, far below and far above every bound.</summary>
    public static readonly Gen<double> InvalidValues = Gen.OneOf(double.NaN, double.PositiveInfinity, double.NegativeInfinity, -1e9, 1e12);
}
