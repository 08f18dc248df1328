using PackDesigner.Core.Design;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Findings;

public sealed class FindingRulesTests
{
    /// <summary>Every input field key a finding may point at.</summary>
    private static readonly HashSet<string> KnownFields =
        [.. InvalidFields.All.Select(f => f.Key), "balancing", "charger.floatStage"];

    /// <summary>Each finding code, its severity, and a change to the default design that triggers it.</summary>
    public static TheoryData<string, Severity, string> Triggers => new()
    {
        { "pack.cv-above-controller-max", Severity.Error, "controller max 53 V" },
        { "pack.max-above-controller-max", Severity.Warning, "controller max 57 V" },
        { "pack.regen-above-controller-max", Severity.Warning, "controller max 55 V, regen 100 A" },
        { "pack.regen-above-ov-trip", Severity.Warning, "regen 250 A" },
        { "pack.loaded-low-below-controller-min", Severity.Error, "controller min 50 V" },
        { "charger.cannot-reach-cv", Severity.Warning, "charger max 50 V" },
        { "charger.can-exceed-ov-release", Severity.Info, "default" },
        { "charger.float-stage", Severity.Error, "float stage" },
        { "charger.current-limited", Severity.Info, "charger 60 A" },
        { "charge.weakest-above-ov-release", Severity.Error, "target 3.6 V, tolerance 10 %" },
        { "balance.weakest-empty-in-window", Severity.Warning, "top-balanced, window 2–90 %" },
        { "ambient.below-charge-min", Severity.Warning, "ambient min −5 °C" },
        { "ambient.above-charge-max", Severity.Warning, "ambient max 50 °C" },
        { "ambient.below-discharge-min", Severity.Warning, "ambient min −25 °C" },
        { "ambient.above-discharge-max", Severity.Error, "ambient max 65 °C" },
        { "current.continuous-exceeds-cells", Severity.Error, "continuous 150 A" },
        { "current.peak-exceeds-cells", Severity.Error, "peak 250 A" },
        { "current.peak-too-long", Severity.Warning, "peak 150 A for 20 s" },
        { "current.regen-exceeds-cells", Severity.Warning, "regen 60 A" },
        { "fuse.no-standard-rating", Severity.Error, "50P, continuous 5000 A" },
        { "fuse.interrupting-rating", Severity.Warning, "default" },
        { "protection.short-circuit-trip-unreachable", Severity.Warning, "1 mΩ links, trip factor 20" },
        { "precharge.no-capacitance", Severity.Info, "no DC-link capacitance" },
        { "cable.current-density", Severity.Warning, "5 mm² cable" },
        { "voltage.class-b", Severity.Warning, "17S" },
        { "thermal.peak-over-limit", Severity.Warning, "20 mΩ, 0.1 kg cell, peak 200 A" },
        { "thermal.continuous-needs-cooling", Severity.Warning, "0.1 kg cell" },
        { "cell.cold-resistance-estimated", Severity.Info, "default" },
        { "charger.cv-rounded", Severity.Info, "default" },
        { "ladder.out-of-order", Severity.Error, "controller min 49.5 V" },
    };

    private static DesignBuilder Design(string change)
    {
        var d = DesignBuilder.Default();
        return change switch
        {
            "default" => d,
            "controller max 53 V" => d.WithController(c => c with { MaxVoltage = 53 }),
            "controller max 57 V" => d.WithController(c => c with { MaxVoltage = 57 }),
            "controller max 55 V, regen 100 A" => d.WithController(c => c with { MaxVoltage = 55, RegenCurrentA = 100 }),
            "regen 250 A" => d.WithCell(c => c with { MaxChargeCurrentA = 250 }).WithController(c => c with { RegenCurrentA = 250, MaxVoltage = 70 }),
            "controller min 50 V" => d.WithController(c => c with { MinVoltage = 50 }),
            "charger max 50 V" => d.WithCharger(c => c with { MaxVoltage = 50 }),
            "float stage" => d.WithCharger(c => c with { FloatStage = true }),
            "charger 60 A" => d.WithCharger(c => c with { MaxCurrentA = 60 }),
            "target 3.6 V, tolerance 10 %" => d.WithTolerance(10).WithCharger(c => c with { TargetCellVoltage = 3.6 }),
            "top-balanced, window 2–90 %" => d.WithBalancing(BalancingMethod.Top).WithWindow(2, 90),
            "ambient min −5 °C" => d.WithAmbient(-5, 35),
            "ambient max 50 °C" => d.WithAmbient(5, 50),
            "ambient min −25 °C" => d.WithAmbient(-25, 35),
            "ambient max 65 °C" => d.WithAmbient(5, 65),
            "continuous 150 A" => d.WithController(c => c with { ContinuousCurrentA = 150, PeakCurrentA = 150 }),
            "peak 250 A" => d.WithController(c => c with { PeakCurrentA = 250 }),
            "peak 150 A for 20 s" => d.WithController(c => c with { PeakCurrentA = 150, PeakDurationS = 20 }),
            "regen 60 A" => d.WithController(c => c with { RegenCurrentA = 60 }),
            "50P, continuous 5000 A" => d.WithParallel(50).WithController(c => c with { ContinuousCurrentA = 5000, PeakCurrentA = 5000 }),
            "1 mΩ links, trip factor 20" => d.WithLinks(1).WithMargins(m => m with { ShortCircuitTripFactor = 20 }),
            "no DC-link capacitance" => d.WithController(c => c with { DcLinkCapacitanceMicrofarad = 0 }),
            "5 mm² cable" => d.WithCable(5, 2),
            "17S" => d.WithSeries(17).WithController(c => c with { MinVoltage = 49.3, MaxVoltage = 64 }).WithCharger(c => c with { MaxVoltage = 62 }),
            "20 mΩ, 0.1 kg cell, peak 200 A" => d.WithCell(c => c with { InternalResistanceMilliohm = 20, MassKg = 0.1 }).WithController(c => c with { PeakCurrentA = 200, MinVoltage = 30 }),
            "0.1 kg cell" => d.WithCell(c => c with { MassKg = 0.1 }),
            "controller min 49.5 V" => d.WithController(c => c with { MinVoltage = 49.5 }),
            _ => throw new ArgumentOutOfRangeException(nameof(change), change, null),
        };
    }

