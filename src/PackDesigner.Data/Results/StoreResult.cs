using PackDesigner.Core.Validation;

namespace PackDesigner.Data.Results;

/// <summary>How a store operation ended.</summary>
public enum StoreStatus
{
    Ok,
    /// <summary>The input was refused; <see cref="StoreResult{T}.Errors"/> says why, keyed by field. Nothing was stored.</summary>
    Invalid,
    /// <summary>Someone else saved first (stale revision or version). Nothing was stored.</summary>
    Conflict,
    /// <summary>The design, revision, cell, customer or job does not exist.</summary>
    NotFound,
}

/// <summary>
/// The outcome of a store operation: a value, or an expected failure (validation errors, a conflict, not found).
/// Bugs and an unreachable database are exceptions (<see cref="Storage.StorageUnavailableException"/>), not results.
/// </summary>
public sealed record StoreResult<T>
{
    private StoreResult(StoreStatus status, T? value, IReadOnlyList<ValidationError> errors, string? message)
    {
        Status = status;
        Value = value;
        Errors = errors;
        Message = message;
    }

    public StoreStatus Status { get; }
    /// <summary>The value when <see cref="Status"/> is <see cref="StoreStatus.Ok"/>.</summary>
    public T? Value { get; }
    /// <summary>Field-keyed errors when <see cref="Status"/> is <see cref="StoreStatus.Invalid"/>; empty otherwise.</summary>
    public IReadOnlyList<ValidationError> Errors { get; }
    /// <summary>A message for a person when the status is Conflict or NotFound (no internal details).</summary>
    public string? Message { get; }

    public bool IsOk => Status == StoreStatus.Ok;

    public static StoreResult<T> Ok(T value) => new(StoreStatus.Ok, value, [], null);

    public static StoreResult<T> Invalid(IReadOnlyList<ValidationError> errors)
    {
        if (errors.Count == 0)
        {
            throw new ArgumentException("An invalid result needs at least one error.", nameof(errors));
        }

        return new(StoreStatus.Invalid, default, errors, null);
    }

    public static StoreResult<T> Invalid(string field, string message) => Invalid([new ValidationError(field, message)]);

    public static StoreResult<T> Conflict(string message) => new(StoreStatus.Conflict, default, [], message);

    public static StoreResult<T> NotFound(string message) => new(StoreStatus.NotFound, default, [], message);

    /// <summary>The same failure for another value type.</summary>
    /// <exception cref="InvalidOperationException">This result is Ok.</exception>
    public StoreResult<TOther> Cast<TOther>() => Status switch
    {
        StoreStatus.Invalid => StoreResult<TOther>.Invalid(Errors),
        StoreStatus.Conflict => StoreResult<TOther>.Conflict(Message!),
        StoreStatus.NotFound => StoreResult<TOther>.NotFound(Message!),
        _ => throw new InvalidOperationException("An Ok result has a value; map it instead of casting."),
    };
}

/// <summary>One page of a list, with the total count for the pager.</summary>
public sealed record PagedResult<T>(IReadOnlyList<T> Items, int TotalCount, int Page, int PageSize)
{
    public int PageCount => TotalCount == 0 ? 1 : (TotalCount + PageSize - 1) / PageSize;
}
