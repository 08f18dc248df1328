using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary>Each design check, triggered through the API by one change to the clean default design.</summary>
public sealed class EvaluateFindingTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    /// <summary>The change that triggers each finding code (Core's FindingRules and LadderBuilder).</summary>
    private static readonly Dictionary<string, Func<DesignRequestBuilder, DesignRequestBuilder>> Triggers = new()
    {
        // The computed CV of about 53.6 V is above a 53 V controller.
        ["pack.cv-above-controller-max"] = d => d.WithController(c => c with { MaxVoltage = 53 }),
        // S × OV trip = 16 × 3.6 = 57.6 V is above a 53 V controller.
        ["pack.max-above-controller-max"] = d => d.WithController(c => c with { MaxVoltage = 53 }),
        // 16 cells at 10 % sag under 150 A to about 48 V, below a 50 V cut-off.
        ["pack.loaded-low-below-controller-min"] = d => d.WithController(c => c with { MinVoltage = 50 }),
        ["charger.cannot-reach-cv"] = d => d.WithCharger(c => c with { MaxVoltage = 52 }),
        ["charger.float-stage"] = d => d.WithCharger(c => c with { FloatStage = true }),
        // Graphite anodes take no charge below 0 °C (REFERENCES.md, common practice).
        ["ambient.below-charge-min"] = d => d.WithAmbient(-10, 35),
        ["current.peak-exceeds-cells"] = d => d.WithController(c => c with { PeakCurrentA = 250 }),
        ["current.continuous-exceeds-cells"] = d => d.WithController(c => c with { ContinuousCurrentA = 120 }),
        // Always reported: the interrupting rating must cover the prospective fault current (NEC 110.9).
        ["fuse.interrupting-rating"] = d => d,
        // 20 × 3.65 V = 73 V DC > 60 V DC: class B (ISO 6469-3); controller and charger follow the voltage.
        ["voltage.class-b"] = d => d.WithSeries(20).WithController(c => c with { MinVoltage = 58, MaxVoltage = 80 }).WithCharger(c => c with { MaxVoltage = 73 }),
        // A 44 V cut-off is 2.75 V per cell, below the UV release of 2.85 V.
        ["ladder.out-of-order"] = d => d.WithController(c => c with { MinVoltage = 44 }),
        // Charging to 3.55 V per cell drives the smallest, bottom-balanced group above the 3.50 V OV release.
        ["charge.weakest-above-ov-release"] = d => d.WithCharger(c => c with { TargetCellVoltage = 3.55 }),
    };

    public static TheoryData<string> Codes => new(Triggers.Keys);

    [Theory]
    [MemberData(nameof(Codes))]
    public async Task Evaluate_DesignWithTheProblem_ReportsItsFinding(string code)
    {
        var answer = await _client.EvaluateAsync(Triggers[code](DesignRequestBuilder.Valid()));

        Assert.Equal(200, answer.Status);
        var finding = answer.Body.GetProperty("findings").EnumerateArray().Single(f => f.GetProperty("code").GetString() == code);
        Assert.Contains(finding.GetProperty("severity").GetString(), new[] { "error", "warning", "info" });
        Assert.NotEmpty(finding.GetProperty("fields").EnumerateArray());
    }

    [Fact]
    public async Task Evaluate_DefaultDesign_RaisesNoneOfTheTriggeredFindings()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid());

        Assert.Equal(200, answer.Status);
        // Without this, a finding test above could pass on the default design alone.
        var unexpected = answer.FindingCodes.Intersect(Triggers.Keys.Where(k => k != "fuse.interrupting-rating")).ToList();
        Assert.Empty(unexpected);
        Assert.DoesNotContain(answer.Body.GetProperty("findings").EnumerateArray(), f => f.GetProperty("severity").GetString() == "error");
    }

    [Theory]
    // ISO 6469-3 voltage classes: class A up to 60 V DC, class B above (REFERENCES.md, from memory).
    // LFP datasheet maximum 3.65 V per cell (common practice): 16S → 58.4 V, 17S → 62.05 V.
    [InlineData(16, "a", false)]
    [InlineData(17, "b", true)]
    public async Task Evaluate_SeriesCount_SetsTheVoltageClass(int series, string voltageClass, bool classBFinding)
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithSeries(series)
            .WithController(c => c with { MinVoltage = 49, MaxVoltage = 70 }).WithCharger(c => c with { MaxVoltage = 70 }));

        Assert.Equal(200, answer.Status);
        Assert.Equal(voltageClass, answer.Body.GetProperty("pack").GetProperty("voltageClass").GetString());
        Assert.Equal(classBFinding, answer.FindingCodes.Contains("voltage.class-b"));
    }
}
