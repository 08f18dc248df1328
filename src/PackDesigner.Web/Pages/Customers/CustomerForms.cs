using System.ComponentModel.DataAnnotations;
using Microsoft.AspNetCore.Mvc.ModelBinding;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Customers;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Customers;

/// <summary>The customer form as typed.</summary>
public sealed class CustomerForm
{
    [Display(Name = "Name")]
    public string? Name { get; set; }

    [Display(Name = "Contact")]
    public string? Contact { get; set; }

    [Display(Name = "Notes")]
    public string? Notes { get; set; }

    public CustomerData ToData() => new(Name ?? string.Empty, Contact, Notes);

    public static CustomerForm From(CustomerDetails c) => new() { Name = c.Name, Contact = c.Contact, Notes = c.Notes };
}

/// <summary>The job form as typed.</summary>
public sealed class JobForm
{
    [Display(Name = "Title")]
    public string? Title { get; set; }

    [Display(Name = "Vehicle or system")]
    public string? VehicleOrSystem { get; set; }

    [Display(Name = "Notes")]
    public string? Notes { get; set; }

    public JobData ToData() => new(Title ?? string.Empty, VehicleOrSystem, Notes);

    public static JobForm From(JobDetails j) => new() { Title = j.Title, VehicleOrSystem = j.VehicleOrSystem, Notes = j.Notes };
}

/// <summary>Puts the services' field errors (<c>name</c>, <c>vehicleOrSystem</c>) beside the form's fields (<c>Input.Name</c>).</summary>
public static class CustomerFormErrors
{
    /// <summary>TempData key of the message shown after a save or delete.</summary>
    public const string SavedMessageKey = "CustomerSaved";

    public static readonly IReadOnlyList<(string Key, string Label)> CustomerFields =
        [("Input.Name", "Name"), ("Input.Contact", "Contact"), ("Input.Notes", "Notes")];

    public static readonly IReadOnlyList<(string Key, string Label)> JobFields =
        [("Input.Title", "Title"), ("Input.VehicleOrSystem", "Vehicle or system"), ("Input.Notes", "Notes")];

    /// <summary>Adds each error beside its field and returns the summary for the top of the page.</summary>
    public static IReadOnlyList<SummaryError> Show(ModelStateDictionary state, IEnumerable<ValidationError> errors,
        IReadOnlyList<(string Key, string Label)> fields, string generalLabel)
    {
        ArgumentNullException.ThrowIfNull(state);
        ArgumentNullException.ThrowIfNull(errors);
        foreach (var e in errors)
        {
            var key = FormFieldPaths.Prefix + "." + char.ToUpperInvariant(e.Field[0]) + e.Field[1..];
            state.AddModelError(fields.Any(f => f.Key == key) ? key : string.Empty, e.Message);
        }

        return SummaryError.From(state, fields, generalLabel);
    }
}
