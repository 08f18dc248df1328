using System.Globalization;
using System.Text.Json;
using System.Text.Json.Serialization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

/// <summary>
/// Designs for the spread and finder tests: a generic LFP cell on the preset's typical figures (common practice,
/// not a product) with equipment scaled to the string so that the design has no ladder or window errors.
/// </summary>
internal static class SpreadDesigns
{
    public static DesignInput Lfp(
        int series,
        int parallel,
        BalancingMethod balancing = BalancingMethod.Bottom,
        double tolerancePercent = 3,
        double? targetCellVoltage = null,
        double stepV = 0.001,
        double linkResistanceMilliohm = 0,
        double capacityAh = 100) => new()
        {
            Cell = new CellInput { Chemistry = Chemistry.Lfp, CapacityAh = capacityAh, CapacityTolerancePercent = tolerancePercent },
            Series = series,
            Parallel = parallel,
            LinkResistanceMilliohm = linkResistanceMilliohm,
            Balancing = balancing,
            SocWindow = new SocWindowInput(10, 90),
            Controller = new ControllerInput(series * 2.9, series * 4.0, 100, 200, 10, 50, 0, 1),
            Charger = new ChargerInput(series * 3.65, 50, stepV, false, targetCellVoltage),
            Ambient = new AmbientInput(25, 25),
        };

    public static SpreadRequest Request(DesignInput design, SpreadSettings spread) => new() { Design = design, Spread = spread };

    public static SpreadResult Run(DesignInput design, SpreadSettings spread, SpreadRunOptions? options = null)
    {
        var outcome = SpreadMonteCarlo.Analyze(Request(design, spread), options ?? new SpreadRunOptions());
        Assert.True(outcome.IsValid, string.Join("; ", outcome.Errors.Select(e => $"{e.Field}: {e.Message}")));
        return outcome.Result!;
    }

    private static readonly JsonSerializerOptions Json = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        Converters = { new JsonStringEnumConverter(JsonNamingPolicy.CamelCase) },
    };

    /// <summary>The result as the API would serialise it, to compare whole results.</summary>
    public static string ToJson(object value) => JsonSerializer.Serialize(value, value.GetType(), Json);
}

/// <summary>Assertions with an explicit relative tolerance, stated at each call.</summary>
internal static class Near
{
    public static void Relative(double expected, double actual, double relativeTolerance, string what)
    {
        var scale = Math.Max(Math.Abs(expected), 1e-300);
        Assert.True(Math.Abs(actual - expected) <= relativeTolerance * scale, string.Create(CultureInfo.InvariantCulture,
            $"{what}: expected {expected:R}, got {actual:R} (relative tolerance {relativeTolerance:G3})."));
    }

    public static void Absolute(double expected, double actual, double tolerance, string what)
    {
        Assert.True(Math.Abs(actual - expected) <= tolerance, string.Create(CultureInfo.InvariantCulture,
            $"{what}: expected {expected:R} ± {tolerance:G4}, got {actual:R} (off by {Math.Abs(actual - expected):G4})."));
    }
}
