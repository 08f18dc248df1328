using System.Globalization;
using System.Linq.Expressions;
using Microsoft.EntityFrameworkCore;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Infrastructure;
using PackDesigner.Data.Results;
using PackDesigner.Data.Storage;

namespace PackDesigner.Data.Customers;

/// <summary>Customers and their jobs. A customer or job that designs refer to cannot be deleted.</summary>
public sealed class CustomerService(PackDesignerDbContext db, TimeProvider clock)
{
    public const int MaxPageSize = 100;

    /// <summary>One page of customers by name; <paramref name="search"/> matches part of the name, case-insensitively.</summary>
    public Task<PagedResult<CustomerRow>> ListAsync(string? search, int page, int pageSize, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            page = Math.Max(1, page);
            pageSize = Math.Clamp(pageSize, 1, MaxPageSize);
            var query = db.Customers.AsNoTracking();
            if (!string.IsNullOrWhiteSpace(search))
            {
                var key = ISearchable.KeyFor(search);
                query = query.Where(c => c.SearchKey.Contains(key));
            }

            var total = await query.CountAsync(ct);
            var rows = await query
                .OrderBy(c => c.SearchKey).ThenBy(c => c.Id)
                .Skip((page - 1) * pageSize).Take(pageSize)
                .Select(c => new CustomerRow(c.Id, c.Name, c.Contact, c.Jobs.Count, db.Designs.Count(d => d.CustomerId == c.Id), c.UpdatedUtc))
                .ToListAsync(ct);
            return new PagedResult<CustomerRow>(rows, total, page, pageSize);
        });

    public Task<StoreResult<CustomerDetails>> GetAsync(int id, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(() => GetCoreAsync(id, ct));

    public Task<StoreResult<CustomerDetails>> CreateAsync(CustomerData data, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var errors = new List<ValidationError>();
            var customer = new Customer { Name = "" };
            Apply(customer, data, errors);
            if (errors.Count > 0)
            {
                return StoreResult<CustomerDetails>.Invalid(errors);
            }

            customer.CreatedUtc = customer.UpdatedUtc = UtcClock.Now(clock);
            db.Customers.Add(customer);
            await SaveAsync(ct);
            return await GetCoreAsync(customer.Id, ct);
        });

    public Task<StoreResult<CustomerDetails>> UpdateAsync(int id, CustomerData data, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var customer = await db.Customers.FirstOrDefaultAsync(c => c.Id == id, ct);
            if (customer is null)
            {
                return CustomerNotFound<CustomerDetails>(id);
            }

            var errors = new List<ValidationError>();
            Apply(customer, data, errors);
            if (errors.Count > 0)
            {
                db.ChangeTracker.Clear();
                return StoreResult<CustomerDetails>.Invalid(errors);
            }

            customer.UpdatedUtc = UtcClock.Now(clock);
            await SaveAsync(ct);
            return await GetCoreAsync(id, ct);
        });

    /// <summary>Deletes a customer that has no jobs and no designs.</summary>
    public Task<StoreResult<int>> DeleteAsync(int id, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var usage = await db.Customers.AsNoTracking().Where(c => c.Id == id)
                .Select(c => new { Jobs = c.Jobs.Count, Designs = db.Designs.Count(d => d.CustomerId == c.Id) })
                .FirstOrDefaultAsync(ct);
            if (usage is null)
            {
                return CustomerNotFound<int>(id);
            }

            if (usage.Jobs > 0 || usage.Designs > 0)
            {
                return StoreResult<int>.Invalid("id", string.Create(CultureInfo.InvariantCulture,
                    $"This customer has {usage.Jobs} job(s) and {usage.Designs} design(s); move or remove those first."));
            }

            try
            {
                await db.Customers.Where(c => c.Id == id).ExecuteDeleteAsync(ct);
            }
            catch (Exception ex) when (StorageFailure.IsForeignKeyViolation(ex))
            {
                return StoreResult<int>.Invalid("id", "A job or design was added to this customer meanwhile; it cannot be deleted.");
            }

            return StoreResult<int>.Ok(id);
        });

    /// <summary>The jobs of a customer, newest first.</summary>
    public Task<StoreResult<IReadOnlyList<JobDetails>>> ListJobsAsync(int customerId, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            if (!await db.Customers.AnyAsync(c => c.Id == customerId, ct))
            {
                return CustomerNotFound<IReadOnlyList<JobDetails>>(customerId);
            }

            return StoreResult<IReadOnlyList<JobDetails>>.Ok(await JobsOfAsync(customerId, ct));
        });

    public Task<StoreResult<JobDetails>> GetJobAsync(int jobId, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var job = await JobAsync(jobId, ct);
            return job is null ? JobNotFound<JobDetails>(jobId) : StoreResult<JobDetails>.Ok(job);
        });

    public Task<StoreResult<JobDetails>> CreateJobAsync(int customerId, JobData data, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            if (!await db.Customers.AnyAsync(c => c.Id == customerId, ct))
            {
                return CustomerNotFound<JobDetails>(customerId);
            }

            var errors = new List<ValidationError>();
            var job = new Job { Title = "", CustomerId = customerId };
            Apply(job, data, errors);
            if (errors.Count > 0)
            {
                return StoreResult<JobDetails>.Invalid(errors);
            }

            job.CreatedUtc = job.UpdatedUtc = UtcClock.Now(clock);
            db.Jobs.Add(job);
            await SaveAsync(ct);
            return StoreResult<JobDetails>.Ok((await JobAsync(job.Id, ct))!);
        });

    public Task<StoreResult<JobDetails>> UpdateJobAsync(int jobId, JobData data, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var job = await db.Jobs.FirstOrDefaultAsync(j => j.Id == jobId, ct);
            if (job is null)
            {
                return JobNotFound<JobDetails>(jobId);
            }

            var errors = new List<ValidationError>();
            Apply(job, data, errors);
            if (errors.Count > 0)
            {
                db.ChangeTracker.Clear();
                return StoreResult<JobDetails>.Invalid(errors);
            }

            job.UpdatedUtc = UtcClock.Now(clock);
            await SaveAsync(ct);
            return StoreResult<JobDetails>.Ok((await JobAsync(jobId, ct))!);
        });

    /// <summary>Deletes a job that no design refers to.</summary>
    public Task<StoreResult<int>> DeleteJobAsync(int jobId, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var usage = await db.Jobs.AsNoTracking().Where(j => j.Id == jobId)
                .Select(j => new { Designs = db.Designs.Count(d => d.JobId == j.Id) })
                .FirstOrDefaultAsync(ct);
            if (usage is null)
            {
                return JobNotFound<int>(jobId);
            }

            if (usage.Designs > 0)
            {
                return StoreResult<int>.Invalid("id", string.Create(CultureInfo.InvariantCulture,
                    $"{usage.Designs} design(s) belong to this job; move them to another job first."));
            }

            try
            {
                await db.Jobs.Where(j => j.Id == jobId).ExecuteDeleteAsync(ct);
            }
            catch (Exception ex) when (StorageFailure.IsForeignKeyViolation(ex))
            {
                return StoreResult<int>.Invalid("id", "A design was added to this job meanwhile; it cannot be deleted.");
            }

            return StoreResult<int>.Ok(jobId);
        });

    private static readonly Expression<Func<Job, JobDetails>> ToJobDetails =
        j => new JobDetails(j.Id, j.CustomerId, j.Title, j.VehicleOrSystem, j.Notes, j.CreatedUtc, j.UpdatedUtc);

    private Task<List<JobDetails>> JobsOfAsync(int customerId, CancellationToken ct) => db.Jobs.AsNoTracking()
        .Where(j => j.CustomerId == customerId)
        .OrderByDescending(j => j.CreatedUtc).ThenByDescending(j => j.Id)
        .Select(ToJobDetails)
        .ToListAsync(ct);

    private Task<JobDetails?> JobAsync(int jobId, CancellationToken ct) =>
        db.Jobs.AsNoTracking().Where(j => j.Id == jobId).Select(ToJobDetails).FirstOrDefaultAsync(ct);

    private async Task<StoreResult<CustomerDetails>> GetCoreAsync(int id, CancellationToken ct)
    {
        var c = await db.Customers.AsNoTracking().Where(x => x.Id == id)
            .Select(x => new { x.Id, x.Name, x.Contact, x.Notes, x.CreatedUtc, x.UpdatedUtc })
            .FirstOrDefaultAsync(ct);
        if (c is null)
        {
            return CustomerNotFound<CustomerDetails>(id);
        }

        var jobs = await JobsOfAsync(id, ct);
        return StoreResult<CustomerDetails>.Ok(new CustomerDetails(c.Id, c.Name, c.Contact, c.Notes, c.CreatedUtc, c.UpdatedUtc, jobs));
    }

    private static void Apply(Customer customer, CustomerData data, List<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(data);
        customer.Name = TextRules.Required(errors, "name", data.Name, FieldLengths.Name, "the customer's name");
        customer.Contact = TextRules.Optional(errors, "contact", data.Contact, FieldLengths.Contact);
        customer.Notes = TextRules.Optional(errors, "notes", data.Notes, FieldLengths.Notes);
    }

    private static void Apply(Job job, JobData data, List<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(data);
        job.Title = TextRules.Required(errors, "title", data.Title, FieldLengths.Name, "a title for the job");
        job.VehicleOrSystem = TextRules.Optional(errors, "vehicleOrSystem", data.VehicleOrSystem, FieldLengths.Name);
        job.Notes = TextRules.Optional(errors, "notes", data.Notes, FieldLengths.Notes);
    }

    private async Task SaveAsync(CancellationToken ct)
    {
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch
        {
            db.ChangeTracker.Clear();
            throw;
        }
    }

    private static StoreResult<T> CustomerNotFound<T>(int id) =>
        StoreResult<T>.NotFound(string.Create(CultureInfo.InvariantCulture, $"There is no customer {id}."));

    private static StoreResult<T> JobNotFound<T>(int id) =>
        StoreResult<T>.NotFound(string.Create(CultureInfo.InvariantCulture, $"There is no job {id}."));
}
