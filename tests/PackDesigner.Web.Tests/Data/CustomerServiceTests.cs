using PackDesigner.Data.Customers;
using PackDesigner.Data.Results;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

public sealed class CustomerServiceSqliteTests(SqliteTestDatabase database) : CustomerServiceTests<SqliteTestDatabase>(database);

public sealed class CustomerServicePostgresTests(PostgresTestDatabase database) : CustomerServiceTests<PostgresTestDatabase>(database), IPostgresTests;

public abstract class CustomerServiceTests<TDatabase>(TDatabase database) : IClassFixture<TDatabase>
    where TDatabase : TestDatabase
{
    [ProviderFact]
    public async Task CreateAndUpdate_Customer_StoresTrimmedText()
    {
        await using var db = database.CreateContext();
        var customers = database.Customers(db);
        var created = (await customers.CreateAsync(new CustomerData("  Fjord Boats " + Guid.NewGuid() + "  ", " harbour 3 ", ""))).Value!;

        var updated = await customers.UpdateAsync(created.Id, new CustomerData(created.Name, "harbour 4", "prefers LFP"));

        Assert.Equal(created.Name.Trim(), created.Name);
        Assert.Equal("harbour 3", created.Contact);
        Assert.Null(created.Notes);
        Assert.Equal(("harbour 4", "prefers LFP"), (updated.Value!.Contact, updated.Value.Notes));
        Assert.True(updated.Value.UpdatedUtc >= created.UpdatedUtc);
    }

    [ProviderFact]
    public async Task Create_BlankOrTooLongFields_ReturnsErrorsPerField()
    {
        await using var db = database.CreateContext();

        var result = await database.Customers(db).CreateAsync(new CustomerData(" ", new string('x', 501), null));

        Assert.Equal(StoreStatus.Invalid, result.Status);
        Assert.Equal(["contact", "name"], result.Errors.Select(e => e.Field).Order());
        Assert.Equal("At most 500 characters (got 501).", result.Errors.Single(e => e.Field == "contact").Message);
    }

    [ProviderFact]
    public async Task Jobs_CreateListUpdateDelete_UnderTheirCustomer()
    {
        await using var db = database.CreateContext();
        var customers = database.Customers(db);
        var customer = (await customers.CreateAsync(new CustomerData("Jobs " + Guid.NewGuid()))).Value!;

        var job1 = (await customers.CreateJobAsync(customer.Id, new JobData("Boat", "Electric outboard, 48 V"))).Value!;
        var job2 = (await customers.CreateJobAsync(customer.Id, new JobData("Cart", "Golf cart"))).Value!;
        var renamed = (await customers.UpdateJobAsync(job1.Id, new JobData("Boat refit", "Electric outboard, 48 V", "spring"))).Value!;
        var noTitle = await customers.CreateJobAsync(customer.Id, new JobData(""));
        var noCustomer = await customers.CreateJobAsync(int.MaxValue, new JobData("x"));

        Assert.Equal("Boat refit", renamed.Title);
        Assert.Equal("title", noTitle.Errors.Single().Field);
        Assert.Equal(StoreStatus.NotFound, noCustomer.Status);
        var listed = (await customers.ListJobsAsync(customer.Id)).Value!;
        Assert.Equal([job1.Id, job2.Id], listed.Select(j => j.Id).Order());
        Assert.True((await customers.DeleteJobAsync(job2.Id)).IsOk);
        Assert.Single((await customers.GetAsync(customer.Id)).Value!.Jobs);
    }

    [ProviderFact]
    public async Task Delete_CustomerWithJobsOrDesigns_IsRefused()
    {
        await using var db = database.CreateContext();
        var customers = database.Customers(db);
        var withJob = (await customers.CreateAsync(new CustomerData("Busy " + Guid.NewGuid()))).Value!;
        var job = (await customers.CreateJobAsync(withJob.Id, new JobData("Van"))).Value!;
        var withDesign = (await customers.CreateAsync(new CustomerData("Designed " + Guid.NewGuid()))).Value!;
        await database.Designs(db).CreateDesignAsync("For delete test " + Guid.NewGuid(), withDesign.Id, null, null, TestDesigns.Valid(), "a");
        var designOnJob = (await database.Designs(db).CreateDesignAsync("On job " + Guid.NewGuid(), null, job.Id, null, TestDesigns.Valid(), "a")).Value!;
        var idle = (await customers.CreateAsync(new CustomerData("Idle " + Guid.NewGuid()))).Value!;

        Assert.Equal(StoreStatus.Invalid, (await customers.DeleteAsync(withJob.Id)).Status);
        Assert.Equal(StoreStatus.Invalid, (await customers.DeleteAsync(withDesign.Id)).Status);
        Assert.Equal(StoreStatus.Invalid, (await customers.DeleteJobAsync(job.Id)).Status);
        Assert.Equal(withJob.Id, designOnJob.CustomerId);
        Assert.Equal(StoreStatus.Ok, (await customers.DeleteAsync(idle.Id)).Status);
        Assert.Equal(StoreStatus.NotFound, (await customers.GetAsync(idle.Id)).Status);
    }

    [ProviderFact]
    public async Task List_Search_IsCaseInsensitiveAndCountsUsage()
    {
        var token = "cu" + Guid.NewGuid().ToString("N")[..8];
        await using var db = database.CreateContext();
        var customers = database.Customers(db);
        var a = (await customers.CreateAsync(new CustomerData($"Ärzte Werkstatt {token}"))).Value!;
        await customers.CreateJobAsync(a.Id, new JobData("Lift"));
        await database.Designs(db).CreateDesignAsync("Usage " + token, a.Id, null, null, TestDesigns.Valid(), "a");

        var page = await customers.ListAsync("ÄRZTE werkstatt " + token.ToUpperInvariant(), 1, 10);

        var row = Assert.Single(page.Items);
        Assert.Equal((1, 1), (row.JobCount, row.DesignCount));
    }

    [ProviderFact]
    public async Task JobForAMissingCustomer_RefusedByTheForeignKey_IsRecognisedAsSuch()
    {
        await using var db = database.CreateContext();
        db.Jobs.Add(new PackDesigner.Data.Entities.Job { Title = "orphan", CustomerId = int.MaxValue, CreatedUtc = DateTime.UtcNow, UpdatedUtc = DateTime.UtcNow });

        var e = await Assert.ThrowsAsync<Microsoft.EntityFrameworkCore.DbUpdateException>(() => db.SaveChangesAsync());

        Assert.True(PackDesigner.Data.Storage.StorageFailure.IsForeignKeyViolation(e));
        Assert.False(PackDesigner.Data.Storage.StorageFailure.IsUniqueViolation(e));
        Assert.False(PackDesigner.Data.Storage.StorageFailure.IsUnavailable(e));
    }
}
