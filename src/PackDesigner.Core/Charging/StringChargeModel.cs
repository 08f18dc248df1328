using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;
using PackDesigner.Core.Numerics;

namespace PackDesigner.Core.Charging;

/// <summary>Group voltages of a string at the end of charge, V per group (= per cell), SOC as fractions.</summary>
public sealed record EndOfChargeState(
    double TypicalSoc,
    double WeakestSoc,
    double TypicalVoltage,
    double WeakestVoltage,
    bool WeakestForcedAboveFull)
{
    /// <summary>The highest group voltage at end of charge.</summary>
    public double HighestVoltage => Math.Max(TypicalVoltage, WeakestVoltage);
}

/// <summary>
/// A string of S parallel groups: S − 1 of nominal capacity and one weakest group, in series, all on one OCV
/// curve. The typical group's SOC s is the state variable. Bottom-balanced: every group starts from the common
/// empty point, so a common charge Q gives SOCᵢ = Q/Cᵢ. Top-balanced: every group is full together, so SOCᵢ =
/// 1 − (C_n − Q)/Cᵢ. At the end of charge Σ (OCV(SOCᵢ) + η) + drop = CV, with η = I_term·R_group the termination
/// overpotential of a group and drop the termination current through links and cable. When the weakest group is
/// already full before the string reaches CV, the charger forces the rest of the CV onto it.
/// </summary>
public sealed class StringChargeModel
{
    private readonly OcvCurve _curve;
    private readonly int _series;
    private readonly double _capacityRatio; // C_n / C_w
    private readonly BalancingMethod _balancing;
    private readonly double _overpotential;
    private readonly double _seriesDrop;

    /// <param name="curve">Cell OCV curve.</param>
    /// <param name="series">Number of groups S.</param>
    /// <param name="nominalGroupAh">Capacity of a typical group, Ah.</param>
    /// <param name="weakestGroupAh">Capacity of the weakest group, Ah (≤ nominal).</param>
    /// <param name="balancing">Where the groups are matched.</param>
    /// <param name="overpotentialV">η: termination current × group resistance, V.</param>
    /// <param name="seriesDropV">Termination current × (links + cable), V.</param>
    public StringChargeModel(OcvCurve curve, int series, double nominalGroupAh, double weakestGroupAh, BalancingMethod balancing, double overpotentialV, double seriesDropV)
    {
        _curve = curve;
        _series = series;
        _capacityRatio = nominalGroupAh / weakestGroupAh;
        _balancing = balancing;
        _overpotential = overpotentialV;
        _seriesDrop = seriesDropV;
    }

    /// <summary>Weakest group's SOC when the typical group is at <paramref name="typicalSoc"/>.</summary>
    public double WeakestSoc(double typicalSoc) => _balancing == BalancingMethod.Bottom
        ? typicalSoc * _capacityRatio
        : 1 - (1 - typicalSoc) * _capacityRatio;

    /// <summary>Typical group's SOC at which the weakest is at <paramref name="weakestSoc"/>.</summary>
    public double TypicalSoc(double weakestSoc) => _balancing == BalancingMethod.Bottom
        ? weakestSoc / _capacityRatio
        : 1 - (1 - weakestSoc) / _capacityRatio;

    private double SLow => _balancing == BalancingMethod.Bottom ? 0 : Math.Max(0, TypicalSoc(0));

    private double SHigh => _balancing == BalancingMethod.Bottom ? Math.Min(1, TypicalSoc(1)) : 1;

    /// <summary>Charger terminal voltage with the typical group at <paramref name="s"/> and the termination current flowing.</summary>
    public double TerminalVoltage(double s) =>
        (_series - 1) * (_curve.VoltageAt(s) + _overpotential) + _curve.VoltageAt(WeakestSoc(s)) + _overpotential + _seriesDrop;

    private double TerminalSlope(double s)
    {
        var dw = _capacityRatio; // dw/ds for both methods
        return (_series - 1) * _curve.SlopeAt(s) + _curve.SlopeAt(WeakestSoc(s)) * dw;
    }

    /// <summary>Solves the end-of-charge state for a charger constant voltage <paramref name="cv"/> (V, at the charger's terminals).</summary>
    public EndOfChargeState EndOfCharge(double cv)
    {
        var lo = SLow;
        var hi = SHigh;
        if (TerminalVoltage(hi) <= cv)
        {
            return Forced(cv, hi);
        }

        if (TerminalVoltage(lo) >= cv)
        {
            return State(lo, false, 0);
        }

        var s = RootFinder.Solve(x => TerminalVoltage(x) - cv, TerminalSlope, lo, hi, 1e-12);
        return State(s, false, 0);
    }

    /// <summary>
    /// Charger voltage at which the highest group reaches <paramref name="groupVoltage"/> (V, including η)
    /// at the end of charge. Closed form: the highest group's SOC follows from inverting the curve.
    /// </summary>
    public double ConstantVoltageForHighestGroup(double groupVoltage)
    {
        var restVoltage = groupVoltage - _overpotential;
        if (_balancing == BalancingMethod.Bottom && _series > 1)
        {
            var w = restVoltage >= _curve.FullVoltage ? 1 : _curve.SocAt(restVoltage);
            var s = TypicalSoc(w);
            return (_series - 1) * (_curve.VoltageAt(s) + _overpotential) + groupVoltage + _seriesDrop;
        }

        if (restVoltage >= _curve.FullVoltage)
        {
            return _series * groupVoltage + _seriesDrop;
        }

        var typical = _curve.SocAt(restVoltage);
        return (_series - 1) * groupVoltage + _curve.VoltageAt(WeakestSoc(typical)) + _overpotential + _seriesDrop;
    }

    /// <summary>Charger voltage at which the typical group ends the charge at <paramref name="typicalSoc"/>; +∞ when the weakest group would have to be overfilled.</summary>
    public double ConstantVoltageForTypicalSoc(double typicalSoc) =>
        typicalSoc > SHigh + 1e-12 ? double.PositiveInfinity : TerminalVoltage(typicalSoc);

    private EndOfChargeState Forced(double cv, double s)
    {
        var state = State(s, false, 0);
        if (_balancing == BalancingMethod.Bottom && _series > 1)
        {
            var rest = cv - (_series - 1) * state.TypicalVoltage - _seriesDrop;
            return state with { WeakestVoltage = rest, WeakestForcedAboveFull = rest > state.WeakestVoltage + 1e-12 };
        }

        var each = (cv - _seriesDrop) / _series;
        return state with { TypicalVoltage = Math.Max(each, state.TypicalVoltage), WeakestVoltage = Math.Max(each, state.WeakestVoltage), WeakestForcedAboveFull = each > state.WeakestVoltage + 1e-12 };
    }

    private EndOfChargeState State(double s, bool forced, double extra)
    {
        var w = Math.Clamp(WeakestSoc(s), 0, 1);
        return new EndOfChargeState(s, w, _curve.VoltageAt(s) + _overpotential, _curve.VoltageAt(w) + _overpotential + extra, forced);
    }
}
