using System.Globalization;
using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Curves;

/// <summary>
/// Open-circuit voltage against state of charge, interpolated piecewise linearly between the table's rows.
/// Piecewise-linear interpolation of a strictly increasing table is monotone, so SOC→V and V→SOC are exact
/// inverses of each other, and the energy integral ∫V dSOC is exact (trapezoid rule per segment).
/// State of charge is a fraction 0–1 inside this type; tables are entered in %.
/// </summary>
public sealed class OcvCurve
{
    private readonly double[] _soc;
    private readonly double[] _volts;
    private readonly double[] _cumulativeEnergy;

    private OcvCurve(double[] soc, double[] volts, OcvPoint[] points)
    {
        _soc = soc;
        _volts = volts;
        _cumulativeEnergy = new double[soc.Length];
        for (var i = 1; i < soc.Length; i++)
        {
            _cumulativeEnergy[i] = _cumulativeEnergy[i - 1] + 0.5 * (volts[i] + volts[i - 1]) * (soc[i] - soc[i - 1]);
        }

        // The rows as entered: SOC/100·100 does not always give the entered percentage back (0.55·100 ≠ 55).
        Points = points;
    }

    /// <summary>The table, SOC in %.</summary>
    public IReadOnlyList<OcvPoint> Points { get; }

    /// <summary>Rest voltage at 0 % state of charge, V.</summary>
    public double EmptyVoltage => _volts[0];

    /// <summary>Rest voltage at 100 % state of charge, V.</summary>
    public double FullVoltage => _volts[^1];

    /// <summary>
    /// Checks a table: at least two rows, first row at 0 %, last at 100 %, SOC and voltage strictly increasing,
    /// every voltage finite and inside [<paramref name="minVoltage"/>, <paramref name="maxVoltage"/>].
    /// Each error names its row as <c>{field}[i].socPercent</c> or <c>{field}[i].voltage</c>.
    /// </summary>
    public static IReadOnlyList<ValidationError> Validate(
        IReadOnlyList<OcvPoint> points, double minVoltage, double maxVoltage, string field = "cell.ocvCurve")
    {
        var errors = new List<ValidationError>();
        if (points.Count < 2)
        {
            errors.Add(new(field, "The open-circuit-voltage table needs at least two rows (0 % and 100 %)."));
            return errors;
        }

        for (var i = 0; i < points.Count; i++)
        {
            var p = points[i];
            var row = string.Create(CultureInfo.InvariantCulture, $"{field}[{i}]");
            if (!double.IsFinite(p.SocPercent) || p.SocPercent < 0 || p.SocPercent > 100)
            {
                errors.Add(new($"{row}.socPercent", $"Row {i + 1}: state of charge must be between 0 and 100 %."));
            }
            else if (i > 0 && double.IsFinite(points[i - 1].SocPercent) && p.SocPercent <= points[i - 1].SocPercent)
            {
                errors.Add(new($"{row}.socPercent", $"Row {i + 1}: state of charge must increase strictly from the row before."));
            }

            if (!double.IsFinite(p.Voltage) || p.Voltage <= 0)
            {
                errors.Add(new($"{row}.voltage", $"Row {i + 1}: voltage must be a positive number."));
            }
            else if (p.Voltage < minVoltage - 1e-9 || p.Voltage > maxVoltage + 1e-9)
            {
                errors.Add(new($"{row}.voltage", string.Create(CultureInfo.InvariantCulture,
                    $"Row {i + 1}: {p.Voltage:0.###} V lies outside the cell's range {minVoltage:0.###}–{maxVoltage:0.###} V.")));
            }
            else if (i > 0 && double.IsFinite(points[i - 1].Voltage) && p.Voltage <= points[i - 1].Voltage)
            {
                errors.Add(new($"{row}.voltage", $"Row {i + 1}: voltage must increase strictly from the row before."));
            }
        }

        if (double.IsFinite(points[0].SocPercent) && points[0].SocPercent != 0)
        {
            errors.Add(new($"{field}[0].socPercent", "The first row must be at 0 % state of charge."));
        }

        if (double.IsFinite(points[^1].SocPercent) && points[^1].SocPercent != 100)
        {
            errors.Add(new(string.Create(CultureInfo.InvariantCulture, $"{field}[{points.Count - 1}].socPercent"),
                "The last row must be at 100 % state of charge."));
        }

        return errors;
    }

    /// <summary>Builds a curve from a table that <see cref="Validate"/> accepted (without the range check).</summary>
    /// <exception cref="ArgumentException">The table is not strictly increasing from 0 % to 100 %.</exception>
    public static OcvCurve Create(IReadOnlyList<OcvPoint> points)
    {
        var errors = Validate(points, double.Epsilon, double.MaxValue);
        if (errors.Count > 0)
        {
            throw new ArgumentException(errors[0].Message, nameof(points));
        }

        return new OcvCurve(points.Select(p => p.SocPercent / 100.0).ToArray(), points.Select(p => p.Voltage).ToArray(), points.ToArray());
    }

    /// <summary>Rest voltage at state of charge <paramref name="soc"/> (fraction, clamped to 0–1), V.</summary>
    public double VoltageAt(double soc)
    {
        if (soc <= 0)
        {
            return _volts[0];
        }

        if (soc >= 1)
        {
            return _volts[^1];
        }

        var i = Segment(_soc, soc);
        var t = (soc - _soc[i]) / (_soc[i + 1] - _soc[i]);
        return _volts[i] + t * (_volts[i + 1] - _volts[i]);
    }

    /// <summary>dV/dSOC (V per unit SOC) of the segment holding <paramref name="soc"/>.</summary>
    public double SlopeAt(double soc)
    {
        var s = Math.Clamp(soc, 0, 1);
        var i = Segment(_soc, s);
        return (_volts[i + 1] - _volts[i]) / (_soc[i + 1] - _soc[i]);
    }

    /// <summary>State of charge (fraction) at rest voltage <paramref name="voltage"/>, clamped to the table's ends.</summary>
    public double SocAt(double voltage)
    {
        if (voltage <= _volts[0])
        {
            return 0;
        }

        if (voltage >= _volts[^1])
        {
            return 1;
        }

        var i = Segment(_volts, voltage);
        var t = (voltage - _volts[i]) / (_volts[i + 1] - _volts[i]);
        return _soc[i] + t * (_soc[i + 1] - _soc[i]);
    }

    /// <summary>
    /// ∫ V dSOC from <paramref name="socFrom"/> to <paramref name="socTo"/> (fractions, clamped to 0–1), in V;
    /// multiply by a capacity in Ah to get Wh. Exact for the piecewise-linear curve.
    /// </summary>
    public double EnergyIntegral(double socFrom, double socTo)
    {
        return Cumulative(Math.Clamp(socTo, 0, 1)) - Cumulative(Math.Clamp(socFrom, 0, 1));
    }

    /// <summary>Mean rest voltage over the whole range, V.</summary>
    public double MeanVoltage => _cumulativeEnergy[^1];

    private double Cumulative(double soc)
    {
        if (soc >= 1)
        {
            return _cumulativeEnergy[^1];
        }

        var i = Segment(_soc, soc);
        var v = VoltageAt(soc);
        return _cumulativeEnergy[i] + 0.5 * (_volts[i] + v) * (soc - _soc[i]);
    }

    private static int Segment(double[] xs, double x)
    {
        var i = Array.BinarySearch(xs, x);
        if (i < 0)
        {
            i = ~i - 1;
        }

        return Math.Clamp(i, 0, xs.Length - 2);
    }
}
