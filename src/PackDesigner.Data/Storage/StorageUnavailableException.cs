namespace PackDesigner.Data.Storage;

/// <summary>
/// The database could not be reached or did not answer in time. The operation stored nothing (its transaction
/// was not committed). The web layer answers 503 "storage unavailable"; the cause goes to the log only.
/// </summary>
public sealed class StorageUnavailableException(string message, Exception innerException) : Exception(message, innerException);
