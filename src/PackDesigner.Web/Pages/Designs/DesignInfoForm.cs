using System.ComponentModel.DataAnnotations;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// The editor's own fields around the design input: name, customer and job, library cell, who saves, a note, and
/// the revision the changes are based on (hidden; the store refuses a save based on a revision that is no longer
/// the latest).
/// </summary>
public sealed class DesignInfoForm
{
    public const string Prefix = "Design";

    [Display(Name = "Design name")]
    public string? Name { get; set; }

    [Display(Name = "Customer and job")]
    public string? Owner { get; set; }

    [Display(Name = "Library cell")]
    public string? CellId { get; set; }

    [Display(Name = "Your name")]
    public string? SavedBy { get; set; }

    [Display(Name = "Note for this revision")]
    public string? Note { get; set; }

    public int? BasedOnRevision { get; set; }

    /// <summary>Where the store's error keys go on this form.</summary>
    public static IReadOnlyDictionary<string, string> ErrorKeys { get; } = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["name"] = Prefix + "." + nameof(Name),
        ["customerId"] = Prefix + "." + nameof(Owner),
        ["jobId"] = Prefix + "." + nameof(Owner),
        ["cellId"] = Prefix + "." + nameof(CellId),
        ["createdBy"] = Prefix + "." + nameof(SavedBy),
        ["note"] = Prefix + "." + nameof(Note),
    };

    /// <summary>The fields for the error summary, in form order.</summary>
    public static IReadOnlyList<FormField> Fields { get; } =
    [
        new("name", Prefix + "." + nameof(Name), "Design name", "Design"),
        new("customerId", Prefix + "." + nameof(Owner), "Customer and job", "Design"),
        new("cellId", Prefix + "." + nameof(CellId), "Library cell", "Design"),
        new("createdBy", Prefix + "." + nameof(SavedBy), "Your name", "Design"),
        new("note", Prefix + "." + nameof(Note), "Note for this revision", "Design"),
    ];
}
