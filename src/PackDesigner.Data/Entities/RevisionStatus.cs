namespace PackDesigner.Data.Entities;

/// <summary>Review state of a design revision; stored as camelCase text.</summary>
public enum RevisionStatus
{
    Draft,
    Submitted,
    SignedOff,
    Returned,
}
