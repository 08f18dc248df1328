using Microsoft.EntityFrameworkCore;

namespace PackDesigner.Data;

/// <summary>
/// Thrown when code tries to change or delete a saved design revision or status change. A bug, never an expected
/// outcome: revisions are only ever added.
/// </summary>
public sealed class AppendOnlyViolationException(string entityName, EntityState state)
    : InvalidOperationException($"{entityName} rows are append-only: {state} is refused. Add a new revision or status change instead.")
{
    public string EntityName { get; } = entityName;
    public EntityState State { get; } = state;
}
