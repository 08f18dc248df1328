using System.Text;
using Microsoft.EntityFrameworkCore;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Json;
using PackDesigner.Data.Results;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

public sealed class CellLibrarySqliteTests(SqliteTestDatabase database) : CellLibraryTests<SqliteTestDatabase>(database);

public sealed class CellLibraryPostgresTests(PostgresTestDatabase database) : CellLibraryTests<PostgresTestDatabase>(database), IPostgresTests;

public abstract class CellLibraryTests<TDatabase>(TDatabase database) : IClassFixture<TDatabase>
    where TDatabase : TestDatabase
{
    /// <summary>Every CellInput figure set to a distinct value (all within Core's ranges).</summary>
    private static readonly CellInput EveryFigure = new()
    {
        Chemistry = Chemistry.Nmc,
        CapacityAh = 4.8,
        NominalVoltage = 3.63,
        MaxChargeVoltage = 4.2,
        MinDischargeVoltage = 2.75,
        MaxChargeCurrentA = 4.7,
        MaxDischargeCurrentA = 9.6,
        PeakDischargeCurrentA = 14.4,
        PeakDischargeDurationS = 3,
        InternalResistanceMilliohm = 22,
        ColdInternalResistanceMilliohm = 61,
        ColdResistanceTemperatureC = -10,
        MassKg = 0.068,
        CapacityTolerancePercent = 2,
        ChargeTemperatureMinC = 1,
        ChargeTemperatureMaxC = 44,
        DischargeTemperatureMinC = -19,
        DischargeTemperatureMaxC = 59,
        TerminationCurrentA = 0.24,
        OcvCurve = [new OcvPoint(0, 2.8), new OcvPoint(20, 3.5), new OcvPoint(80, 3.95), new OcvPoint(100, 4.15)],
    };

    [ProviderFact]
    public async Task Create_EveryFigure_RoundTripsThroughTheDatabase()
    {
        await using var db = database.CreateContext();
        var created = await database.Cells(db).CreateAsync(new CellData("Round trip " + Guid.NewGuid(), EveryFigure, "Maker", "Model-7", "notes"));

        await using var read = database.CreateContext();
        var loaded = (await database.Cells(read).GetAsync(created.Value!.Id)).Value!;

        Assert.Equal(CanonicalDesignJson.SerializeCurve(EveryFigure.OcvCurve!), CanonicalDesignJson.SerializeCurve(loaded.Figures.OcvCurve!));
        Assert.Equal(EveryFigure with { OcvCurve = null }, loaded.Figures with { OcvCurve = null });
        Assert.Equal(("Maker", "Model-7", "notes"), (loaded.Maker, loaded.Model, loaded.Notes));
        Assert.Equal(1, loaded.Version);
        Assert.Equal(DateTimeKind.Utc, loaded.UpdatedUtc.Kind);
    }

    [ProviderFact]
    public async Task Create_InvalidFigures_ReturnsCoreFieldErrorsAndStoresNothing()
    {
        var name = "Invalid cell " + Guid.NewGuid();
        await using var db = database.CreateContext();

        var result = await database.Cells(db).CreateAsync(new CellData(name, EveryFigure with { NominalVoltage = 4.5, MassKg = -1 }));

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.Contains(result.Errors, e => e.Field == "cell.maxChargeVoltage");
        Assert.Contains(result.Errors, e => e.Field == "cell.massKg");
        Assert.False(await db.Cells.AnyAsync(c => c.Name == name));
    }

    [ProviderFact]
    public async Task Update_StaleVersion_ReturnsConflictAndKeepsTheOtherEdit()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Versioned " + Guid.NewGuid(), EveryFigure))).Value!;

        await using var other = database.CreateContext();
        var first = await database.Cells(other).UpdateAsync(cell.Id, cell.Version, new CellData(cell.Name, EveryFigure with { MassKg = 0.07 }));
        var second = await cells.UpdateAsync(cell.Id, cell.Version, new CellData(cell.Name, EveryFigure with { MassKg = 0.09 }));

        Assert.Equal(2, first.Value!.Version);
        Assert.Equal(StoreStatus.Conflict, second.Status);
        await using var read = database.CreateContext();
        Assert.Equal(0.07, (await database.Cells(read).GetAsync(cell.Id)).Value!.Figures.MassKg);
        var third = await cells.UpdateAsync(cell.Id, 2, new CellData(cell.Name, EveryFigure with { MassKg = 0.09 }));
        Assert.Equal(3, third.Value!.Version);
    }

    [ProviderFact]
    public async Task Clone_Cell_CopiesFiguresUnderANewName()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Clone me " + Guid.NewGuid(), EveryFigure, "M", "X"))).Value!;

        var clone = (await cells.CloneAsync(cell.Id)).Value!;

        Assert.NotEqual(cell.Id, clone.Id);
        Assert.Equal(cell.Name + " (copy)", clone.Name);
        Assert.Equal(CanonicalDesignJson.SerializeCurve(cell.Figures.OcvCurve!), CanonicalDesignJson.SerializeCurve(clone.Figures.OcvCurve!));
        Assert.Equal(cell.Figures with { OcvCurve = null }, clone.Figures with { OcvCurve = null });
        Assert.Equal(StoreStatus.NotFound, (await cells.CloneAsync(int.MaxValue)).Status);
    }

    [ProviderFact]
    public async Task List_Search_MatchesNameMakerOrModelAndPages()
    {
        var token = "cl" + Guid.NewGuid().ToString("N")[..8];
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        await cells.CreateAsync(new CellData($"B {token}", EveryFigure));
        await cells.CreateAsync(new CellData("A other", EveryFigure, Maker: $"Maker {token}"));
        await cells.CreateAsync(new CellData("C other", EveryFigure, Model: $"MODEL-{token.ToUpperInvariant()}"));

        var page = await cells.ListAsync(token, 1, 2);

        Assert.Equal(3, page.TotalCount);
        Assert.Equal(["A other", $"B {token}"], page.Items.Select(r => r.Name));
        Assert.True(page.Items[0].HasOwnOcvCurve);
        Assert.Equal(Chemistry.Nmc, page.Items[0].Chemistry);
    }

    [ProviderFact]
    public async Task ImportOcvCsv_ValidTable_ReplacesTheCurveAndRaisesTheVersion()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Import " + Guid.NewGuid(), EveryFigure))).Value!;
        var csv = "socPercent,voltage\n0,2.9\n50,3.7\n100,4.1\n";

        var result = await cells.ImportOcvCsvAsync(cell.Id, cell.Version, new MemoryStream(Encoding.UTF8.GetBytes(csv)));

        Assert.Equal(StoreStatus.Ok, result.Status);
        Assert.Equal([new OcvPoint(0, 2.9), new OcvPoint(50, 3.7), new OcvPoint(100, 4.1)], result.Value!.Figures.OcvCurve);
        Assert.Equal(cell.Version + 1, result.Value.Version);
        var export = (await cells.ExportOcvCsvAsync(cell.Id)).Value!;
        Assert.Equal("socPercent,voltage\r\n0,2.9\r\n50,3.7\r\n100,4.1\r\n", export);
    }

    [ProviderFact]
    public async Task ImportOcvCsv_RowsBreakingTheCellsLimits_NamesTheLinesAndStoresNothing()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Import bad " + Guid.NewGuid(), EveryFigure))).Value!;
        // Line 3 falls back below line 2; line 5 lies above the cell's 4.2 V maximum; the last row is not 100 %.
        var csv = "socPercent,voltage\n0,3.0\n\n20,2.9\n60,3.8\n90,4.3\n";

        var result = await cells.ImportOcvCsvAsync(cell.Id, cell.Version, new MemoryStream(Encoding.UTF8.GetBytes(csv)));

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.All(result.Errors, e => Assert.Equal(CellLibrary.OcvCsvField, e.Field));
        var messages = result.Errors.Select(e => e.Message).ToList();
        Assert.Contains("Line 4: voltage must increase strictly from the row before.", messages);
        Assert.Contains(messages, m => m.StartsWith("Line 6: 4.3 V lies outside the cell's range", StringComparison.Ordinal));
        Assert.Contains("Line 6: The last row must be at 100 % state of charge.", messages);
        await using var read = database.CreateContext();
        var unchanged = (await database.Cells(read).GetAsync(cell.Id)).Value!;
        Assert.Equal(cell.Version, unchanged.Version);
        Assert.Equal(EveryFigure.OcvCurve, unchanged.Figures.OcvCurve);
    }

    [ProviderFact]
    public async Task ImportOcvCsv_UnitMistake_IsRefusedBeforeTouchingTheCell()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Import mV " + Guid.NewGuid(), EveryFigure))).Value!;

        var result = await cells.ImportOcvCsvAsync(cell.Id, cell.Version, new MemoryStream("socPercent,voltage\n0,2800\n100,4150\n"u8.ToArray()));

        Assert.Contains("millivolts", Assert.Single(result.Errors).Message, StringComparison.Ordinal);
    }

    [ProviderFact]
    public async Task ExportOcvCsv_CellWithoutOwnTable_ExportsThePresetCurve()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Preset curve " + Guid.NewGuid(), new CellInput { Chemistry = Chemistry.Lfp }))).Value!;

        var csv = (await cells.ExportOcvCsvAsync(cell.Id)).Value!;

        Assert.Equal(ChemistryPresets.For(Chemistry.Lfp)!.OcvCurve, OcvCsv.Parse(csv).Points);
    }

    [ProviderFact]
    public async Task Delete_StaleVersion_ReturnsConflict()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Delete " + Guid.NewGuid(), EveryFigure))).Value!;

        var stale = await cells.DeleteAsync(cell.Id, cell.Version + 5);
        var deleted = await cells.DeleteAsync(cell.Id, cell.Version);

        Assert.Equal(StoreStatus.Conflict, stale.Status);
        Assert.Equal(StoreStatus.Ok, deleted.Status);
        Assert.Equal(StoreStatus.NotFound, (await cells.GetAsync(cell.Id)).Status);
    }

    [ProviderFact]
    public async Task CountLinkedDesigns_TwoDesigns_CountsThemAndDeleteKeepsTheirFigures()
    {
        await using var db = database.CreateContext();
        var cells = database.Cells(db);
        var designs = database.Designs(db);
        var cell = (await cells.CreateAsync(new CellData("Linked " + Guid.NewGuid(), TestDesigns.Valid().Cell))).Value!;
        var unused = (await cells.CreateAsync(new CellData("Unused " + Guid.NewGuid(), TestDesigns.Valid().Cell))).Value!;
        var first = (await designs.CreateDesignAsync("Uses cell A " + Guid.NewGuid(), null, null, cell.Id, TestDesigns.Valid(), "a")).Value!;
        await designs.CreateDesignAsync("Uses cell B " + Guid.NewGuid(), null, null, cell.Id, TestDesigns.Valid(), "a");

        var linked = await cells.CountLinkedDesignsAsync(cell.Id);
        var none = await cells.CountLinkedDesignsAsync(unused.Id);
        var missing = await cells.CountLinkedDesignsAsync(int.MaxValue);
        await cells.DeleteAsync(cell.Id, cell.Version);
        var after = (await designs.GetDesignAsync(first.Id)).Value!;

        Assert.Equal(2, linked.Value);
        Assert.Equal(0, none.Value);
        Assert.Equal(StoreStatus.NotFound, missing.Status);
        Assert.Null(after.CellId);
        Assert.Equal(TestDesigns.Valid().Cell.CapacityAh, after.LatestRevision.Input.Cell.CapacityAh);
    }
}
