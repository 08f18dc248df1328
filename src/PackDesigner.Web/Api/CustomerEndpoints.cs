using System.Globalization;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Api;

/// <summary>
/// <c>/api/v1/customers</c> and their jobs. A customer with jobs or designs, or a job with designs, cannot be
/// deleted (409 saying what still refers to it).
/// </summary>
public static class CustomerEndpoints
{
    public const string Route = "/api/v1/customers";
    public const int DefaultPageSize = 20;
    private const string Tag = "Customers";

    public static IEndpointRouteBuilder MapCustomerEndpoints(this IEndpointRouteBuilder app)
    {
        var customers = app.MapGroup(Route).WithTags(Tag).DisableAntiforgery();
        customers.MapGet("/", ListAsync).WithName("ListCustomers")
            .WithSummary("Lists customers by name; search matches part of the name.");
        customers.MapGet("/{id:int}", GetAsync).WithName("GetCustomer").WithSummary("One customer with its jobs, newest first.")
            .Produces<CustomerResponse>().ProducesProblem(StatusCodes.Status404NotFound);
        customers.MapPost("/", CreateAsync).WithName("CreateCustomer").WithSummary("Adds a customer.")
            .Accepts<CustomerBody>("application/json").Produces<CustomerResponse>(StatusCodes.Status201Created).ProducesValidationProblem();
        customers.MapPut("/{id:int}", UpdateAsync).WithName("UpdateCustomer").WithSummary("Replaces a customer's name, contact and notes.")
            .Accepts<CustomerBody>("application/json").Produces<CustomerResponse>().ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound);
        customers.MapDelete("/{id:int}", DeleteAsync).WithName("DeleteCustomer")
            .WithSummary("Deletes a customer that has no jobs and no designs (else 409).")
            .Produces(StatusCodes.Status204NoContent).ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);

        var jobs = customers.MapGroup("/{id:int}/jobs");
        jobs.MapGet("/", ListJobsAsync).WithName("ListJobs").WithSummary("A customer's jobs, newest first.")
            .Produces<IReadOnlyList<JobResponse>>().ProducesProblem(StatusCodes.Status404NotFound);
        jobs.MapGet("/{jobId:int}", GetJobAsync).WithName("GetJob").WithSummary("One job of a customer.")
            .Produces<JobResponse>().ProducesProblem(StatusCodes.Status404NotFound);
        jobs.MapPost("/", CreateJobAsync).WithName("CreateJob").WithSummary("Adds a job (what is being built) to a customer.")
            .Accepts<JobBody>("application/json").Produces<JobResponse>(StatusCodes.Status201Created).ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound);
        jobs.MapPut("/{jobId:int}", UpdateJobAsync).WithName("UpdateJob").WithSummary("Replaces a job's title, vehicle or system and notes.")
            .Accepts<JobBody>("application/json").Produces<JobResponse>().ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound);
        jobs.MapDelete("/{jobId:int}", DeleteJobAsync).WithName("DeleteJob").WithSummary("Deletes a job that no design belongs to (else 409).")
            .Produces(StatusCodes.Status204NoContent).ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
        return app;
    }

    private static async Task<IResult> ListAsync(CustomerService customers, string? search, int? page, int? pageSize, CancellationToken ct)
    {
        var rows = await customers.ListAsync(search, page ?? 1, pageSize ?? DefaultPageSize, ct);
        return TypedResults.Ok(PageResponse<CustomerSummaryResponse>.From(rows, CustomerSummaryResponse.From));
    }

    private static async Task<IResult> GetAsync(int id, CustomerService customers, CancellationToken ct) =>
        Answer(await customers.GetAsync(id, ct), c => TypedResults.Ok(CustomerResponse.From(c)));

    private static async Task<IResult> CreateAsync(HttpRequest request, CustomerService customers, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await ReadAsync<CustomerBody>(request, json, "the customer", ct);
        if (body.Value is not { } customer)
        {
            return body.Problem!;
        }

        var result = await customers.CreateAsync(new CustomerData(customer.Name ?? string.Empty, customer.Contact, customer.Notes), ct);
        return Answer(result, c => TypedResults.Created(Location(c.Id), CustomerResponse.From(c)));
    }

    private static async Task<IResult> UpdateAsync(int id, HttpRequest request, CustomerService customers, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await ReadAsync<CustomerBody>(request, json, "the customer", ct);
        if (body.Value is not { } customer)
        {
            return body.Problem!;
        }

        var result = await customers.UpdateAsync(id, new CustomerData(customer.Name ?? string.Empty, customer.Contact, customer.Notes), ct);
        return Answer(result, c => TypedResults.Ok(CustomerResponse.From(c)));
    }

    private static async Task<IResult> DeleteAsync(int id, CustomerService customers, CancellationToken ct) =>
        Deleted(await customers.DeleteAsync(id, ct));

    private static async Task<IResult> ListJobsAsync(int id, CustomerService customers, CancellationToken ct) =>
        Answer(await customers.ListJobsAsync(id, ct), jobs => TypedResults.Ok(jobs.Select(JobResponse.From).ToList()));

    private static async Task<IResult> GetJobAsync(int id, int jobId, CustomerService customers, CancellationToken ct)
    {
        var job = await JobOfAsync(customers, id, jobId, ct);
        return Answer(job, j => TypedResults.Ok(JobResponse.From(j)));
    }

    private static async Task<IResult> CreateJobAsync(int id, HttpRequest request, CustomerService customers, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await ReadAsync<JobBody>(request, json, "the job", ct);
        if (body.Value is not { } job)
        {
            return body.Problem!;
        }

        var result = await customers.CreateJobAsync(id, new JobData(job.Title ?? string.Empty, job.VehicleOrSystem, job.Notes), ct);
        return Answer(result, j => TypedResults.Created(Location(id, j.Id), JobResponse.From(j)));
    }

    private static async Task<IResult> UpdateJobAsync(int id, int jobId, HttpRequest request, CustomerService customers, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await ReadAsync<JobBody>(request, json, "the job", ct);
        if (body.Value is not { } job)
        {
            return body.Problem!;
        }

        var existing = await JobOfAsync(customers, id, jobId, ct);
        if (!existing.IsOk)
        {
            return ApiProblems.From(existing);
        }

        var result = await customers.UpdateJobAsync(jobId, new JobData(job.Title ?? string.Empty, job.VehicleOrSystem, job.Notes), ct);
        return Answer(result, j => TypedResults.Ok(JobResponse.From(j)));
    }

    private static async Task<IResult> DeleteJobAsync(int id, int jobId, CustomerService customers, CancellationToken ct)
    {
        var existing = await JobOfAsync(customers, id, jobId, ct);
        return existing.IsOk ? Deleted(await customers.DeleteJobAsync(jobId, ct)) : ApiProblems.From(existing);
    }

    /// <summary>The job, or NotFound when it does not exist or belongs to another customer.</summary>
    private static async Task<StoreResult<JobDetails>> JobOfAsync(CustomerService customers, int customerId, int jobId, CancellationToken ct)
    {
        var job = await customers.GetJobAsync(jobId, ct);
        return job.IsOk && job.Value!.CustomerId != customerId
            ? StoreResult<JobDetails>.NotFound(string.Create(CultureInfo.InvariantCulture, $"Customer {customerId} has no job {jobId}."))
            : job;
    }

    /// <summary>Reads a body; members the contract does not know are refused by name.</summary>
    private static async Task<JsonBodyResult<T>> ReadAsync<T>(HttpRequest request, IOptions<JsonOptions> json, string subject, CancellationToken ct)
        where T : RequestObject
    {
        var body = await JsonBody.ReadAsync<T>(request, json.Value.SerializerOptions, ct, subject);
        if (body.Value?.UnknownFields is { Count: > 0 } unknown)
        {
            return new JsonBodyResult<T>(null, ApiProblems.Invalid(unknown.Keys.Select(k => new ValidationError(k, DesignRequestMapper.UnknownMessage))));
        }

        return body;
    }

    private static IResult Answer<T>(StoreResult<T> result, Func<T, IResult> ok) => result.IsOk ? ok(result.Value!) : ApiProblems.From(result);

    /// <summary>The service refuses to delete what is still referred to with an Invalid result; here that is a 409.</summary>
    private static IResult Deleted(StoreResult<int> result) => result.Status switch
    {
        StoreStatus.Ok => TypedResults.NoContent(),
        StoreStatus.Invalid => ApiProblems.Conflict(string.Join(" ", result.Errors.Select(e => e.Message))),
        _ => ApiProblems.From(result),
    };

    private static string Location(int id) => string.Create(CultureInfo.InvariantCulture, $"{Route}/{id}");

    private static string Location(int id, int jobId) => string.Create(CultureInfo.InvariantCulture, $"{Route}/{id}/jobs/{jobId}");
}
