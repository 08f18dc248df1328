using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Findings;
using PackDesigner.Reports;
using PackDesigner.Reports.Formatting;
using PackDesigner.Reports.Model;
using PackDesigner.Reports.Pdf;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>The design sheet rendered to PDF and read back with PdfPig.</summary>
public sealed class DesignSheetRendererTests
{
    private static readonly SheetTestDesign Design = new();

    // One render of the standard test design, shared by the tests that only read it.
    private static readonly Lazy<(EvaluationResult Result, DesignSheetModel Model, byte[] Pdf, PdfText Text)> Standard = new(() =>
    {
        var result = Design.Evaluate();
        var model = DesignSheetModel.Create(Design.Header, Design.Input, result);
        var pdf = DesignSheetRenderer.RenderPdf(model, PaperSize.A4);
        return (result, model, pdf, PdfText.Read(pdf));
    });

    [Fact]
    public void RenderPdf_BmsSettings_EveryThresholdPrintedPerCellAndPerPack()
    {
        var (r, _, _, text) = Standard.Value;
        var c = r.CellThresholds;
        var p = r.PackThresholds;
        (string Label, SheetValue Cell, SheetValue Pack)[] expected =
        [
            ("Over-voltage trip", F.CellVoltage(c.OverVoltageTrip), F.PackVoltage(p.OverVoltageTrip)),
            ("Over-voltage release", F.CellVoltage(c.OverVoltageRelease), F.PackVoltage(p.OverVoltageRelease)),
            ("Over-voltage delay", F.Seconds(c.OverVoltageDelayS), F.Seconds(p.OverVoltageDelayS)),
            ("Under-voltage trip", F.CellVoltage(c.UnderVoltageTrip), F.PackVoltage(p.UnderVoltageTrip)),
            ("Under-voltage release", F.CellVoltage(c.UnderVoltageRelease), F.PackVoltage(p.UnderVoltageRelease)),
            ("Under-voltage delay", F.Seconds(c.UnderVoltageDelayS), F.Seconds(p.UnderVoltageDelayS)),
            ("Charge over-current trip", F.Current(c.ChargeOverCurrentA), F.Current(p.ChargeOverCurrentA)),
            ("Charge over-current delay", F.Seconds(c.ChargeOverCurrentDelayS), F.Seconds(p.ChargeOverCurrentDelayS)),
            ("Discharge over-current trip", F.Current(c.DischargeOverCurrentA), F.Current(p.DischargeOverCurrentA)),
            ("Discharge over-current delay", F.Seconds(c.DischargeOverCurrentDelayS), F.Seconds(p.DischargeOverCurrentDelayS)),
            ("Discharge peak current", F.Current(c.DischargePeakCurrentA), F.Current(p.DischargePeakCurrentA)),
            ("Discharge peak duration", F.Seconds(c.DischargePeakDurationS), F.Seconds(p.DischargePeakDurationS)),
            ("Short-circuit trip", F.Current(c.ShortCircuitA), F.Current(p.ShortCircuitA)),
            ("Short-circuit delay", F.Microseconds(c.ShortCircuitDelayMicroseconds), F.Microseconds(p.ShortCircuitDelayMicroseconds)),
            ("Charge low-temperature trip", F.Temperature(c.ChargeTemperatureLowTripC), F.Temperature(p.ChargeTemperatureLowTripC)),
            ("Charge low-temperature release", F.Temperature(c.ChargeTemperatureLowReleaseC), F.Temperature(p.ChargeTemperatureLowReleaseC)),
            ("Charge high-temperature trip", F.Temperature(c.ChargeTemperatureHighTripC), F.Temperature(p.ChargeTemperatureHighTripC)),
            ("Charge high-temperature release", F.Temperature(c.ChargeTemperatureHighReleaseC), F.Temperature(p.ChargeTemperatureHighReleaseC)),
            ("Discharge low-temperature trip", F.Temperature(c.DischargeTemperatureLowTripC), F.Temperature(p.DischargeTemperatureLowTripC)),
            ("Discharge low-temperature release", F.Temperature(c.DischargeTemperatureLowReleaseC), F.Temperature(p.DischargeTemperatureLowReleaseC)),
            ("Discharge high-temperature trip", F.Temperature(c.DischargeTemperatureHighTripC), F.Temperature(p.DischargeTemperatureHighTripC)),
            ("Discharge high-temperature release", F.Temperature(c.DischargeTemperatureHighReleaseC), F.Temperature(p.DischargeTemperatureHighReleaseC)),
        ];

        foreach (var (label, cell, pack) in expected)
        {
            Assert.Contains($"{label} {cell.Text} {pack.Text}", text.AllLines);
        }

        Assert.Contains($"Top balancing in the BMS {F.OnOff(r.Balancing.BmsTopBalancingEnabled).Text} {F.OnOff(r.Balancing.BmsTopBalancingEnabled).Text}", text.AllLines);
    }

