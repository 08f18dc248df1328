using System.Globalization;
using PackDesigner.Reports.Formatting;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>
/// The sheet's number formatting. Rounding is half away from zero (the convention of hand-written engineering
/// tables; .NET's default would round half to even); units follow SI style with a space before them (SI Brochure,
/// 9th ed., §5.4.3).
/// </summary>
public sealed class SheetFormatterTests
{
    [Theory]
    [InlineData(3.6, "3.600 V")]
    [InlineData(2.8575, "2.858 V")]
    [InlineData(3.0004, "3.000 V")]
    public void CellVoltage_AnyValue_ThreeDecimalsAndUnit(double volts, string expected) =>
        Assert.Equal(expected, SheetFormatter.CellVoltage(volts).Text);

    [Theory]
    [InlineData(115.2, "115.20 V")]
    [InlineData(1460, "1460.00 V")]
    public void PackVoltage_AnyValue_TwoDecimalsNoGrouping(double volts, string expected) =>
        Assert.Equal(expected, SheetFormatter.PackVoltage(volts).Text);

    [Theory]
    [InlineData(4, "4.00 A")]
    [InlineData(45.25, "45.3 A")]
    [InlineData(999.94, "999.9 A")]
    [InlineData(4933.33, "4933 A")]
    [InlineData(-12.35, "-12.4 A")]
    public void Current_ByMagnitude_DecimalsShrinkAsCurrentGrows(double amps, string expected) =>
        Assert.Equal(expected, SheetFormatter.Current(amps).Text);

    [Fact]
    public void Fixed_TinyNegative_NoNegativeZero()
    {
        Assert.Equal("0.00", SheetFormatter.Fixed(-0.0001, 2));
        Assert.Equal("0.0 °C", SheetFormatter.Temperature(-0.04).Text);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void AnyFormat_NonFinite_PrintsNotAvailable(double value)
    {
        Assert.Equal("n/a V", SheetFormatter.CellVoltage(value).Text);
        Assert.Equal("n/a", SheetFormatter.Significant(value, 3, 2));
    }

    [Theory]
    [InlineData(0.55, "0.550 mΩ")]
    [InlineData(72, "72.0 mΩ")]
    [InlineData(9.996, "10.0 mΩ")]
    [InlineData(1234.5, "1235 mΩ")]
    public void Milliohm_ThreeSignificantDigits(double milliohm, string expected) =>
        Assert.Equal(expected, SheetFormatter.Milliohm(milliohm).Text);

    [Theory]
    [InlineData(650.4, "650 Wh")]
    [InlineData(14464, "14.46 kWh")]
    public void Energy_AboveOneKilowattHour_InKilowattHours(double wattHours, string expected) =>
        Assert.Equal(expected, SheetFormatter.Energy(wattHours).Text);

    [Fact]
    public void Entered_TrailingZeros_Dropped()
    {
        Assert.Equal("100 Ah", SheetFormatter.Entered(100, "Ah").Text);
        Assert.Equal("0.55 mΩ", SheetFormatter.Entered(0.55, "mΩ").Text);
        Assert.Equal("-20 °C", SheetFormatter.Entered(-20, "°C").Text);
    }

    [Fact]
    public void AnyFormat_CommaDecimalCulture_StillPrintsPoint()
    {
        var previous = CultureInfo.CurrentCulture;
        var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        comma.NumberFormat.NumberDecimalSeparator = ",";
        comma.NumberFormat.NumberGroupSeparator = ".";
        try
        {
            CultureInfo.CurrentCulture = comma;
            Assert.Equal("3.650 V", SheetFormatter.CellVoltage(3.65).Text);
            Assert.Equal("1234.5", SheetFormatter.Trimmed(1234.5, 3));
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
        }
    }

    [Fact]
    public void DateTimeUtc_UnspecifiedKind_ReadAsUtc()
    {
        Assert.Equal("2026-03-14 15:09 UTC", SheetFormatter.DateTimeUtc(new DateTime(2026, 3, 14, 15, 9, 59, DateTimeKind.Unspecified)));
    }

    [Fact]
    public void ShortHash_LongUpperCaseHash_FirstTwelveLowerCase() =>
        Assert.Equal("9c1e5a7f3b2d", SheetFormatter.ShortHash(" 9C1E5A7F3B2D4E6F8A0B "));

    [Fact]
    public void FindingCounts_SingularAndPlural() =>
        Assert.Equal("1 error, 2 warnings, 0 info", SheetFormatter.FindingCounts(1, 2, 0));
}
