using System.ComponentModel.DataAnnotations;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>
/// The cell library's form as typed (all text, parsed with the invariant culture). The figures are the design
/// form's <see cref="CellForm"/>, so their field names (<c>Input.Cell.CapacityAh</c>), labels and error keys
/// (<c>cell.capacityAh</c>) are the same on both pages.
/// </summary>
public sealed class CellPageForm
{
    [Display(Name = "Name")]
    public string? Name { get; set; }

    [Display(Name = "Maker")]
    public string? Maker { get; set; }

    [Display(Name = "Model")]
    public string? Model { get; set; }

    [Display(Name = "Notes")]
    public string? Notes { get; set; }

    public CellForm Cell { get; set; } = new();

    /// <summary>The fingerprint of the OCV table text whose preview was shown last (see <see cref="OcvTablePreview.FingerprintOf"/>).</summary>
    public string? OcvPreviewed { get; set; }

    /// <summary>The library version the edit started from (edit only).</summary>
    public long Version { get; set; }
}
