namespace PackDesigner.Web.Storage;

/// <summary>
/// Endpoint metadata: this page or endpoint works without the database (the evaluate form and API, the error page,
/// static files, the OpenAPI document, the health report), so <see cref="StorageGate"/> does not hold it up.
/// Every other endpoint waits for the database to be migrated first.
/// </summary>
[AttributeUsage(AttributeTargets.Class | AttributeTargets.Method)]
public sealed class StorageFreeAttribute : Attribute
{
    public static readonly StorageFreeAttribute Instance = new();
}
