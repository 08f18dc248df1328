using System.Globalization;
using Microsoft.EntityFrameworkCore;
using PackDesigner.Data;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>One option of a select; <see cref="Group"/> puts it under an optgroup.</summary>
public sealed record ChoiceOption(string Value, string Text, string? Group = null);

/// <summary>
/// The options of the design editor's customer/job and library cell selects. Customers come with their jobs in one
/// query; the first <see cref="MaxOptions"/> of each by name are offered, plus the design's current choice.
/// </summary>
public sealed class DesignLinkChoices(PackDesignerDbContext db, CellLibrary cells)
{
    public const int MaxOptions = 100;
    public const string NoOwner = "";
    private const string CustomerPrefix = "c";
    private const string JobPrefix = "j";

    /// <summary>"No customer", then per customer the customer itself and each of its jobs.</summary>
    public async Task<IReadOnlyList<ChoiceOption>> OwnersAsync(CancellationToken ct)
    {
        var customers = await db.Customers.AsNoTracking()
            .OrderBy(c => c.SearchKey).ThenBy(c => c.Id)
            .Take(MaxOptions)
            .Select(c => new { c.Id, c.Name, Jobs = c.Jobs.OrderBy(j => j.Title).ThenBy(j => j.Id).Select(j => new { j.Id, j.Title }).ToList() })
            .ToListAsync(ct);
        var options = new List<ChoiceOption> { new(NoOwner, "No customer (own project)") };
        foreach (var c in customers)
        {
            options.Add(new ChoiceOption(OwnerValue(c.Id, null), c.Name + " — no particular job", c.Name));
            options.AddRange(c.Jobs.Select(j => new ChoiceOption(OwnerValue(c.Id, j.Id), c.Name + " — " + j.Title, c.Name)));
        }

        return options;
    }

    /// <summary>"None", then the library cells by name.</summary>
    public async Task<IReadOnlyList<ChoiceOption>> CellsAsync(CancellationToken ct)
    {
        var page = await cells.ListAsync(null, 1, MaxOptions, ct);
        var options = new List<ChoiceOption> { new(string.Empty, "None: figures entered by hand") };
        options.AddRange(page.Items.Select(c => new ChoiceOption(c.Id.ToString(CultureInfo.InvariantCulture),
            c.Maker is { Length: > 0 } maker ? $"{c.Name} ({maker}{(c.Model is { Length: > 0 } m ? " " + m : string.Empty)})" : c.Name)));
        return options;
    }

    /// <summary>The select value of a customer (and job): <c>c3</c> or <c>j7</c>.</summary>
    public static string OwnerValue(int? customerId, int? jobId) =>
        jobId is { } j ? JobPrefix + j.ToString(CultureInfo.InvariantCulture)
        : customerId is { } c ? CustomerPrefix + c.ToString(CultureInfo.InvariantCulture)
        : NoOwner;

    /// <summary>Reads a select value back; false when it is not one this page writes.</summary>
    public static bool TryReadOwner(string? value, out int? customerId, out int? jobId)
    {
        customerId = null;
        jobId = null;
        if (string.IsNullOrEmpty(value))
        {
            return true;
        }

        if (value.Length < 2 || !int.TryParse(value.AsSpan(1), NumberStyles.None, CultureInfo.InvariantCulture, out var id))
        {
            return false;
        }

        switch (value[..1])
        {
            case CustomerPrefix:
                customerId = id;
                return true;
            case JobPrefix:
                jobId = id;
                return true;
            default:
                return false;
        }
    }
}