    [Fact]
    public void RenderPdf_ChargerSettings_EverySetpointPrinted()
    {
        var (r, _, _, text) = Standard.Value;
        var ch = r.Charger;
        (string Label, SheetValue Value)[] expected =
        [
            ("Constant voltage (CV), pack", F.PackVoltage(ch.ConstantVoltage)),
            ("Constant voltage per cell", F.CellVoltage(ch.ConstantVoltagePerCell)),
            ("Constant current (CC)", F.Current(ch.ConstantCurrentA)),
            ("Termination current", F.Current(ch.TerminationCurrentA)),
            ("Float or maintenance stage", F.OnOff(false)),
            ("Charge allowed from", F.Temperature(ch.ChargeTemperatureMinC)),
            ("Charge allowed up to", F.Temperature(ch.ChargeTemperatureMaxC)),
        ];
        AssertRows(text, expected);
        Assert.False(ch.FloatCharge);
    }

    [Fact]
    public void RenderPdf_ProtectionHardware_EveryRatingPrinted()
    {
        var (r, _, _, text) = Standard.Value;
        var p = r.Protection;
        Assert.NotNull(p.FuseRatingA);
        Assert.NotNull(p.PrechargeResistanceOhm);
        (string Label, SheetValue Value)[] expected =
        [
            ("Design continuous current", F.Current(p.ContinuousCurrentA)),
            ("Fuse rating, at least", F.Current(p.FuseMinimumA)),
            ("Fuse rating, selected", F.Current(p.FuseRatingA!.Value)),
            ("Fuse DC voltage rating, at least", F.PackVoltage(p.FuseMinVoltageRating)),
            ("Fuse interrupting rating, at least", F.Current(p.FuseMinInterruptingRatingA)),
            ("Prospective short-circuit current", F.Current(p.ProspectiveShortCircuitA)),
            ("Short-circuit loop resistance", F.Milliohm(p.ShortCircuitLoopResistanceMilliohm)),
            ("Contactor continuous current, at least", F.Current(p.ContactorContinuousA)),
            ("Contactor DC voltage rating, at least", F.PackVoltage(p.ContactorMinVoltageRating)),
            ("Contactor breaking current, at least", F.Current(p.ContactorBreakingCurrentA)),
            ("Precharge resistance", F.Ohm(p.PrechargeResistanceOhm!.Value)),
            ("Time to 95 %", F.ComputedSeconds(p.PrechargeTimeS!.Value)),
            ("Time to 99 %", F.ComputedSeconds(p.PrechargeTimeTo99PercentS!.Value)),
            ("Close the main contactor at, at least", F.PackVoltage(p.PrechargeCloseVoltage!.Value)),
            ("Peak current", F.Current(p.PrechargePeakCurrentA!.Value)),
            ("Peak power", F.Watts(p.PrechargePeakPowerW!.Value)),
            ("Average power to 95 %", F.Watts(p.PrechargeAveragePowerW!.Value)),
            ("Energy per precharge", F.Joules(p.PrechargeEnergyJ!.Value)),
            ("Main cable resistance", F.Milliohm(p.CableResistanceMilliohm!.Value)),
            ("Cable current density", F.CurrentDensity(p.CableCurrentDensityAPerMm2!.Value)),
            ("Series links, total", F.Milliohm(p.LinkResistanceTotalMilliohm)),
        ];
        AssertRows(text, expected);
    }

