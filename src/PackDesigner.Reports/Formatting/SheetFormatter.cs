using System.Globalization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Standards;

namespace PackDesigner.Reports.Formatting;

/// <summary>
/// The one place where the design sheet turns numbers into text, shared by the PDF, the HTML print view and the
/// exports: invariant culture, ASCII minus, no digit grouping (values are meant to be typed into a BMS or a
/// charger), a space before every unit, no negative zero, and "n/a" instead of a non-finite number.
/// Decimals: cell voltages 3, pack voltages 2, temperatures 1; currents 2 below 10 A, 1 below 1000 A, else 0;
/// other computed quantities (resistance, energy, power, time) three significant digits; entered figures as
/// entered (up to 6 decimals).
/// </summary>
public static class SheetFormatter
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string NotAvailable = "n/a";

    /// <summary>Voltage of one cell (or one parallel group), V, 3 decimals.</summary>
    public static SheetValue CellVoltage(double volts) => new(Fixed(volts, 3), "V");

    /// <summary>Voltage of the pack or of equipment on the pack, V, 2 decimals.</summary>
    public static SheetValue PackVoltage(double volts) => new(Fixed(volts, 2), "V");

    /// <summary>Current, A: 2 decimals below 10 A, 1 below 1000 A, none above.</summary>
    public static SheetValue Current(double amps)
    {
        var magnitude = Math.Abs(amps);
        var decimals = magnitude < 10 ? 2 : magnitude < 1000 ? 1 : 0;
        return new(Fixed(amps, decimals), "A");
    }

    /// <summary>Temperature, °C, 1 decimal.</summary>
    public static SheetValue Temperature(double celsius) => new(Fixed(celsius, 1), "°C");

    /// <summary>Delay or duration in seconds, up to 3 decimals without trailing zeros.</summary>
    public static SheetValue Seconds(double seconds) => new(Trimmed(seconds, 3), "s");

    /// <summary>A computed time in seconds, three significant digits.</summary>
    public static SheetValue ComputedSeconds(double seconds) => new(Significant(seconds, 3, 4), "s");

    /// <summary>Delay in microseconds, no decimals.</summary>
    public static SheetValue Microseconds(double microseconds) => new(Fixed(microseconds, 0), "µs");

    /// <summary>Resistance in mΩ, three significant digits (at most 4 decimals).</summary>
    public static SheetValue Milliohm(double milliohm) => new(Significant(milliohm, 3, 4), "mΩ");

    /// <summary>Resistance in Ω, three significant digits (at most 4 decimals).</summary>
    public static SheetValue Ohm(double ohm) => new(Significant(ohm, 3, 4), "Ω");

    /// <summary>Energy: Wh below 1 kWh (no decimals), kWh with 2 decimals above.</summary>
    public static SheetValue Energy(double wattHours) =>
        Math.Abs(wattHours) < 1000 ? new(Fixed(wattHours, 0), "Wh") : new(Fixed(wattHours / 1000, 2), "kWh");

    /// <summary>A probability given as a fraction, printed in % with 2 decimals.</summary>
    public static SheetValue Probability(double fraction) => new(Fixed(fraction * 100, 2), "%");

    /// <summary>A 95 % interval of a probability given as fractions: "0.05–0.20 %".</summary>
    public static string ProbabilityInterval(double low, double high) => $"{Fixed(low * 100, 2)}–{Fixed(high * 100, 2)} %";

    /// <summary>Energy in J, three significant digits.</summary>
    public static SheetValue Joules(double joules) => new(Significant(joules, 3, 3), "J");

    /// <summary>Power in W, three significant digits.</summary>
    public static SheetValue Watts(double watts) => new(Significant(watts, 3, 3), "W");

    /// <summary>Capacity in Ah, three significant digits (at most 2 decimals).</summary>
    public static SheetValue Capacity(double ampHours) => new(Significant(ampHours, 3, 2), "Ah");

    /// <summary>Mass in kg, three significant digits (at most 3 decimals).</summary>
    public static SheetValue Mass(double kilograms) => new(Significant(kilograms, 3, 3), "kg");

    /// <summary>A computed percentage, 1 decimal.</summary>
    public static SheetValue Percent(double percent) => new(Fixed(percent, 1), "%");

    /// <summary>Current density in A/mm², 2 decimals.</summary>
    public static SheetValue CurrentDensity(double ampsPerMm2) => new(Fixed(ampsPerMm2, 2), "A/mm²");

    /// <summary>Specific energy in Wh/kg, no decimals.</summary>
    public static SheetValue SpecificEnergy(double whPerKg) => new(Fixed(whPerKg, 0), "Wh/kg");

    /// <summary>A figure as the user entered it: up to 6 decimals, trailing zeros dropped.</summary>
    public static SheetValue Entered(double value, string unit) => new(Trimmed(value, 6), unit);

    /// <summary>A count, no decimals.</summary>
    public static SheetValue Count(int count, string unit) => new(count.ToString(Inv), unit);

    /// <summary>An on/off setting.</summary>
    public static SheetValue OnOff(bool on) => SheetValue.Word(on ? "on" : "off");

    /// <summary>A UTC time to the minute: <c>2026-12-01 14:03 UTC</c>.</summary>
    public static string DateTimeUtc(DateTime utc) => ToUtc(utc).ToString("yyyy-MM-dd HH:mm 'UTC'", Inv);

    /// <summary>A UTC date: <c>2026-12-01</c>.</summary>
    public static string DateUtc(DateTime utc) => ToUtc(utc).ToString("yyyy-MM-dd", Inv);

    /// <summary>The first 12 hexadecimal digits of a hash, lower case.</summary>
    public static string ShortHash(string hash) => hash.Trim().ToLowerInvariant()[..Math.Min(12, hash.Trim().Length)];

    /// <summary>"Page 2 of 7".</summary>
    public static string PageLabel(int page, int pageCount) => string.Create(Inv, $"Page {page} of {pageCount}");

    /// <summary>"Revision 3".</summary>
    public static string Revision(int revision) => string.Create(Inv, $"Revision {revision}");

    public static string ChemistryName(Chemistry chemistry) => chemistry switch
    {
        Chemistry.Lfp => "LFP (lithium iron phosphate)",
        Chemistry.Nmc => "NMC (nickel manganese cobalt oxide)",
        Chemistry.Nca => "NCA (nickel cobalt aluminium oxide)",
        Chemistry.Lto => "LTO (lithium titanate)",
        _ => "Custom chemistry",
    };

    public static string VoltageClassName(VoltageClass voltageClass) => voltageClass switch
    {
        VoltageClass.A => "A (up to 60 V DC, ISO 6469-3)",
        VoltageClass.B => "B (over 60 V DC, ISO 6469-3)",
        _ => "Above B (over 1500 V DC)",
    };

    public static string BalancingName(BalancingMethod method) => method == BalancingMethod.Bottom ? "Bottom-balanced" : "Top-balanced";

    public static string SeverityName(Severity severity) => severity switch
    {
        Severity.Error => "Error",
        Severity.Warning => "Warning",
        _ => "Info",
    };

    public static string OriginName(FigureOrigin origin) => origin switch
    {
        FigureOrigin.Datasheet => "Datasheet",
        FigureOrigin.Preset => "Preset (typical)",
        _ => "Derived",
    };

    /// <summary>"2 errors, 1 warning, 0 info".</summary>
    public static string FindingCounts(int errors, int warnings, int infos) =>
        string.Create(Inv, $"{errors} {(errors == 1 ? "error" : "errors")}, {warnings} {(warnings == 1 ? "warning" : "warnings")}, {infos} info");

    /// <summary>Fixed decimals, rounding half away from zero; never "-0".</summary>
    public static string Fixed(double value, int decimals)
    {
        if (!double.IsFinite(value))
        {
            return NotAvailable;
        }

        var rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        if (rounded == 0)
        {
            rounded = 0; // drops the sign of a negative zero
        }

        return rounded.ToString("F" + decimals.ToString(Inv), Inv);
    }

    /// <summary>Up to <paramref name="maxDecimals"/> decimals, trailing zeros dropped; never "-0".</summary>
    public static string Trimmed(double value, int maxDecimals)
    {
        var text = Fixed(value, maxDecimals);
        if (text == NotAvailable || !text.Contains('.'))
        {
            return text;
        }

        return text.TrimEnd('0').TrimEnd('.');
    }

    /// <summary>
    /// <paramref name="digits"/> significant digits by choosing the number of decimals (at most
    /// <paramref name="maxDecimals"/>); large values keep all their integer digits.
    /// </summary>
    public static string Significant(double value, int digits, int maxDecimals)
    {
        if (!double.IsFinite(value))
        {
            return NotAvailable;
        }

        if (value == 0)
        {
            return Fixed(0, Math.Min(digits - 1, maxDecimals));
        }

        var magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        var decimals = Math.Clamp(digits - 1 - magnitude, 0, maxDecimals);
        // Rounding can carry into the next decade (9.996 → 10.00): recompute once from the rounded value.
        var rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        if (rounded != 0 && (int)Math.Floor(Math.Log10(Math.Abs(rounded))) > magnitude)
        {
            decimals = Math.Clamp(decimals - 1, 0, maxDecimals);
        }

        return Fixed(value, decimals);
    }

    private static DateTime ToUtc(DateTime time) => time.Kind == DateTimeKind.Unspecified ? DateTime.SpecifyKind(time, DateTimeKind.Utc) : time.ToUniversalTime();
}
