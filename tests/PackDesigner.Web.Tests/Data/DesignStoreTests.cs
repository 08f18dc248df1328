using System.Security.Cryptography;
using System.Text;
using Microsoft.EntityFrameworkCore;
using PackDesigner.Data;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Json;
using PackDesigner.Data.Results;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

public sealed class DesignStoreSqliteTests(SqliteTestDatabase database) : DesignStoreTests<SqliteTestDatabase>(database);

public sealed class DesignStorePostgresTests(PostgresTestDatabase database) : DesignStoreTests<PostgresTestDatabase>(database), IPostgresTests;

/// <summary>The design store on a real database; each concrete class runs these on its own provider and database.</summary>
public abstract class DesignStoreTests<TDatabase>(TDatabase database) : IClassFixture<TDatabase>
    where TDatabase : TestDatabase
{
    protected TDatabase Database { get; } = database;

    [ProviderFact]
    public async Task CreateDesign_ValidInput_StoresRevisionOneWithHashOfCanonicalInput()
    {
        var input = TestDesigns.Valid();
        await using var db = Database.CreateContext();
        var result = await Database.Designs(db).CreateDesignAsync("Hash check " + Guid.NewGuid(), null, null, null, input, "tester");

        Assert.Equal(StoreStatus.Ok, result.Status);
        var design = result.Value!;
        Assert.Equal(1, design.LatestRevisionNumber);
        Assert.Equal(1, design.LatestRevision.Number);
        Assert.Equal(RevisionStatus.Draft, design.LatestRevision.Status);

        await using var check = Database.CreateContext();
        var stored = await check.DesignRevisions.AsNoTracking().SingleAsync(r => r.DesignId == design.Id);
        // The hash is recomputed here straight from the stored text with the BCL's SHA-256 (FIPS 180-4).
        var expected = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(stored.InputJson)));
        Assert.Equal(expected, stored.InputSha256);
        Assert.Equal(CanonicalDesignJson.Serialize(input), stored.InputJson);
        Assert.Equal(PackDesigner.Core.Evaluation.DesignEvaluator.CalculationVersion, stored.CalculationVersion);
        Assert.Contains("\"pack\":", stored.ResultJson, StringComparison.Ordinal);
        Assert.Equal(16, stored.Series);
        Assert.Equal(2, stored.Parallel);
        Assert.Equal("tester", stored.CreatedBy);
    }

    [ProviderFact]
    public async Task SaveRevision_BasedOnLatest_AddsRevisionTwoAndKeepsRevisionOne()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var first = (await store.CreateDesignAsync("Two revisions " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;
        var changed = TestDesigns.Default().WithSeries(15).Build();

        var second = await store.SaveRevisionAsync(first.Id, 1, changed, "b", note: "one cell fewer");

        Assert.Equal(StoreStatus.Ok, second.Status);
        Assert.Equal(2, second.Value!.LatestRevisionNumber);
        Assert.Equal(15, second.Value.LatestRevision.Input.Series);
        Assert.Equal("one cell fewer", second.Value.LatestRevision.Note);
        var history = (await store.GetRevisionsAsync(first.Id)).Value!;
        Assert.Equal([2, 1], history.Select(r => r.Number));
        var one = (await store.GetRevisionAsync(first.Id, 1)).Value!;
        Assert.Equal(first.LatestRevision.InputSha256, one.InputSha256);
        Assert.Equal(16, one.Input.Series);
        Assert.False(one.IsLatest);
    }

    [ProviderFact]
    public async Task SaveRevision_BasedOnStaleRevision_ReturnsConflictAndStoresNothing()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Stale " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;
        Assert.True((await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithSeries(15).Build(), "a")).IsOk);

        var stale = await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithSeries(14).Build(), "b");

        Assert.Equal(StoreStatus.Conflict, stale.Status);
        Assert.Contains("revision 2", stale.Message, StringComparison.Ordinal);
        Assert.Equal(2, (await store.GetRevisionsAsync(design.Id)).Value!.Count);
    }

    [ProviderFact]
    public async Task SaveRevision_TwoConcurrentSavesFromSameRevision_ExactlyOneSucceeds()
    {
        // Repeated, so that both interleavings (the second save blocked by the first, or reading after it) are likely seen.
        for (var round = 0; round < 5; round++)
        {
            int designId;
            await using (var setup = Database.CreateContext())
            {
                designId = (await Database.Designs(setup).CreateDesignAsync("Race " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!.Id;
            }

            await using var db1 = Database.CreateContext();
            await using var db2 = Database.CreateContext();
            var save1 = Task.Run(() => Database.Designs(db1).SaveRevisionAsync(designId, 1, TestDesigns.Default().WithSeries(15).Build(), "first"));
            var save2 = Task.Run(() => Database.Designs(db2).SaveRevisionAsync(designId, 1, TestDesigns.Default().WithSeries(14).Build(), "second"));
            var results = await Task.WhenAll(save1, save2);

            Assert.Single(results, r => r.Status == StoreStatus.Ok);
            Assert.Single(results, r => r.Status == StoreStatus.Conflict);
            await using var check = Database.CreateContext();
            var revisions = await check.DesignRevisions.AsNoTracking().Where(r => r.DesignId == designId).OrderBy(r => r.Number).ToListAsync();
            Assert.Equal([1, 2], revisions.Select(r => r.Number));
            var winner = results.Single(r => r.IsOk).Value!;
            Assert.Equal(winner.LatestRevision.InputSha256, revisions[1].InputSha256);
            Assert.Equal(2, (await check.Designs.AsNoTracking().SingleAsync(d => d.Id == designId)).LatestRevisionNumber);
        }
    }

    [ProviderFact]
    public async Task SaveRevision_NumberTakenBehindTheTokensBack_UniqueIndexGivesConflict()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Unique " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;
        await using (var other = Database.CreateContext())
        {
            // A writer that ignores the token: adds revision 2 without raising latest_revision_number.
            var json = CanonicalDesignJson.Serialize(TestDesigns.Valid());
            other.DesignRevisions.Add(new DesignRevision
            {
                DesignId = design.Id,
                Number = 2,
                InputJson = json,
                InputSha256 = CanonicalDesignJson.Sha256Hex(json),
                ResultJson = "{}",
                CalculationVersion = "test",
                CreatedBy = "rogue",
                CreatedUtc = DateTime.UtcNow,
            });
            await other.SaveChangesAsync();
        }

        var save = await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithSeries(15).Build(), "b");

        Assert.Equal(StoreStatus.Conflict, save.Status);
        await using var check = Database.CreateContext();
        // The design row's UPDATE was rolled back with the failed INSERT: one transaction.
        Assert.Equal(1, (await check.Designs.AsNoTracking().SingleAsync(d => d.Id == design.Id)).LatestRevisionNumber);
        Assert.Equal("rogue", (await check.DesignRevisions.AsNoTracking().SingleAsync(r => r.DesignId == design.Id && r.Number == 2)).CreatedBy);
    }

    [ProviderFact]
    public async Task CreateDesign_InvalidInput_ReturnsFieldErrorsAndStoresNothing()
    {
        var name = "Invalid " + Guid.NewGuid();
        await using var db = Database.CreateContext();

        var result = await Database.Designs(db).CreateDesignAsync(name, null, null, null, TestDesigns.Invalid(), "a");

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.Contains(result.Errors, e => e.Field == "series");
        Assert.Contains(result.Errors, e => e.Field == "cell.capacityAh");
        await using var check = Database.CreateContext();
        Assert.False(await check.Designs.AnyAsync(d => d.Name == name));
    }

    [ProviderFact]
    public async Task CreateDesign_BlankNameAndUnknownLinks_ReturnsErrorsForEachField()
    {
        await using var db = Database.CreateContext();

        var result = await Database.Designs(db).CreateDesignAsync("  ", 987654, 987655, 987656, TestDesigns.Valid(), "");

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.Equal(["cellId", "createdBy", "customerId", "jobId", "name"], result.Errors.Select(e => e.Field).Order());
    }

    [ProviderFact]
    public async Task SaveRevision_InvalidInput_ReturnsErrorsAndStoresNothing()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Invalid save " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;

        var result = await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Invalid(), "a");

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.Contains(result.Errors, e => e.Field == "cell.capacityAh");
        var reloaded = (await store.GetDesignAsync(design.Id)).Value!;
        Assert.Equal(1, reloaded.LatestRevisionNumber);
        Assert.Single((await store.GetRevisionsAsync(design.Id)).Value!);
    }

    [ProviderFact]
    public async Task SaveRevision_UnknownDesign_ReturnsNotFound()
    {
        await using var db = Database.CreateContext();

        var result = await Database.Designs(db).SaveRevisionAsync(int.MaxValue, 1, TestDesigns.Valid(), "a");

        Assert.Equal(StoreStatus.NotFound, result.Status);
    }

    [ProviderFact]
    public async Task ListDesigns_SearchSortAndPage_RunInTheDatabase()
    {
        var token = "lst" + Guid.NewGuid().ToString("N")[..8];
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var customers = Database.Customers(db);
        var cells = Database.Cells(db);
        var alder = (await customers.CreateAsync(new CustomerData($"Alder Garage {token}"))).Value!;
        var cell = (await cells.CreateAsync(new CellData($"Ωmega cell {token}", TestDesigns.Valid().Cell))).Value!;
        string[] names = ["delta", "Alpha", "charlie", "Bravo", "echo"];
        foreach (var n in names)
        {
            var customerId = n is "Alpha" or "charlie" ? alder.Id : (int?)null;
            var cellId = n == "echo" ? cell.Id : (int?)null;
            Assert.True((await store.CreateDesignAsync($"{n} {token}", customerId, null, cellId, TestDesigns.Valid(), "a")).IsOk);
        }

        var page1 = await store.ListDesignsAsync(token, DesignSort.NameAscending, 1, 2);
        var page2 = await store.ListDesignsAsync(token.ToUpperInvariant(), DesignSort.NameAscending, 2, 2);
        var page3 = await store.ListDesignsAsync(token, DesignSort.NameAscending, 3, 2);

        Assert.Equal(5, page1.TotalCount);
        Assert.Equal(3, page1.PageCount);
        Assert.Equal(["Alpha", "Bravo"], page1.Items.Select(r => r.Name.Split(' ')[0]));
        Assert.Equal(["charlie", "delta"], page2.Items.Select(r => r.Name.Split(' ')[0]));
        Assert.Equal(["echo"], page3.Items.Select(r => r.Name.Split(' ')[0]));

        var byCustomer = await store.ListDesignsAsync("alder garage " + token, DesignSort.NameDescending, 1, 10);
        Assert.Equal(["charlie", "Alpha"], byCustomer.Items.Select(r => r.Name.Split(' ')[0]));
        Assert.All(byCustomer.Items, r => Assert.Equal(alder.Name, r.CustomerName));

        // Case-insensitive beyond ASCII: Ω matches ω.
        var byCell = await store.ListDesignsAsync("ωMEGA CELL " + token, DesignSort.UpdatedNewest, 1, 10);
        var echo = Assert.Single(byCell.Items);
        Assert.Equal(cell.Name, echo.CellName);
        Assert.Equal("16S2P", echo.Configuration);
        Assert.Equal(RevisionStatus.Draft, echo.Status);

        var byCustomerSort = await store.ListDesignsAsync(token, DesignSort.CustomerAscending, 1, 10);
        Assert.Equal(alder.Name, byCustomerSort.Items[0].CustomerName);
        Assert.Equal(alder.Name, byCustomerSort.Items[1].CustomerName);
        Assert.All(byCustomerSort.Items.Skip(2), r => Assert.Null(r.CustomerName));

        var newest = await store.ListDesignsAsync(token, DesignSort.CreatedNewest, 1, 1);
        Assert.StartsWith("echo", newest.Items.Single().Name, StringComparison.Ordinal);
        Assert.Empty((await store.ListDesignsAsync(token, DesignSort.NameAscending, 9, 2)).Items);
    }

    [ProviderFact]
    public async Task ListDesigns_SearchWithWildcardCharacters_MatchesThemLiterally()
    {
        var token = "wc" + Guid.NewGuid().ToString("N")[..8];
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        await store.CreateDesignAsync($"{token} 100% window", null, null, null, TestDesigns.Valid(), "a");
        await store.CreateDesignAsync($"{token} 1000 Ah", null, null, null, TestDesigns.Valid(), "a");
        await store.CreateDesignAsync($"{token} a_b", null, null, null, TestDesigns.Valid(), "a");
        await store.CreateDesignAsync($"{token} axb", null, null, null, TestDesigns.Valid(), "a");

        var percent = await store.ListDesignsAsync($"{token} 100%", DesignSort.NameAscending, 1, 10);
        var underscore = await store.ListDesignsAsync($"{token} a_b", DesignSort.NameAscending, 1, 10);

        Assert.Equal([$"{token} 100% window"], percent.Items.Select(r => r.Name));
        Assert.Equal([$"{token} a_b"], underscore.Items.Select(r => r.Name));
    }

    [ProviderFact]
    public async Task ListDesigns_LatestRevisionFigures_ComeFromTheLatestRevision()
    {
        var token = "latest" + Guid.NewGuid().ToString("N")[..8];
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync(token, null, null, null, TestDesigns.Valid(), "a")).Value!;
        await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithSeries(15).WithParallel(3).Build(), "a");
        await store.ChangeStatusAsync(design.Id, 2, RevisionStatus.Submitted, "a");

        var row = Assert.Single((await store.ListDesignsAsync(token, DesignSort.UpdatedNewest, 1, 10)).Items);

        Assert.Equal(2, row.LatestRevisionNumber);
        Assert.Equal("15S3P", row.Configuration);
        Assert.Equal(RevisionStatus.Submitted, row.Status);
    }

    [ProviderFact]
    public async Task ListDesigns_ManyRows_TakesTwoQueriesWhateverTheRowCount()
    {
        var token = "nq" + Guid.NewGuid().ToString("N")[..8];
        await using (var setup = Database.CreateContext())
        {
            var customer = (await Database.Customers(setup).CreateAsync(new CustomerData("N+1 customer " + token))).Value!;
            for (var i = 0; i < 12; i++)
            {
                await Database.Designs(setup).CreateDesignAsync($"{token} {i}", customer.Id, null, null, TestDesigns.Valid(), "a");
            }
        }

        var counter = new CommandCounter();
        await using var db = Database.CreateContext(counter);
        var page = await Database.Designs(db).ListDesignsAsync(token, DesignSort.NameAscending, 1, 10);

        Assert.Equal(10, page.Items.Count);
        Assert.All(page.Items, r => Assert.Equal("N+1 customer " + token, r.CustomerName));
        // One COUNT and one page query: the customer, cell, latest revision and status come in by joins and subqueries.
        Assert.Equal(2, counter.Count);
    }

    [ProviderFact]
    public async Task SavedRevision_ChangedOrDeletedThroughDbContext_IsRefused()
    {
        await using var db = Database.CreateContext();
        var design = (await Database.Designs(db).CreateDesignAsync("Append-only " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;

        await using var edit = Database.CreateContext();
        var revision = await edit.DesignRevisions.SingleAsync(r => r.DesignId == design.Id);
        revision.Note = "changed afterwards";
        await Assert.ThrowsAsync<AppendOnlyViolationException>(() => edit.SaveChangesAsync());

        await using var delete = Database.CreateContext();
        delete.DesignRevisions.Remove(await delete.DesignRevisions.SingleAsync(r => r.DesignId == design.Id));
        Assert.Throws<AppendOnlyViolationException>(() => delete.SaveChanges());

        await using var status = Database.CreateContext();
        var change = await status.DesignRevisionStatusChanges.SingleAsync(s => s.RevisionId == revision.Id);
        change.Status = RevisionStatus.SignedOff;
        await Assert.ThrowsAsync<AppendOnlyViolationException>(() => status.SaveChangesAsync());

        await using var check = Database.CreateContext();
        var stored = await check.DesignRevisions.AsNoTracking().SingleAsync(r => r.DesignId == design.Id);
        Assert.Null(stored.Note);
    }

    [ProviderFact]
    public async Task SavedRevision_UpdatedOrDeletedWithSql_IsRefusedByTheDatabase()
    {
        await using var db = Database.CreateContext();
        var design = (await Database.Designs(db).CreateDesignAsync("Trigger " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;
        var id = design.LatestRevision.Id;

        await using var sql = Database.CreateContext();
        var update = Record.Exception(() => sql.Database.ExecuteSqlRaw("UPDATE design_revisions SET note = 'tampered' WHERE id = {0}", id));
        var delete = Record.Exception(() => sql.Database.ExecuteSqlRaw("DELETE FROM design_revisions WHERE id = {0}", id));
        var bulk = await Record.ExceptionAsync(() => sql.DesignRevisions.Where(r => r.Id == id).ExecuteUpdateAsync(s => s.SetProperty(r => r.InputJson, "{}")));
        var statusUpdate = Record.Exception(() => sql.Database.ExecuteSqlRaw("UPDATE design_revision_status_changes SET status = 'signedOff' WHERE revision_id = {0}", id));
        var statusDelete = await Record.ExceptionAsync(() => sql.DesignRevisionStatusChanges.Where(s => s.RevisionId == id).ExecuteDeleteAsync());

        foreach (var e in new[] { update, delete, bulk, statusUpdate, statusDelete })
        {
            Assert.NotNull(e);
            Assert.Contains("append-only", e.Message, StringComparison.Ordinal);
        }

        await using var check = Database.CreateContext();
        var stored = await check.DesignRevisions.AsNoTracking().SingleAsync(r => r.Id == id);
        Assert.Null(stored.Note);
        Assert.Equal(design.LatestRevision.InputJson, stored.InputJson);
        Assert.Equal(RevisionStatus.Draft, (await check.DesignRevisionStatusChanges.AsNoTracking().SingleAsync(s => s.RevisionId == id)).Status);
    }

    [ProviderFact]
    public async Task UnicodeNames_RoundTripUnchanged()
    {
        const string name = "Ωmega Ünïcödé 電池";
        const string person = "Zoë Ørsted-Łukasiewicz 👩‍🔧";
        await using var db = Database.CreateContext();
        var customer = (await Database.Customers(db).CreateAsync(new CustomerData("Ĳsselmeer Ŝipyard 造船", "☎ +00 0000", "Ⅻ notes"))).Value!;
        var cell = (await Database.Cells(db).CreateAsync(new CellData("Zelle Größe Ⅳ 電池", TestDesigns.Valid().Cell, "Fabrikant Ä", "Typ ß"))).Value!;

        var created = (await Database.Designs(db).CreateDesignAsync(name, customer.Id, null, cell.Id, TestDesigns.Valid(), person)).Value!;

        await using var read = Database.CreateContext();
        var loaded = (await Database.Designs(read).GetDesignAsync(created.Id)).Value!;
        Assert.Equal(name, loaded.Name);
        Assert.Equal("Ĳsselmeer Ŝipyard 造船", loaded.CustomerName);
        Assert.Equal("Zelle Größe Ⅳ 電池", loaded.CellName);
        Assert.Equal(person, loaded.LatestRevision.CreatedBy);
        Assert.Equal("Zelle Größe Ⅳ 電池", loaded.LatestRevision.LibraryCell!.NameAtSave);
        var customerBack = (await Database.Customers(read).GetAsync(customer.Id)).Value!;
        Assert.Equal("☎ +00 0000", customerBack.Contact);
        Assert.Equal("Ⅻ notes", customerBack.Notes);
        Assert.Single((await Database.Designs(read).ListDesignsAsync("ünïcödé 電池", DesignSort.NameAscending, 1, 10)).Items, r => r.Id == created.Id);
    }

    [ProviderFact]
    public async Task LoadedTimes_AreUtc()
    {
        var before = DateTime.UtcNow.AddSeconds(-5);
        await using var db = Database.CreateContext();
        var created = (await Database.Designs(db).CreateDesignAsync("Utc " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;

        await using var read = Database.CreateContext();
        var design = await read.Designs.AsNoTracking().SingleAsync(d => d.Id == created.Id);
        var revision = await read.DesignRevisions.AsNoTracking().SingleAsync(r => r.DesignId == created.Id);
        var details = (await Database.Designs(read).GetDesignAsync(created.Id)).Value!;
        var row = (await Database.Designs(read).ListDesignsAsync(design.Name, DesignSort.NameAscending, 1, 1)).Items.Single();

        DateTime[] times = [design.CreatedUtc, design.UpdatedUtc, revision.CreatedUtc, details.CreatedUtc, details.LatestRevision.CreatedUtc,
            details.LatestRevision.StatusHistory[0].ChangedUtc, row.CreatedUtc, row.UpdatedUtc];
        Assert.All(times, t => Assert.Equal(DateTimeKind.Utc, t.Kind));
        Assert.All(times, t => Assert.InRange(t, before, DateTime.UtcNow.AddSeconds(5)));
        Assert.Equal(created.CreatedUtc, design.CreatedUtc);
    }

    [ProviderFact]
    public async Task RestoreRevision_OldRevision_CopiesItsInputIntoANewRevision()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Restore " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;
        await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithSeries(15).Build(), "a");

        var restored = await store.RestoreRevisionAsync(design.Id, 1, 2, "b");
        var staleRestore = await store.RestoreRevisionAsync(design.Id, 1, 2, "c");
        var missing = await store.RestoreRevisionAsync(design.Id, 99, 3, "c");

        Assert.Equal(StoreStatus.Ok, restored.Status);
        Assert.Equal(3, restored.Value!.LatestRevisionNumber);
        Assert.Equal(design.LatestRevision.InputSha256, restored.Value.LatestRevision.InputSha256);
        Assert.Equal("Restored from revision 1.", restored.Value.LatestRevision.Note);
        Assert.Equal(StoreStatus.Conflict, staleRestore.Status);
        Assert.Equal(StoreStatus.NotFound, missing.Status);
    }

    [ProviderFact]
    public async Task Duplicate_Design_StartsANewDesignFromTheLatestInput()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var customer = (await Database.Customers(db).CreateAsync(new CustomerData("Dup customer " + Guid.NewGuid()))).Value!;
        var design = (await store.CreateDesignAsync("Original " + Guid.NewGuid(), customer.Id, null, null, TestDesigns.Valid(), "a")).Value!;
        var latest = (await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithParallel(3).Build(), "a")).Value!;

        var copy = await store.DuplicateAsync(design.Id, null, "b");

        Assert.Equal(StoreStatus.Ok, copy.Status);
        Assert.NotEqual(design.Id, copy.Value!.Id);
        Assert.Equal(design.Name + " (copy)", copy.Value.Name);
        Assert.Equal(customer.Id, copy.Value.CustomerId);
        Assert.Equal(1, copy.Value.LatestRevisionNumber);
        Assert.Equal(latest.LatestRevision.InputSha256, copy.Value.LatestRevision.InputSha256);
        Assert.Equal(StoreStatus.NotFound, (await store.DuplicateAsync(int.MaxValue, null, "b")).Status);
    }

    [ProviderFact]
    public async Task ChangeStatus_SubmitThenSignOff_AppendsChangesAndRefusesOthers()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Review " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "designer")).Value!;

        var signOffDraft = await store.ChangeStatusAsync(design.Id, 1, RevisionStatus.SignedOff, "reviewer");
        var submitted = await store.ChangeStatusAsync(design.Id, 1, RevisionStatus.Submitted, "designer", "please check");
        var signed = await store.ChangeStatusAsync(design.Id, 1, RevisionStatus.SignedOff, "reviewer", "fine");
        var again = await store.ChangeStatusAsync(design.Id, 1, RevisionStatus.Returned, "reviewer");

        Assert.Equal(StoreStatus.Invalid, signOffDraft.Status);
        Assert.Equal("status", signOffDraft.Errors.Single().Field);
        Assert.Equal(RevisionStatus.Submitted, submitted.Value!.Status);
        Assert.Equal(RevisionStatus.SignedOff, signed.Value!.Status);
        Assert.Equal([RevisionStatus.Draft, RevisionStatus.Submitted, RevisionStatus.SignedOff], signed.Value.StatusHistory.Select(s => s.Status));
        Assert.Equal("fine", signed.Value.StatusHistory[^1].Note);
        Assert.Equal(StoreStatus.Invalid, again.Status);
    }

    [ProviderFact]
    public async Task ChangeStatus_OlderRevision_CannotBeSubmitted()
    {
        await using var db = Database.CreateContext();
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Old submit " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;
        await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Default().WithSeries(15).Build(), "a");

        var result = await store.ChangeStatusAsync(design.Id, 1, RevisionStatus.Submitted, "a");

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.Equal("Only the latest revision can be submitted.", result.Errors.Single().Message);
    }

    [ProviderFact]
    public async Task GetRevision_LibraryCellEditedOrDeleted_SaysSo()
    {
        await using var db = Database.CreateContext();
        var cells = Database.Cells(db);
        var cell = (await cells.CreateAsync(new CellData("Library " + Guid.NewGuid(), TestDesigns.Valid().Cell))).Value!;
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Linked " + Guid.NewGuid(), null, null, cell.Id, TestDesigns.Valid(), "a")).Value!;
        Assert.Equal(LibraryCellState.Unchanged, design.LatestRevision.LibraryCell!.State);
        Assert.Equal(cell.UpdatedUtc, design.LatestRevision.LibraryCell.UpdatedUtcAtSave);

        var edited = (await cells.UpdateAsync(cell.Id, cell.Version, new CellData(cell.Name, cell.Figures with { MassKg = 1.2 }))).Value!;
        Assert.Equal(LibraryCellState.ChangedSince, (await store.GetRevisionAsync(design.Id, 1)).Value!.LibraryCell!.State);

        Assert.True((await cells.DeleteAsync(cell.Id, edited.Version)).IsOk);
        var afterDelete = (await store.GetDesignAsync(design.Id)).Value!;
        Assert.Equal(LibraryCellState.Deleted, afterDelete.LatestRevision.LibraryCell!.State);
        Assert.Null(afterDelete.CellId);
        // The revision keeps every figure it was computed with.
        Assert.Equal(design.LatestRevision.InputJson, afterDelete.LatestRevision.InputJson);
    }

    [ProviderFact]
    public async Task SaveRevision_WithCellLink_LinksAndSnapshotsTheCell()
    {
        await using var db = Database.CreateContext();
        var cell = (await Database.Cells(db).CreateAsync(new CellData("Relink " + Guid.NewGuid(), TestDesigns.Valid().Cell))).Value!;
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Relink design " + Guid.NewGuid(), null, null, null, TestDesigns.Valid(), "a")).Value!;

        var linked = (await store.SaveRevisionAsync(design.Id, 1, TestDesigns.Valid(), "a", name: "Renamed " + design.Name, cell: new CellLink(cell.Id))).Value!;
        var unlinked = (await store.SaveRevisionAsync(design.Id, 2, TestDesigns.Valid(), "a", cell: new CellLink(null))).Value!;
        var unknown = await store.SaveRevisionAsync(design.Id, 3, TestDesigns.Valid(), "a", cell: new CellLink(int.MaxValue));

        Assert.Equal(cell.Id, linked.CellId);
        Assert.Equal("Renamed " + design.Name, linked.Name);
        Assert.Equal(cell.Id, linked.LatestRevision.LibraryCell!.CellId);
        Assert.Null(unlinked.CellId);
        Assert.Null(unlinked.LatestRevision.LibraryCell);
        Assert.Equal("cellId", unknown.Errors.Single().Field);
    }

    [ProviderFact]
    public async Task UpdateDesignInfo_JobOfAnotherCustomer_IsRefused()
    {
        await using var db = Database.CreateContext();
        var customers = Database.Customers(db);
        var a = (await customers.CreateAsync(new CustomerData("Owner A " + Guid.NewGuid()))).Value!;
        var b = (await customers.CreateAsync(new CustomerData("Owner B " + Guid.NewGuid()))).Value!;
        var jobOfB = (await customers.CreateJobAsync(b.Id, new JobData("Tractor", "Orchard tractor"))).Value!;
        var store = Database.Designs(db);
        var design = (await store.CreateDesignAsync("Owned " + Guid.NewGuid(), a.Id, null, null, TestDesigns.Valid(), "a")).Value!;

        var wrong = await store.UpdateDesignInfoAsync(design.Id, design.Name, a.Id, jobOfB.Id);
        var implied = await store.UpdateDesignInfoAsync(design.Id, "Moved", null, jobOfB.Id);

        Assert.Equal("jobId", wrong.Errors.Single().Field);
        Assert.Equal(b.Id, implied.Value!.CustomerId);
        Assert.Equal("Tractor", implied.Value.JobTitle);
        Assert.Equal(1, implied.Value.LatestRevisionNumber);
    }

    [ProviderFact]
    public async Task ListCustomerDesigns_OtherCustomersAndUnowned_AreLeftOut()
    {
        var token = "own" + Guid.NewGuid().ToString("N")[..8];
        await using var db = Database.CreateContext();
        var customers = Database.Customers(db);
        var store = Database.Designs(db);
        var mine = (await customers.CreateAsync(new CustomerData("Mine " + token))).Value!;
        var other = (await customers.CreateAsync(new CustomerData("Other " + token))).Value!;
        var job = (await customers.CreateJobAsync(mine.Id, new JobData("Boat " + token))).Value!;
        await store.CreateDesignAsync($"{token} direct", mine.Id, null, null, TestDesigns.Valid(), "a");
        await store.CreateDesignAsync($"{token} by job", null, job.Id, null, TestDesigns.Valid(), "a");
        await store.CreateDesignAsync($"{token} other", other.Id, null, null, TestDesigns.Valid(), "a");
        await store.CreateDesignAsync($"{token} nobody", null, null, null, TestDesigns.Valid(), "a");

        var page1 = await store.ListCustomerDesignsAsync(mine.Id, DesignSort.NameAscending, 1, 1);
        var page2 = await store.ListCustomerDesignsAsync(mine.Id, DesignSort.NameAscending, 2, 1);
        var missing = await store.ListCustomerDesignsAsync(int.MaxValue, DesignSort.NameAscending, 1, 10);

        Assert.Equal(2, page1.Value!.TotalCount);
        Assert.Equal([$"{token} by job"], page1.Value.Items.Select(r => r.Name));
        Assert.Equal([$"{token} direct"], page2.Value!.Items.Select(r => r.Name));
        Assert.Equal(job.Title, page1.Value.Items[0].JobTitle);
        Assert.Equal(StoreStatus.NotFound, missing.Status);
    }
}
