using System.Globalization;

namespace PackDesigner.Web.Formatting;

/// <summary>
/// Number formatting for people, always with the invariant culture: a point as the decimal separator, digit
/// groups of large numbers split by a narrow no-break space (as ISO 80000-1 writes them, so that no comma can
/// be read as a decimal separator), and the unit after a no-break space.
/// </summary>
public static class Numbers
{
    public const string Missing = "—";
    private const char GroupSeparator = '\u202F';
    private const char UnitSeparator = '\u00A0';

    public static string Fixed(double value, int decimals)
    {
        if (!double.IsFinite(value))
        {
            return Missing;
        }

        var rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        if (rounded == 0)
        {
            rounded = 0; // no "-0.0"
        }

        var format = (Math.Abs(rounded) >= 10_000 ? "N" : "F") + decimals.ToString(CultureInfo.InvariantCulture);
        return rounded.ToString(format, CultureInfo.InvariantCulture).Replace(',', GroupSeparator);
    }

    public static string Quantity(double value, int decimals, string unit) =>
        double.IsFinite(value) ? Fixed(value, decimals) + UnitSeparator + unit : Missing;

    public static string Quantity(double? value, int decimals, string unit) =>
        value is { } v ? Quantity(v, decimals, unit) : Missing;

    /// <summary>
    /// A value with at most <paramref name="significant"/> significant digits and no trailing zeros, for comparing
    /// stored figures (3.6500000000000004 shows as 3.65).
    /// </summary>
    public static string Compact(double value, int significant = 6)
    {
        if (!double.IsFinite(value))
        {
            return Missing;
        }

        if (value == 0)
        {
            return "0";
        }

        var decimals = Math.Clamp(significant - 1 - (int)Math.Floor(Math.Log10(Math.Abs(value))), 0, 12);
        var text = Fixed(value, decimals);
        return text.Contains('.', StringComparison.Ordinal) ? text.TrimEnd('0').TrimEnd('.') : text;
    }

    /// <summary>The shortest text that parses back to the same value, for form fields.</summary>
    public static string ForInput(double? value) =>
        value is { } v && double.IsFinite(v) ? v.ToString("R", CultureInfo.InvariantCulture) : string.Empty;

    public static string ForInput(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? string.Empty;
}
