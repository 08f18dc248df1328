using System.Globalization;
using System.Text.RegularExpressions;
using Microsoft.EntityFrameworkCore;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Infrastructure;
using PackDesigner.Data.Results;
using PackDesigner.Data.Storage;

namespace PackDesigner.Data.Cells;

/// <summary>
/// The shop's cell library. Figures are checked with Core's <see cref="CellResolver"/> (errors keyed
/// <c>cell.*</c>). Updates name the version they were based on (<see cref="Cell.Version"/>); a stale version gets
/// Conflict. Designs keep their own copy of the figures, so editing or deleting a cell never changes a saved revision.
/// </summary>
public sealed partial class CellLibrary(PackDesignerDbContext db, TimeProvider clock)
{
    public const int MaxPageSize = 100;

    /// <summary>The field key of errors about an uploaded OCV CSV file.</summary>
    public const string OcvCsvField = "ocvCsv";

    /// <summary>One page of cells by name; <paramref name="search"/> matches part of the name, maker or model.</summary>
    public Task<PagedResult<CellRow>> ListAsync(string? search, int page, int pageSize, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            page = Math.Max(1, page);
            pageSize = Math.Clamp(pageSize, 1, MaxPageSize);
            var query = db.Cells.AsNoTracking();
            if (!string.IsNullOrWhiteSpace(search))
            {
                var key = ISearchable.KeyFor(search);
                query = query.Where(c => c.SearchKey.Contains(key));
            }

            var total = await query.CountAsync(ct);
            var rows = await query.OrderBy(c => c.SearchKey).ThenBy(c => c.Id)
                .Skip((page - 1) * pageSize).Take(pageSize)
                .Select(c => new CellRow(c.Id, c.Name, c.Maker, c.Model, c.Chemistry, c.CapacityAh, c.NominalVoltage,
                    c.OcvCurveJson != null, c.UpdatedUtc, c.Version))
                .ToListAsync(ct);
            return new PagedResult<CellRow>(rows, total, page, pageSize);
        });

    public Task<StoreResult<CellDetails>> GetAsync(int id, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var cell = await db.Cells.AsNoTracking().FirstOrDefaultAsync(c => c.Id == id, ct);
            return cell is null ? NotFound<CellDetails>(id) : StoreResult<CellDetails>.Ok(CellMapping.ToDetails(cell));
        });

    public Task<StoreResult<CellDetails>> CreateAsync(CellData data, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var cell = new Cell { Name = "" };
            var errors = Apply(cell, data);
            if (errors.Count > 0)
            {
                return StoreResult<CellDetails>.Invalid(errors);
            }

            cell.CreatedUtc = cell.UpdatedUtc = UtcClock.Now(clock);
            cell.Version = 1;
            db.Cells.Add(cell);
            await SaveAsync(ct);
            return StoreResult<CellDetails>.Ok(CellMapping.ToDetails(cell));
        });

    /// <summary>Replaces the cell's names and figures; Conflict when <paramref name="expectedVersion"/> is stale.</summary>
    public Task<StoreResult<CellDetails>> UpdateAsync(int id, long expectedVersion, CellData data, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var cell = await db.Cells.FirstOrDefaultAsync(c => c.Id == id, ct);
            if (cell is null)
            {
                return NotFound<CellDetails>(id);
            }

            var errors = Apply(cell, data);
            if (errors.Count > 0)
            {
                db.ChangeTracker.Clear();
                return StoreResult<CellDetails>.Invalid(errors);
            }

            return await SaveUpdateAsync(cell, expectedVersion, ct);
        });

    /// <summary>A copy of a cell under a new name (default: "… (copy)").</summary>
    public Task<StoreResult<CellDetails>> CloneAsync(int id, string? newName = null, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var source = await db.Cells.AsNoTracking().FirstOrDefaultAsync(c => c.Id == id, ct);
            if (source is null)
            {
                return NotFound<CellDetails>(id);
            }

            var name = newName ?? TextRules.Truncate(source.Name, FieldLengths.Name - 7) + " (copy)";
            var data = new CellData(name, CellMapping.ToInput(source), source.Maker, source.Model, source.Notes);
            var cell = new Cell { Name = "" };
            var errors = Apply(cell, data);
            if (errors.Count > 0)
            {
                return StoreResult<CellDetails>.Invalid(errors);
            }

            cell.CreatedUtc = cell.UpdatedUtc = UtcClock.Now(clock);
            cell.Version = 1;
            db.Cells.Add(cell);
            await SaveAsync(ct);
            return StoreResult<CellDetails>.Ok(CellMapping.ToDetails(cell));
        });

    /// <summary>How many designs link to the cell (each keeps its own copy of the figures); NotFound when there is no such cell.</summary>
    public Task<StoreResult<int>> CountLinkedDesignsAsync(int id, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            if (!await db.Cells.AnyAsync(c => c.Id == id, ct))
            {
                return NotFound<int>(id);
            }

            return StoreResult<int>.Ok(await db.Designs.CountAsync(d => d.CellId == id, ct));
        });

    /// <summary>Deletes a cell; designs linked to it keep their figures and lose the link.</summary>
    public Task<StoreResult<int>> DeleteAsync(int id, long expectedVersion, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var version = await db.Cells.AsNoTracking().Where(c => c.Id == id).Select(c => (long?)c.Version).FirstOrDefaultAsync(ct);
            if (version is null)
            {
                return NotFound<int>(id);
            }

            var deleted = await db.Cells.Where(c => c.Id == id && c.Version == expectedVersion).ExecuteDeleteAsync(ct);
            return deleted == 1 ? StoreResult<int>.Ok(id) : Stale<int>();
        });

    /// <summary>
    /// Replaces the cell's OCV table from CSV (see <see cref="OcvCsv"/>). Errors name the file's lines; nothing
    /// is stored unless the whole table is valid for this cell.
    /// </summary>
    public Task<StoreResult<CellDetails>> ImportOcvCsvAsync(int id, long expectedVersion, Stream csv, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var parsed = await OcvCsv.ParseAsync(csv, ct);
            var cell = await db.Cells.FirstOrDefaultAsync(c => c.Id == id, ct);
            if (cell is null)
            {
                return NotFound<CellDetails>(id);
            }

            if (!parsed.IsValid)
            {
                db.ChangeTracker.Clear();
                return StoreResult<CellDetails>.Invalid(parsed.Errors.Select(e => new ValidationError(OcvCsvField, e.ToString())).ToList());
            }

            var figures = CellMapping.ToInput(cell) with { OcvCurve = parsed.Points };
            CellResolver.TryResolve(figures, out var cellErrors);
            var curveErrors = cellErrors.Where(e => e.Field.StartsWith("cell.ocvCurve", StringComparison.Ordinal)).ToList();
            if (curveErrors.Count > 0)
            {
                db.ChangeTracker.Clear();
                return StoreResult<CellDetails>.Invalid(curveErrors.Select(e => ToLineError(e, parsed.Lines)).ToList());
            }

            CellMapping.ApplyFigures(cell, figures);
            return await SaveUpdateAsync(cell, expectedVersion, ct);
        });

    /// <summary>The cell's OCV table as CSV: its own table, or the chemistry preset's typical one when it has none.</summary>
    public Task<StoreResult<string>> ExportOcvCsvAsync(int id, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var cell = await db.Cells.AsNoTracking().FirstOrDefaultAsync(c => c.Id == id, ct);
            if (cell is null)
            {
                return NotFound<string>(id);
            }

            var points = CellMapping.ToInput(cell).OcvCurve ?? ChemistryPresets.For(cell.Chemistry)?.OcvCurve;
            return points is null
                ? StoreResult<string>.Invalid("cell.ocvCurve", "This custom-chemistry cell has no OCV table yet.")
                : StoreResult<string>.Ok(OcvCsv.Write(points));
        });

    private async Task<StoreResult<CellDetails>> SaveUpdateAsync(Cell cell, long expectedVersion, CancellationToken ct)
    {
        var entry = db.Entry(cell);
        // The UPDATE checks the version the caller saw, not the one just read; the DbContext raises it by one.
        entry.Property(c => c.Version).OriginalValue = expectedVersion;
        cell.UpdatedUtc = UtcClock.Now(clock);
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateConcurrencyException)
        {
            db.ChangeTracker.Clear();
            return Stale<CellDetails>();
        }
        catch
        {
            db.ChangeTracker.Clear();
            throw;
        }

        return StoreResult<CellDetails>.Ok(CellMapping.ToDetails(cell));
    }

    private static List<ValidationError> Apply(Cell cell, CellData data)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(data.Figures);
        var errors = new List<ValidationError>();
        cell.Name = TextRules.Required(errors, "name", data.Name, FieldLengths.Name, "a name for the cell");
        cell.Maker = TextRules.Optional(errors, "maker", data.Maker, FieldLengths.Name);
        cell.Model = TextRules.Optional(errors, "model", data.Model, FieldLengths.Name);
        cell.Notes = TextRules.Optional(errors, "notes", data.Notes, FieldLengths.Notes);
        if (!Enum.IsDefined(data.Figures.Chemistry))
        {
            errors.Add(new ValidationError("cell.chemistry", "Choose one of the listed chemistries."));
            return errors;
        }

        CellResolver.TryResolve(data.Figures, out var figureErrors);
        errors.AddRange(figureErrors);
        CellMapping.ApplyFigures(cell, data.Figures);
        return errors;
    }

    /// <summary>"cell.ocvCurve[3].voltage" → an error on the file line that row came from.</summary>
    private static ValidationError ToLineError(ValidationError e, IReadOnlyList<int> lines)
    {
        var m = RowIndex().Match(e.Field);
        if (m.Success && int.TryParse(m.Groups[1].Value, NumberStyles.None, CultureInfo.InvariantCulture, out var i) && i < lines.Count)
        {
            var message = RowPrefix().Replace(e.Message, "");
            return new ValidationError(OcvCsvField, new CsvLineError(lines[i], message).ToString());
        }

        return new ValidationError(OcvCsvField, e.Message);
    }

    [GeneratedRegex(@"^cell\.ocvCurve\[(\d+)\]")]
    private static partial Regex RowIndex();

    [GeneratedRegex(@"^Row \d+: ")]
    private static partial Regex RowPrefix();

    private async Task SaveAsync(CancellationToken ct)
    {
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch
        {
            db.ChangeTracker.Clear();
            throw;
        }
    }

    private static StoreResult<T> NotFound<T>(int id) =>
        StoreResult<T>.NotFound(string.Create(CultureInfo.InvariantCulture, $"There is no cell {id} in the library."));

    private static StoreResult<T> Stale<T>() =>
        StoreResult<T>.Conflict("Someone else changed this cell after you opened it. Reload it to see their changes; nothing was saved.");
}