    [Theory]
    [MemberData(nameof(Triggers))]
    public void Check_TriggeringDesign_ReportsCodeWithSeverityAndKnownFields(string code, Severity severity, string change)
    {
        var findings = Design(change).Evaluate().Findings;

        var finding = findings.FirstOrDefault(f => f.Code == code);
        Assert.True(finding is not null, $"{change}: expected {code}, got {string.Join(", ", findings.Select(f => f.Code))}.");
        Assert.Equal(severity, finding.Severity);
        Assert.NotEmpty(finding.Fields);
        Assert.All(finding.Fields, field => Assert.Contains(field, KnownFields));
        Assert.DoesNotContain("NaN", finding.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("∞", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_DefaultDesign_ReportsOnlyTheStandingNotes()
    {
        // The default design is clean: the fuse interrupting-rating note always appears; the others follow from
        // a charger that can be set above the OV release, a cold ambient without a datasheet cold resistance, and
        // the 0.1 V charger step.
        var codes = DesignBuilder.Default().Evaluate().Findings.Select(f => f.Code).Order(StringComparer.Ordinal);

        Assert.Equal(["cell.cold-resistance-estimated", "charger.can-exceed-ov-release", "charger.cv-rounded", "fuse.interrupting-rating"], codes);
    }

    [Fact]
    public void Check_EveryCodeHasATrigger()
    {
        // Guards the table above (and docs/calculations/findings.md) against a code added without a test.
        var source = File.ReadAllText(Path.Combine(RepositoryRoot(), "src", "PackDesigner.Core", "Findings", "FindingRules.cs"))
            + File.ReadAllText(Path.Combine(RepositoryRoot(), "src", "PackDesigner.Core", "Protection", "LadderBuilder.cs"));
        var codesInSource = System.Text.RegularExpressions.Regex.Matches(source, "\"([a-z]+\\.[a-z0-9-]+)\",")
            .Select(m => m.Groups[1].Value)
            .Where(c => c.Contains('-', StringComparison.Ordinal))
            .ToHashSet();

        Assert.Equal(codesInSource.Order(StringComparer.Ordinal), Triggers.Select(row => (string)row[0]).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Check_FloatStage_MessageSaysLithiumTakesNoFloat()
    {
        var finding = Design("float stage").Evaluate().Findings.Single(f => f.Code == "charger.float-stage");

        Assert.Contains("no float charge", finding.Message, StringComparison.Ordinal);
        Assert.Equal(["charger.floatStage"], finding.Fields);
    }

    [Fact]
    public void Check_ChargerCannotReachCv_MessageStatesWhereChargingEnds()
    {
        var result = Design("charger max 50 V").Evaluate();
        var finding = result.Findings.Single(f => f.Code == "charger.cannot-reach-cv");

        Assert.Contains("50.0 V", finding.Message, StringComparison.Ordinal);
        Assert.Equal(50.0, result.Charger.ConstantVoltage, 9);
        Assert.True(result.Charger.TypicalGroupEndOfChargeSocPercent < 90);
    }

    [Fact]
    public void Check_WindowTopJustOutOfReachAfterRounding_IsNotALadderError()
    {
        // 16S, 0.1 V step: the CV solved for the window top (53.58 V) is rounded down to 53.5 V, 4.9 mV per cell
        // below what the window top asks, within the 6.25 mV of one charger step per cell: a rounding note, no error.
        var result = DesignBuilder.Default().Evaluate();

        Assert.Contains(result.Findings, f => f.Code == "charger.cv-rounded");
        Assert.DoesNotContain(result.Findings, f => f.Code == "ladder.out-of-order");
    }

    private static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "PackDesigner.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("Repository root not found above " + AppContext.BaseDirectory);
    }
}
