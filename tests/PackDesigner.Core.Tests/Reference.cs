using System.Globalization;

namespace PackDesigner.Core.Tests;

/// <summary>An outside reference value and where it comes from.</summary>
public sealed record RefValue(double Value, string Source);

/// <summary>
/// The one assert for checks against outside values. Tolerance policy: every check states a relative
/// tolerance. Closed-form arithmetic is held to 1e-12; iterative solves to 1e-9; a value published to n
/// significant digits to half a unit in its last digit (plus the model's own stated error where there is one).
/// </summary>
public static class Reference
{
    /// <summary>Fails unless |actual − expected| ≤ relTol·|expected| (relTol is absolute when expected is 0).</summary>
    public static void AssertClose(double expected, double actual, double relTol, string source)
    {
        Assert.True(relTol >= 0, "A tolerance cannot be negative.");
        var allowed = expected == 0 ? relTol : relTol * Math.Abs(expected);
        var error = Math.Abs(actual - expected);
        if (!double.IsFinite(actual) || !(error <= allowed))
        {
            Assert.Fail(string.Create(CultureInfo.InvariantCulture,
                $"Expected {expected:R} ± {allowed:G3} (relative {relTol:G3}; source: {source}), got {actual:R} (off by {error:G3}, relative {(expected == 0 ? error : error / Math.Abs(expected)):G3})."));
        }
    }

    /// <summary>As <see cref="AssertClose(double, double, double, string)"/> for a stored reference value.</summary>
    public static void AssertClose(RefValue expected, double actual, double relTol) =>
        AssertClose(expected.Value, actual, relTol, expected.Source);

    /// <summary>Relative tolerance of a value published to <paramref name="significantDigits"/> digits: half a unit in the last one.</summary>
    public static double RoundingTolerance(double publishedValue, int significantDigits)
    {
        var exponent = Math.Floor(Math.Log10(Math.Abs(publishedValue)));
        var halfUnit = 0.5 * Math.Pow(10, exponent - significantDigits + 1);
        return halfUnit / Math.Abs(publishedValue);
    }
}
