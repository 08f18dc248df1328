using Microsoft.AspNetCore.Mvc.Rendering;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>The options of the design form's select lists; values are the API's camelCase names.</summary>
public static class DesignFormChoices
{
    public const string OcvPlaceholder = "Blank: typical curve. Example rows:\n0,2.50\n50,3.30\n100,3.50";

    public static IReadOnlyList<SelectListItem> Chemistries { get; } =
    [
        new("LFP (iron phosphate)", "lfp"),
        new("NMC (Ni-Mn-Co oxide)", "nmc"),
        new("NCA (Ni-Co-Al oxide)", "nca"),
        new("LTO (titanate anode)", "lto"),
        new("Custom (no preset)", "custom"),
    ];

    public static IReadOnlyList<SelectListItem> BalancingMethods { get; } =
    [
        new("Bottom (at empty)", "bottom"),
        new("Top (at full)", "top"),
    ];

    public static IReadOnlyList<SelectListItem> SpreadDistributions { get; } =
    [
        new("Normal", "normal"),
        new("Uniform", "uniform"),
    ];
}
