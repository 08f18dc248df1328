using System.Globalization;
using Microsoft.AspNetCore.Mvc.Rendering;
using PackDesigner.Core.Finder;
using PackDesigner.Web.Formatting;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Finder;

/// <summary>One candidate of the finder, as display text, with the link that opens it as a new design.</summary>
public sealed record FinderRow(
    string Configuration, int Series, int Parallel, string Cells, string MaxVoltage, string ConstantVoltage, string LoadedLowVoltage,
    string UsableEnergy, string ContinuousCurrent, string PeakCurrent, string Mass, int Errors, int Warnings, string NewDesignLink)
{
    public static FinderRow From(ConfigurationCandidate c)
    {
        ArgumentNullException.ThrowIfNull(c);
        return new(
            string.Create(CultureInfo.InvariantCulture, $"{c.Series}S{c.Parallel}P"), c.Series, c.Parallel, Numbers.Fixed(c.CellCount, 0),
            Numbers.Quantity(c.MaxVoltage, 1, "V"), Numbers.Quantity(c.ConstantVoltage, 1, "V"), Numbers.Quantity(c.LoadedLowVoltage, 1, "V"),
            Numbers.Quantity(c.UsableEnergyWh, 0, "Wh"), Numbers.Quantity(c.ContinuousCurrentA, 0, "A"), Numbers.Quantity(c.PeakCurrentA, 0, "A"),
            Numbers.Quantity(c.MassKg, 1, "kg"), c.Errors, c.Warnings, DesignRoutes.NewWith(c.Series, c.Parallel));
    }
}

/// <summary>The finder's select lists; values are the API's camelCase names.</summary>
public static class FinderChoices
{
    public static IReadOnlyList<SelectListItem> Sorts { get; } =
    [
        new("Fewest cells", "cellCount"),
        new("Most usable energy", "usableEnergy"),
        new("Lightest", "mass"),
        new("Most continuous current", "continuousCurrent"),
        new("Fewest findings", "findings"),
    ];
}
