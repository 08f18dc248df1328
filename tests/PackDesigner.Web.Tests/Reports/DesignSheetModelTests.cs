using PackDesigner.Core.Design;
using PackDesigner.Reports.Model;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>Building the sheet's model: header checks, the source of each cell figure, sign-off state, build notes.</summary>
public sealed class DesignSheetModelTests
{
    private static readonly SheetTestDesign Design = new();

    [Fact]
    public void Create_BlankName_ThrowsNamingTheField()
    {
        var e = Assert.Throws<ArgumentException>(() => Design.WithName("  ").Model());
        Assert.Contains("design name", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("9c1e5a7f3b2")]
    [InlineData("9c1e5a7f3b2z")]
    public void Create_HashShortOrNotHex_Throws(string hash)
    {
        var e = Assert.Throws<ArgumentException>(() => Design.WithHeader(h => h with { InputHash = hash }).Model());
        Assert.Contains("input hash", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_RevisionZero_Throws() =>
        Assert.Throws<ArgumentException>(() => Design.WithHeader(h => h with { RevisionNumber = 0 }).Model());

    [Fact]
    public void Create_LocalTime_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => Design.WithHeader(h => h with { CreatedAtUtc = new DateTime(2026, 1, 1, 0, 0, 0, DateTimeKind.Local) }).Model());
        Assert.Contains("UTC", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_OtherCalculationVersion_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => Design.WithHeader(h => h with { CalculationVersion = "0.9.0" }).Model());
        Assert.Contains("0.9.0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_InputOfAnotherConfiguration_Throws()
    {
        var result = Design.Evaluate();
        Assert.Throws<ArgumentException>(() => DesignSheetModel.Create(Design.Header, Design.Input with { Series = 25 }, result));
    }

    [Fact]
    public void Create_OmittedCellFigures_MarkedAsPresetTypical()
    {
        var model = Design.WithCell(c => c with { MassKg = null, InternalResistanceMilliohm = null, TerminationCurrentA = null }).Model();
        var cell = model.Inputs.Single(g => g.Key == "cell").Rows.ToDictionary(r => r.Key);
        Assert.Equal("Preset (typical)", cell["massKg"].Source);
        Assert.Equal("Preset (typical)", cell["internalResistanceMilliohm"].Source);
        Assert.Equal("Datasheet", cell["capacityAh"].Source);
        Assert.Equal("Derived (C/20)", cell["terminationCurrentA"].Source);
        Assert.Equal("Preset (typical)", cell["ocvCurve"].Source);
        Assert.Equal("Estimated (Arrhenius)", cell["coldInternalResistanceMilliohm"].Source);
    }

    [Fact]
    public void Create_NoSignOff_DraftWithEmptySignatureLines()
    {
        var model = Design.Model();
        Assert.True(model.IsDraft);
        Assert.Equal(DesignSheetModel.DraftMarkingText, model.SignOffMarking);
        Assert.All(model.SignOff, line => Assert.False(line.Recorded));
        Assert.Equal(["Designed by", "Checked by", "Approved by"], model.SignOff.Select(l => l.Role));
    }

    [Fact]
    public void Create_Approved_NotDraftAndMarkingNamesTheApprover()
    {
        var model = Design.Approved().Model();
        Assert.False(model.IsDraft);
        Assert.Equal("Approved by Test approver on 2026-03-16", model.SignOffMarking);
        Assert.All(model.SignOff, line => Assert.True(line.Recorded));
    }

    [Fact]
    public void Create_BottomBalanced_StepsUseTheResultsTarget()
    {
        var result = Design.Evaluate();
        var model = DesignSheetModel.Create(Design.Header, Design.Input, result);
        Assert.Equal("Bottom balancing", model.BuildNotes.Title);
        var target = PackDesigner.Reports.Formatting.SheetFormatter.CellVoltage(result.Balancing.TargetCellVoltage).Text;
        Assert.Contains(model.BuildNotes.Steps, s => s.Contains(target, StringComparison.Ordinal));
        Assert.True(model.BuildNotes.Steps.Count >= 6);
    }

    [Fact]
    public void Create_TopBalanced_TopBalancingNotesAndBalanceStartSetting()
    {
        var model = Design.WithInput(i => i with { Balancing = BalancingMethod.Top }).Model();
        Assert.Equal("Top balancing", model.BuildNotes.Title);
        Assert.Contains(model.BmsSettings, s => s.Key == "balance-start" && s.PerPack is null);
        Assert.Equal("on", model.BmsSettings.Single(s => s.Key == "top-balancing").PerCell.Text);
    }

    [Fact]
    public void Create_NoDcLinkCapacitance_PrechargeGroupExplainsItself()
    {
        var model = Design.WithInput(i => i with { Controller = i.Controller with { DcLinkCapacitanceMicrofarad = 0 } }).Model();
        var precharge = model.Protection.Single(g => g.Key == "precharge");
        Assert.Empty(precharge.Rows);
        Assert.Contains("No DC-link capacitance", precharge.Note, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_NoCustomerOrJob_SaysSo()
    {
        var model = Design.WithHeader(h => h with { CustomerName = null, JobTitle = " " }).Model();
        Assert.Equal("No customer or job recorded", model.CustomerLine);
    }

    [Fact]
    public void Create_OcvChart_CurveScaledToThePackAndLinesLabelledWithValues()
    {
        var result = Design.Evaluate();
        var model = DesignSheetModel.Create(Design.Header, Design.Input, result);
        var chart = model.OcvChart;
        var cellCurve = result.Cell.OcvCurve.Points;
        Assert.Equal(cellCurve.Count, chart.Curve.Count);
        Assert.Equal(cellCurve[^1].Voltage * 24, chart.Curve[^1].Y, 9);
        Assert.Equal(["controller-max", "ov-trip", "cv", "controller-min", "uv-trip"], chart.Lines.Select(l => l.Key));
        Assert.Contains(chart.Lines, l => l.Key == "ov-trip" && l.Label.EndsWith(PackDesigner.Reports.Formatting.SheetFormatter.PackVoltage(result.PackThresholds.OverVoltageTrip).Text, StringComparison.Ordinal));
        Assert.Equal(result.Ladder.Count, model.LadderChart.Rungs.Count);
    }
}