    [Fact]
    public void RenderPdf_PrechargeOf400VInto1000uF_PrintsTextbookFigures()
    {
        // Textbook RC charging (REFERENCES.md, circuit theory): 400 V, 1000 µF, t95 = 3τ = 0.3 s → R = 100 Ω,
        // ½CV² = 80 J, peak current V/R = 4 A, peak power V²/R = 1.6 kW. The pack maximum is 100 × 4.0 V = 400 V
        // (test cell, not a real product).
        var design = Design.WithCell(c => c with { MaxChargeVoltage = 4.0 }).WithInput(i => i with
        {
            Series = 100,
            Controller = i.Controller with { MinVoltage = 280, MaxVoltage = 420, DcLinkCapacitanceMicrofarad = 1000, PrechargeTimeS = 0.3 },
            Charger = i.Charger with { MaxVoltage = 400 },
        });
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(design.Model(), PaperSize.A4));
        Assert.Contains(text.AllLines, l => l.StartsWith("Precharge resistance 100 Ω", StringComparison.Ordinal));
        Assert.Contains(text.AllLines, l => l.StartsWith("Energy per precharge 80.0 J", StringComparison.Ordinal));
        Assert.Contains(text.AllLines, l => l.StartsWith("Peak current 4.00 A", StringComparison.Ordinal));
        Assert.Contains(text.AllLines, l => l.StartsWith("Peak power 1600 W", StringComparison.Ordinal));
        Assert.Contains(text.AllLines, l => l.StartsWith("Time to 95 % 0.300 s", StringComparison.Ordinal));
    }

    [Fact]
    public void RenderPdf_ShortCircuitOf96S2P_PrintsOhmsLawCurrent()
    {
        // Ohm's law (REFERENCES.md): 96S2P, 3.7 V, 1.5 mΩ per cell → loop 96 × 1.5 / 2 = 72 mΩ, I_sc = 355.2 V / 72 mΩ
        // = 4933 A. No links or cable, and 25 °C ambient so the cell resistance is its 25 °C value.
        var design = Design.WithCell(c => c with { MaxChargeVoltage = 3.7, InternalResistanceMilliohm = 1.5 }).WithInput(i => i with
        {
            Series = 96,
            Parallel = 2,
            LinkResistanceMilliohm = 0,
            Cable = null,
            Ambient = new AmbientInput(25, 25),
            Controller = i.Controller with { MinVoltage = 260, MaxVoltage = 380 },
            Charger = i.Charger with { MaxVoltage = 350 },
        });
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(design.Model(), PaperSize.A4));
        Assert.Contains(text.AllLines, l => l.StartsWith("Prospective short-circuit current 4933 A", StringComparison.Ordinal));
        Assert.Contains(text.AllLines, l => l.StartsWith("Short-circuit loop resistance 72.0 mΩ", StringComparison.Ordinal));
        Assert.Contains("No main cable entered.", text.AllLines);
    }

    [Fact]
    public void RenderPdf_StandardDesign_NoNonFiniteNumberPrinted()
    {
        var flat = Standard.Value.Text.Flat;
        Assert.DoesNotContain("NaN", flat, StringComparison.Ordinal);
        Assert.DoesNotContain("Infinity", flat, StringComparison.Ordinal);
        Assert.DoesNotContain("∞", flat, StringComparison.Ordinal);
        Assert.DoesNotContain(SheetFormatter.NotAvailable + " ", flat, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderPdf_StandardDesign_PageCountPlausible()
    {
        var (_, _, _, text) = Standard.Value;
        Assert.InRange(text.PageCount, 5, 12);
    }

    [Fact]
    public void RenderPdf_EveryPage_HeaderWithRevisionDateVersionHashAndPageNumber()
    {
        var (_, model, _, text) = Standard.Value;
        Assert.Equal("9c1e5a7f3b2d", model.ShortInputHash);
        for (var i = 0; i < text.PageCount; i++)
        {
            var lines = text.PageLines[i];
            Assert.Contains("Test trailer, 24S2P Revision 4", lines);
            Assert.Contains("Customer: Test customer · Job: Test job 17 DRAFT: not signed off", lines);
            Assert.Contains($"2026-03-14 15:09 UTC · Calculation {DesignEvaluator.CalculationVersion} · Input 9c1e5a7f3b2d Page {i + 1} of {text.PageCount}", lines);
        }
    }

    [Fact]
    public void RenderPdf_Draft_MarkedOnEveryPage()
    {
        var (_, _, _, text) = Standard.Value;
        Assert.All(text.PageLines, page => Assert.Contains(page, l => l.Contains(DesignSheetModel.DraftMarkingText, StringComparison.Ordinal)));
    }

    [Fact]
    public void RenderPdf_Approved_NoDraftMarkingAndNamesInSignOff()
    {
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(Design.Approved().Model(), PaperSize.A4));
        Assert.DoesNotContain("DRAFT", text.Flat, StringComparison.Ordinal);
        Assert.All(text.PageLines, page => Assert.Contains(page, l => l.Contains("Approved by Test approver on 2026-03-16", StringComparison.Ordinal)));
        Assert.Contains("Test checker", text.Flat, StringComparison.Ordinal);
        Assert.Contains("2026-03-15", text.Flat, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderPdf_PartlySigned_StillDraft()
    {
        var design = Design.WithHeader(h => h with { SignOff = new SheetSignOff(new SignOffEntry("Test designer", SheetTestDesign.RevisionTime), null, null) });
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(design.Model(), PaperSize.A4));
        Assert.All(text.PageLines, page => Assert.Contains(page, l => l.Contains(DesignSheetModel.DraftMarkingText, StringComparison.Ordinal)));
        Assert.Contains("Test designer", text.Flat, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderPdf_Fonts_EveryFontEmbedded()
    {
        var (_, _, _, text) = Standard.Value;
        Assert.NotEmpty(text.Fonts);
        Assert.All(text.Fonts, f => Assert.True(f.Embedded, f.Name + " is not embedded"));
        Assert.Contains(text.Fonts, f => f.Name.EndsWith("DejaVu Sans", StringComparison.Ordinal) || f.Name.EndsWith("DejaVuSans", StringComparison.Ordinal));
    }

    [Fact]
    public void RenderPdf_Charts_BothPresentAsImages()
    {
        var (_, _, _, text) = Standard.Value;
        Assert.Equal(2, text.ImagesPerPage.Sum());
        Assert.Contains("Pack open-circuit voltage against state of charge", text.AllLines);
        Assert.Contains("Protection ladder, to scale per cell", text.AllLines);
    }

    [Fact]
    public void RenderPdf_Cautions_EveryCautionPresent()
    {
        var (_, model, _, text) = Standard.Value;
        var flat = text.Flat;
        foreach (var caution in model.Cautions)
        {
            Assert.Contains(caution.Title, text.AllLines);
            Assert.Contains(caution.Text, flat, StringComparison.Ordinal);
        }

        // The subjects the sheet must always warn about, checked independently of the model's list.
        string[] required =
        [
            "Above 60 V DC a battery is voltage class B under ISO 6469-3",
            "prospective short-circuit current",
            "insulated tools",
            "as close to the cells as practical",
            "Charging must be inhibited below",
            "no float charge",
            "A swollen cell is a damaged cell",
            "over-discharged to near 0 V must not be recharged",
            "design estimate",
            "the authority having jurisdiction and licensed practice govern over this sheet",
        ];
        Assert.All(required, phrase => Assert.Contains(phrase, flat, StringComparison.OrdinalIgnoreCase));
    }

    [Fact]
    public void RenderPdf_Findings_EveryFindingMessagePrinted()
    {
        var (r, _, _, text) = Standard.Value;
        Assert.NotEmpty(r.Findings);
        var messages = text.ColumnText("Message", "Code");
        foreach (var finding in r.Findings)
        {
            Assert.Contains(finding.Message, messages, StringComparison.Ordinal);
        }

        Assert.Contains(r.Findings, f => f.Severity == Severity.Error);
        Assert.Contains(F.FindingCounts(
            r.Findings.Count(f => f.Severity == Severity.Error),
            r.Findings.Count(f => f.Severity == Severity.Warning),
            r.Findings.Count(f => f.Severity == Severity.Info)), text.AllLines);
    }

    [Fact]
    public void RenderPdf_BottomBalanced_BalancingStepsWithTargetAndSpread()
    {
        var (r, _, _, text) = Standard.Value;
        Assert.Equal(BalancingMethod.Bottom, r.Balancing.Method);
        var flat = text.Flat;
        Assert.Contains("Bottom balancing", text.AllLines);
        Assert.Contains($"Discharge each group on its own towards {F.CellVoltage(r.Balancing.TargetCellVoltage).Text}", flat, StringComparison.Ordinal);
        Assert.Contains($"finish at no more than {F.Current(r.Charger.TerminationCurrentA).Text} per group", flat, StringComparison.Ordinal);
        Assert.Contains("differ by no more than 10 mV", flat, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderPdf_SameInput_ByteIdentical()
    {
        var (_, model, pdf, _) = Standard.Value;
        var again = DesignSheetRenderer.RenderPdf(DesignSheetModel.Create(Design.Header, Design.Input, Design.Evaluate()), PaperSize.A4);
        Assert.Equal(pdf, again);
        Assert.Equal(pdf, DesignSheetRenderer.RenderPdf(model, PaperSize.A4));
    }

    [Fact]
    public void RenderPdf_InParallel_SameBytes()
    {
        var model = Standard.Value.Model;
        var results = new byte[4][];
        Parallel.For(0, results.Length, i => results[i] = DesignSheetRenderer.RenderPdf(model, PaperSize.A4));
        Assert.All(results, r => Assert.Equal(Standard.Value.Pdf, r));
    }

    [Fact]
    public void RenderPdf_Dates_AreTheRevisionTime()
    {
        var (_, _, _, text) = Standard.Value;
        var expected = new DateTimeOffset(SheetTestDesign.RevisionTime);
        Assert.Equal(expected, text.Created);
        Assert.Equal(expected, text.Modified);
    }

    [Fact]
    public void RenderPdf_OtherRevision_OtherBytes()
    {
        var other = DesignSheetRenderer.RenderPdf(Design.WithHeader(h => h with { RevisionNumber = 5 }).Model(), PaperSize.A4);
        Assert.NotEqual(Standard.Value.Pdf, other);
    }

    [Theory]
    [InlineData(PaperSize.A4, 595.276, 841.89)]
    [InlineData(PaperSize.Letter, 612, 792)]
    public void RenderPdf_Paper_EveryPageHasItsSize(PaperSize paper, double width, double height)
    {
        // ISO 216 A4 = 210 × 297 mm; US Letter = 8.5 × 11 in; 72 points per inch.
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(Standard.Value.Model, paper));
        Assert.All(text.PageSizes, s =>
        {
            Assert.Equal(width, s.Width, 0.01);
            Assert.Equal(height, s.Height, 0.01);
        });
    }

    [Fact]
    public void RenderPdf_LongUnicodeName_PrintedInFullInTheSummary()
    {
        const string name = "Überführung für Café Rüdiger: 48 V Ω-Prüfstand ≤ 45 °C, éléments réglés, Δ-Messung "
            + "mit einem sehr langen Namen, der in der Kopfzeile gekürzt und in der Zusammenfassung umbrochen wird";
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(Design.WithName(name).Model(), PaperSize.A4));
        Assert.Contains(name, text.Flat, StringComparison.Ordinal);
        // The page header keeps it to one line, ending in an ellipsis.
        Assert.All(text.PageLines, page => Assert.Contains(page, l => l.StartsWith("Überführung für Café", StringComparison.Ordinal) && l.Contains('…') && l.EndsWith("Revision 4", StringComparison.Ordinal)));
        Assert.Contains("0.45 mΩ", text.Flat, StringComparison.Ordinal);
        Assert.Contains("°C", text.Flat, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderPdf_WordLongerThanALine_BrokenNotClipped()
    {
        var name = string.Concat(Enumerable.Repeat("Überlandbus-Batterie", 12));
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(Design.WithName(name).Model(), PaperSize.A4));
        var joined = string.Concat(text.AllLines.SkipWhile(l => !l.StartsWith("Design Überlandbus", StringComparison.Ordinal)).Take(4)).Replace(" ", "", StringComparison.Ordinal);
        Assert.Contains(name, joined, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderPdf_400S20P_RendersWithItsFigures()
    {
        var large = Design.Large();
        var result = large.Evaluate();
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(DesignSheetModel.Create(large.Header, large.Input, result), PaperSize.Letter));
        Assert.InRange(text.PageCount, 5, 14);
        Assert.Contains("400S20P (8000 cells)", text.Flat, StringComparison.Ordinal);
        Assert.Contains($"Over-voltage trip {F.CellVoltage(result.CellThresholds.OverVoltageTrip).Text} {F.PackVoltage(result.PackThresholds.OverVoltageTrip).Text}", text.AllLines);
        Assert.Contains(F.Current(result.Protection.ProspectiveShortCircuitA).Text, text.Flat, StringComparison.Ordinal);
        Assert.Equal(2, text.ImagesPerPage.Sum());
    }

    [Fact]
    public void RenderPdf_TableLongerThanAPage_RepeatsTitleAndHeadingsOnTheNextPage()
    {
        var rows = Enumerable.Range(1, 120).Select(i => SheetTableRow.Of($"Row {i}", $"{i} V")).ToList();
        var section = new TableSection(new SheetTable("Long table", [new("Item", 1), new("Reading", 1, ColumnAlign.Right)], rows));
        var text = PdfText.Read(DesignSheetRenderer.RenderPdf(Standard.Value.Model, PaperSize.A4, [section]));
        Assert.True(text.PageCount >= 2);
        for (var page = 1; page < text.PageCount; page++)
        {
            Assert.Contains("Long table (continued)", text.PageLines[page]);
            Assert.Contains("Item Reading", text.PageLines[page]);
        }

        // Every row exactly once: none lost or split at a break.
        for (var i = 1; i <= 120; i++)
        {
            Assert.Single(text.AllLines, l => l == $"Row {i} {i} V");
        }
    }

    [Fact]
    public void RenderPdf_CustomSections_RenderedInOrderWithNumbers()
    {
        ISheetSection[] sections =
        [
            new TableSection(new SheetTable(null, [new("A", 1)], [SheetTableRow.Of("first")]), "First extra"),
            new TableSection(new SheetTable(null, [new("B", 1)], [SheetTableRow.Of("second")]), "Second extra"),
        ];
        var lines = PdfText.Read(DesignSheetRenderer.RenderPdf(Standard.Value.Model, PaperSize.A4, sections)).AllLines.ToList();
        Assert.True(lines.IndexOf("1 First extra") < lines.IndexOf("2 Second extra"));
        Assert.Contains("first", lines);
    }

    private static void AssertRows(PdfText text, IEnumerable<(string Label, SheetValue Value)> expected)
    {
        foreach (var (label, value) in expected)
        {
            var row = $"{label} {value.Text}";
            Assert.Contains(text.AllLines, l => l == row || l.StartsWith(row + " ", StringComparison.Ordinal));
        }
    }

    private sealed class TableSection(SheetTable table, string title = "Extra") : ISheetSection
    {
        public string Title => title;

        public void Render(DesignSheetModel model, SheetLayout layout) => layout.Table(table);
    }
}
