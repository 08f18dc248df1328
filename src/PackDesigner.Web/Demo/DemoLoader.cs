using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Demo;

/// <summary>What one load of the demo scenario added; all zero when it was there already.</summary>
public sealed record DemoLoadSummary(int Customers, int Jobs, int Cells, int Designs, int Revisions)
{
    public bool AddedNothing => Customers + Jobs + Cells + Designs + Revisions == 0;
}

/// <summary>
/// Loads <see cref="DemoLibrary"/> through the data services. Idempotent: every customer, job, cell and design is
/// looked up by its exact name first and only added when missing, so loading twice adds nothing (and a load that
/// was interrupted is completed by the next). The demo data failing the services' checks is a bug, so it throws.
/// </summary>
public sealed class DemoLoader(CustomerService customers, CellLibrary cells, DesignStore designs)
{
    public const string CreatedBy = "demo loader";

    /// <summary>Whether the database has no design at all (the home page then offers the demo).</summary>
    public async Task<bool> HasNoDesignsAsync(CancellationToken ct = default) =>
        (await designs.ListDesignsAsync(null, DesignSort.UpdatedNewest, 1, 1, ct)).TotalCount == 0;

    public async Task<DemoLoadSummary> LoadAsync(CancellationToken ct = default)
    {
        var added = new DemoLoadSummary(0, 0, 0, 0, 0);
        var customerIds = new Dictionary<string, (int Customer, int Job)>(StringComparer.Ordinal);
        foreach (var c in DemoLibrary.Customers)
        {
            var row = (await customers.ListAsync(c.Name, 1, CustomerService.MaxPageSize, ct)).Items.FirstOrDefault(r => r.Name == c.Name);
            var id = row?.Id ?? Expect(await customers.CreateAsync(new CustomerData(c.Name, c.Contact, c.Notes), ct), c.Name).Id;
            added = row is null ? added with { Customers = added.Customers + 1 } : added;

            var job = Expect(await customers.GetAsync(id, ct), c.Name).Jobs.FirstOrDefault(j => j.Title == c.Job.Title);
            var jobId = job?.Id ?? Expect(await customers.CreateJobAsync(id, new JobData(c.Job.Title, c.Job.VehicleOrSystem, c.Job.Notes), ct), c.Job.Title).Id;
            added = job is null ? added with { Jobs = added.Jobs + 1 } : added;
            customerIds[c.Name] = (id, jobId);
        }

        var cellIds = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var c in DemoLibrary.Cells)
        {
            var row = (await cells.ListAsync(c.Name, 1, CellLibrary.MaxPageSize, ct)).Items.FirstOrDefault(r => r.Name == c.Name);
            cellIds[c.Name] = row?.Id ?? Expect(await cells.CreateAsync(new CellData(c.Name, c.Figures, null, c.Model, c.Notes), ct), c.Name).Id;
            added = row is null ? added with { Cells = added.Cells + 1 } : added;
        }

        foreach (var d in DemoLibrary.Designs)
        {
            var existing = (await designs.ListDesignsAsync(d.Name, DesignSort.NameAscending, 1, DesignStore.MaxPageSize, ct)).Items.Any(r => r.Name == d.Name);
            if (existing)
            {
                continue;
            }

            var (customerId, jobId) = customerIds[d.CustomerName];
            var design = Expect(await designs.CreateDesignAsync(d.Name, customerId, jobId, cellIds[d.CellName], d.First, CreatedBy, ct: ct), d.Name);
            foreach (var r in d.Later)
            {
                design = Expect(await designs.SaveRevisionAsync(design.Id, design.LatestRevisionNumber, r.Input, CreatedBy, note: r.Note, ct: ct), d.Name);
            }

            added = added with { Designs = added.Designs + 1, Revisions = added.Revisions + d.RevisionCount };
        }

        return added;
    }

    private static T Expect<T>(StoreResult<T> result, string what) => result.IsOk
        ? result.Value!
        : throw new InvalidOperationException($"The demo scenario's \"{what}\" was refused ({result.Status}): "
            + string.Join("; ", result.Errors.Select(e => $"{e.Field}: {e.Message}")) + result.Message);
}
