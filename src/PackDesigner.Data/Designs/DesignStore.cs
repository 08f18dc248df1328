using System.Globalization;
using Microsoft.EntityFrameworkCore;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Infrastructure;
using PackDesigner.Data.Json;
using PackDesigner.Data.Results;
using PackDesigner.Data.Storage;

namespace PackDesigner.Data.Designs;

/// <summary>
/// Saves and reads designs and their append-only revisions. Every save is one <c>SaveChanges</c>, so one
/// transaction: it stores the whole revision (input, result, hash, first status row) or nothing. Inputs are
/// evaluated with Core's <see cref="DesignEvaluator"/> first; an invalid input stores nothing and comes back as
/// field-keyed errors. Optimistic concurrency: a save names the revision it was based on; the design's
/// <see cref="Design.LatestRevisionNumber"/> is the concurrency token and (design, number) is unique, so of two
/// saves based on the same revision exactly one succeeds and the other gets <see cref="StoreStatus.Conflict"/>.
/// A database that cannot be reached surfaces as <see cref="StorageUnavailableException"/>.
/// </summary>
public sealed class DesignStore(PackDesignerDbContext db, TimeProvider clock)
{
    public const int MaxPageSize = 100;

    /// <summary>Creates a design with revision 1 of <paramref name="input"/>; <paramref name="note"/> is that revision's note.</summary>
    public Task<StoreResult<DesignDetails>> CreateDesignAsync(string name, int? customerId, int? jobId, int? cellId,
        DesignInput input, string createdBy, string? note = null, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var errors = new List<ValidationError>();
            var cleanNote = TextRules.Optional(errors, "note", note, FieldLengths.Note);
            return errors.Count > 0
                ? StoreResult<DesignDetails>.Invalid(errors)
                : await CreateCoreAsync(name, customerId, jobId, cellId, input, createdBy, cleanNote, ct);
        });

    /// <summary>
    /// Saves <paramref name="input"/> as the next revision, based on revision <paramref name="basedOnRevision"/>;
    /// Conflict when that is no longer the latest. <paramref name="name"/> renames the design when given;
    /// <paramref name="cell"/> changes the library cell link when given (otherwise the current link is kept);
    /// <paramref name="owner"/> changes the customer and job when given, in the same transaction as the revision.
    /// </summary>
    public Task<StoreResult<DesignDetails>> SaveRevisionAsync(int designId, int basedOnRevision, DesignInput input,
        string createdBy, string? name = null, string? note = null, CellLink? cell = null, DesignOwner? owner = null,
        CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            ArgumentNullException.ThrowIfNull(input);
            var design = await db.Designs.FirstOrDefaultAsync(d => d.Id == designId, ct);
            if (design is null)
            {
                return NotFound<DesignDetails>(designId);
            }

            if (design.LatestRevisionNumber != basedOnRevision)
            {
                db.ChangeTracker.Clear();
                return StaleRevision<DesignDetails>(design.LatestRevisionNumber, basedOnRevision);
            }

            var errors = new List<ValidationError>();
            var newName = name is null ? null : TextRules.Required(errors, "name", name, FieldLengths.Name, "a design name");
            var user = TextRules.Required(errors, "createdBy", createdBy, FieldLengths.UserName, "who saves the revision");
            var cleanNote = TextRules.Optional(errors, "note", note, FieldLengths.Note);
            var cellId = cell is null ? design.CellId : cell.CellId;
            var libraryCell = await FindCellStampAsync(cellId, ct);
            if (cell?.CellId is not null && libraryCell is null)
            {
                errors.Add(new ValidationError("cellId", "There is no such cell in the library."));
            }

            var customerId = owner is null ? design.CustomerId : await ResolveOwnerAsync(owner.CustomerId, owner.JobId, errors, ct);
            var result = Evaluate(input, errors);
            if (errors.Count > 0 || result is null)
            {
                db.ChangeTracker.Clear();
                return StoreResult<DesignDetails>.Invalid(errors);
            }

            if (owner is not null)
            {
                design.CustomerId = customerId;
                design.JobId = owner.JobId;
            }

            return await AppendRevisionAsync(design, basedOnRevision, input, result, libraryCell, libraryCell?.Id, user, cleanNote, newName, ct);
        });

    /// <summary>Copies the input of revision <paramref name="revisionNumber"/> into a new revision (re-evaluated with today's rules).</summary>
    public Task<StoreResult<DesignDetails>> RestoreRevisionAsync(int designId, int revisionNumber, int basedOnRevision,
        string createdBy, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var old = await db.DesignRevisions.AsNoTracking()
                .Where(r => r.DesignId == designId && r.Number == revisionNumber)
                .Select(r => new { r.InputJson, r.LibraryCellId, r.LibraryCellUpdatedUtc, r.LibraryCellName })
                .FirstOrDefaultAsync(ct);
            var design = await db.Designs.FirstOrDefaultAsync(d => d.Id == designId, ct);
            if (design is null || old is null)
            {
                db.ChangeTracker.Clear();
                return design is null
                    ? NotFound<DesignDetails>(designId)
                    : StoreResult<DesignDetails>.NotFound(Text($"Design {designId} has no revision {revisionNumber}."));
            }

            if (design.LatestRevisionNumber != basedOnRevision)
            {
                db.ChangeTracker.Clear();
                return StaleRevision<DesignDetails>(design.LatestRevisionNumber, basedOnRevision);
            }

            var errors = new List<ValidationError>();
            var user = TextRules.Required(errors, "createdBy", createdBy, FieldLengths.UserName, "who saves the revision");
            var input = CanonicalDesignJson.Deserialize(old.InputJson);
            var result = Evaluate(input, errors);
            if (errors.Count > 0 || result is null)
            {
                db.ChangeTracker.Clear();
                return StoreResult<DesignDetails>.Invalid(errors);
            }

            // The restored figures are those of the old revision, so keep its snapshot of the library cell.
            var stamp = old.LibraryCellId is { } id ? new CellStamp(id, old.LibraryCellUpdatedUtc, old.LibraryCellName) : null;
            var stillInLibrary = stamp is not null && await db.Cells.AnyAsync(c => c.Id == stamp.Id, ct);
            return await AppendRevisionAsync(design, basedOnRevision, input, result, stamp, stillInLibrary ? stamp!.Id : null, user,
                Text($"Restored from revision {revisionNumber}."), null, ct);
        });

    /// <summary>A new design with revision 1 holding the latest input of <paramref name="designId"/>, same links.</summary>
    public Task<StoreResult<DesignDetails>> DuplicateAsync(int designId, string? newName, string createdBy, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var source = await db.Designs.AsNoTracking()
                .Where(d => d.Id == designId)
                .Select(d => new
                {
                    d.Name,
                    d.CustomerId,
                    d.JobId,
                    d.CellId,
                    d.LatestRevisionNumber,
                    InputJson = d.Revisions.Where(r => r.Number == d.LatestRevisionNumber).Select(r => r.InputJson).FirstOrDefault(),
                })
                .FirstOrDefaultAsync(ct);
            if (source?.InputJson is null)
            {
                return NotFound<DesignDetails>(designId);
            }

            var name = newName ?? TextRules.Truncate(source.Name, FieldLengths.Name - 7) + " (copy)";
            var input = CanonicalDesignJson.Deserialize(source.InputJson);
            return await CreateCoreAsync(name, source.CustomerId, source.JobId, source.CellId, input, createdBy,
                Text($"Duplicated from design {designId}, revision {source.LatestRevisionNumber}."), ct);
        });

    /// <summary>Renames a design or changes its customer and job (no new revision: the figures are unchanged).</summary>
    public Task<StoreResult<DesignDetails>> UpdateDesignInfoAsync(int designId, string name, int? customerId, int? jobId,
        CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var design = await db.Designs.FirstOrDefaultAsync(d => d.Id == designId, ct);
            if (design is null)
            {
                return NotFound<DesignDetails>(designId);
            }

            var errors = new List<ValidationError>();
            var cleanName = TextRules.Required(errors, "name", name, FieldLengths.Name, "a design name");
            var owner = await ResolveOwnerAsync(customerId, jobId, errors, ct);
            if (errors.Count > 0)
            {
                db.ChangeTracker.Clear();
                return StoreResult<DesignDetails>.Invalid(errors);
            }

            design.Name = cleanName;
            design.CustomerId = owner;
            design.JobId = jobId;
            design.UpdatedUtc = UtcClock.Now(clock);
            if (await TrySaveAsync(ct) is { } refused)
            {
                return StoreResult<DesignDetails>.Conflict(refused);
            }

            return await GetCoreAsync(designId, ct);
        });

    /// <summary>
    /// Records a status change of a revision: draft → submitted (latest revision only), submitted → signedOff or
    /// returned. Nothing is updated: a new status-change row is added.
    /// </summary>
    public Task<StoreResult<RevisionDetails>> ChangeStatusAsync(int designId, int revisionNumber, RevisionStatus status,
        string changedBy, string? note = null, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var rev = await db.DesignRevisions.AsNoTracking()
                .Where(r => r.DesignId == designId && r.Number == revisionNumber)
                .Select(r => new
                {
                    r.Id,
                    Latest = r.Design!.LatestRevisionNumber,
                    Last = r.StatusChanges.OrderByDescending(s => s.Sequence).Select(s => new { s.Sequence, s.Status }).FirstOrDefault(),
                })
                .FirstOrDefaultAsync(ct);
            if (rev is null)
            {
                return StoreResult<RevisionDetails>.NotFound(Text($"Design {designId} has no revision {revisionNumber}."));
            }

            var errors = new List<ValidationError>();
            var user = TextRules.Required(errors, "changedBy", changedBy, FieldLengths.UserName, "who changes the status");
            var cleanNote = TextRules.Optional(errors, "note", note, FieldLengths.Note);
            var from = rev.Last?.Status ?? RevisionStatus.Draft;
            var allowed = (from, status) switch
            {
                (RevisionStatus.Draft, RevisionStatus.Submitted) => revisionNumber == rev.Latest,
                (RevisionStatus.Submitted, RevisionStatus.SignedOff or RevisionStatus.Returned) => true,
                _ => false,
            };
            if (!allowed)
            {
                errors.Add(new ValidationError("status", from == RevisionStatus.Draft && status == RevisionStatus.Submitted
                    ? "Only the latest revision can be submitted."
                    : $"A revision that is {Describe(from)} cannot become {Describe(status)}."));
            }

            if (errors.Count > 0)
            {
                return StoreResult<RevisionDetails>.Invalid(errors);
            }

            db.DesignRevisionStatusChanges.Add(new DesignRevisionStatusChange
            {
                RevisionId = rev.Id,
                Sequence = (rev.Last?.Sequence ?? 0) + 1,
                Status = status,
                ChangedBy = user,
                ChangedUtc = UtcClock.Now(clock),
                Note = cleanNote,
            });
            if (await TrySaveAsync(ct) is not null)
            {
                return StoreResult<RevisionDetails>.Conflict("Someone else changed this revision's status first. Reload to see it; nothing was saved.");
            }

            var details = await LoadRevisionAsync(designId, revisionNumber, ct);
            return StoreResult<RevisionDetails>.Ok(details!);
        });

    /// <summary>A design with its latest revision.</summary>
    public Task<StoreResult<DesignDetails>> GetDesignAsync(int designId, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(() => GetCoreAsync(designId, ct));

    /// <summary>The revision history of a design, newest first.</summary>
    public Task<StoreResult<IReadOnlyList<RevisionSummary>>> GetRevisionsAsync(int designId, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            if (!await db.Designs.AnyAsync(d => d.Id == designId, ct))
            {
                return NotFound<IReadOnlyList<RevisionSummary>>(designId);
            }

            var list = await db.DesignRevisions.AsNoTracking()
                .Where(r => r.DesignId == designId)
                .OrderByDescending(r => r.Number)
                .Select(r => new RevisionSummary(
                    r.Id,
                    r.Number,
                    r.Series,
                    r.Parallel,
                    r.StatusChanges.OrderByDescending(s => s.Sequence).Select(s => s.Status).FirstOrDefault(),
                    r.Note,
                    r.CreatedUtc,
                    r.CreatedBy,
                    r.InputSha256,
                    r.CalculationVersion))
                .ToListAsync(ct);
            return StoreResult<IReadOnlyList<RevisionSummary>>.Ok(list);
        });

    /// <summary>One revision with its input, result JSON, status history and library cell state.</summary>
    public Task<StoreResult<RevisionDetails>> GetRevisionAsync(int designId, int revisionNumber, CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            var details = await LoadRevisionAsync(designId, revisionNumber, ct);
            return details is null
                ? StoreResult<RevisionDetails>.NotFound(Text($"Design {designId} has no revision {revisionNumber}."))
                : StoreResult<RevisionDetails>.Ok(details);
        });

    /// <summary>
    /// One page of designs. <paramref name="search"/> matches, case-insensitively, a part of the design's name,
    /// its customer's name or its library cell's name, maker or model. Filtering, sorting and paging run in SQL, in
    /// one query for the rows and one for the count. <paramref name="page"/> starts at 1; the page size is 1–100.
    /// </summary>
    public Task<PagedResult<DesignRow>> ListDesignsAsync(string? search, DesignSort sort, int page, int pageSize,
        CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            page = Math.Max(1, page);
            pageSize = Math.Clamp(pageSize, 1, MaxPageSize);
            var query = db.Designs.AsNoTracking();
            if (!string.IsNullOrWhiteSpace(search))
            {
                var key = ISearchable.KeyFor(search);
                query = query.Where(d => d.SearchKey.Contains(key)
                    || (d.Customer != null && d.Customer.SearchKey.Contains(key))
                    || (d.Cell != null && d.Cell.SearchKey.Contains(key)));
            }

            return await PageOfAsync(query, sort, page, pageSize, ct);
        });

    /// <summary>
    /// One page of the designs of customer <paramref name="customerId"/> (a design under one of its jobs belongs to it too), in
    /// <paramref name="sort"/> order; NotFound when there is no such customer. Paging runs in SQL as for
    /// <see cref="ListDesignsAsync"/>.
    /// </summary>
    public Task<StoreResult<PagedResult<DesignRow>>> ListCustomerDesignsAsync(int customerId, DesignSort sort, int page, int pageSize,
        CancellationToken ct = default) =>
        StorageFailure.GuardAsync(async () =>
        {
            if (!await db.Customers.AnyAsync(c => c.Id == customerId, ct))
            {
                return StoreResult<PagedResult<DesignRow>>.NotFound(Text($"There is no customer {customerId}."));
            }

            page = Math.Max(1, page);
            pageSize = Math.Clamp(pageSize, 1, MaxPageSize);
            var query = db.Designs.AsNoTracking().Where(d => d.CustomerId == customerId);
            return StoreResult<PagedResult<DesignRow>>.Ok(await PageOfAsync(query, sort, page, pageSize, ct));
        });

    /// <summary>The rows of one page of <paramref name="query"/> and its total count: two queries, latest-revision figures included.</summary>
    private async Task<PagedResult<DesignRow>> PageOfAsync(IQueryable<Design> query, DesignSort sort, int page, int pageSize, CancellationToken ct)
    {
        var total = await query.CountAsync(ct);
        var rows = await Sort(query, sort)
            .Skip((page - 1) * pageSize)
            .Take(pageSize)
            .Select(d => new DesignRow(
                d.Id,
                d.Name,
                d.CustomerId,
                d.Customer!.Name,
                d.JobId,
                d.Job!.Title,
                d.CellId,
                d.Cell!.Name,
                d.LatestRevisionNumber,
                d.Revisions.Where(r => r.Number == d.LatestRevisionNumber).Select(r => r.Series).FirstOrDefault(),
                d.Revisions.Where(r => r.Number == d.LatestRevisionNumber).Select(r => r.Parallel).FirstOrDefault(),
                d.Revisions.Where(r => r.Number == d.LatestRevisionNumber)
                    .SelectMany(r => r.StatusChanges)
                    .OrderByDescending(s => s.Sequence)
                    .Select(s => s.Status)
                    .FirstOrDefault(),
                d.CreatedUtc,
                d.UpdatedUtc))
            .ToListAsync(ct);
        return new PagedResult<DesignRow>(rows, total, page, pageSize);
    }

    private async Task<StoreResult<DesignDetails>> CreateCoreAsync(string name, int? customerId, int? jobId, int? cellId,
        DesignInput input, string createdBy, string? note, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        var errors = new List<ValidationError>();
        var cleanName = TextRules.Required(errors, "name", name, FieldLengths.Name, "a design name");
        var user = TextRules.Required(errors, "createdBy", createdBy, FieldLengths.UserName, "who saves the design");
        var owner = await ResolveOwnerAsync(customerId, jobId, errors, ct);
        var libraryCell = await FindCellStampAsync(cellId, ct);
        if (cellId is not null && libraryCell is null)
        {
            errors.Add(new ValidationError("cellId", "There is no such cell in the library."));
        }

        var result = Evaluate(input, errors);
        if (errors.Count > 0 || result is null)
        {
            return StoreResult<DesignDetails>.Invalid(errors);
        }

        var now = UtcClock.Now(clock);
        var design = new Design
        {
            Name = cleanName,
            CustomerId = owner,
            JobId = jobId,
            CellId = cellId,
            CreatedUtc = now,
            UpdatedUtc = now,
            LatestRevisionNumber = 1,
        };
        design.Revisions.Add(NewRevision(1, input, result, libraryCell, user, note, now));
        db.Designs.Add(design);
        if (await TrySaveAsync(ct) is { } refused)
        {
            return StoreResult<DesignDetails>.Conflict(refused);
        }

        return await GetCoreAsync(design.Id, ct);
    }

    private async Task<StoreResult<DesignDetails>> AppendRevisionAsync(Design design, int basedOnRevision, DesignInput input,
        EvaluationResult result, CellStamp? libraryCell, int? cellId, string user, string? note, string? newName, CancellationToken ct)
    {
        var now = UtcClock.Now(clock);
        var number = basedOnRevision + 1;
        // Tracked with LatestRevisionNumber = basedOnRevision as its original value: the UPDATE checks it.
        design.LatestRevisionNumber = number;
        design.UpdatedUtc = now;
        design.CellId = cellId;
        if (newName is not null)
        {
            design.Name = newName;
        }

        var revision = NewRevision(number, input, result, libraryCell, user, note, now);
        revision.DesignId = design.Id;
        db.DesignRevisions.Add(revision);
        if (await TrySaveAsync(ct) is { } refused)
        {
            return StoreResult<DesignDetails>.Conflict(refused == ConcurrentSave
                ? Text($"Revision {number} of this design was saved by someone else first. Reload the design to see it; nothing was saved.")
                : refused);
        }

        return await GetCoreAsync(design.Id, ct);
    }

    private static DesignRevision NewRevision(int number, DesignInput input, EvaluationResult result, CellStamp? libraryCell,
        string user, string? note, DateTime now)
    {
        var json = CanonicalDesignJson.Serialize(input);
        var revision = new DesignRevision
        {
            Number = number,
            InputJson = json,
            InputSha256 = CanonicalDesignJson.Sha256Hex(json),
            ResultJson = CanonicalDesignJson.SerializeResult(result),
            CalculationVersion = result.CalculationVersion,
            Series = input.Series,
            Parallel = input.Parallel,
            Status = RevisionStatus.Draft,
            Note = note,
            CreatedUtc = now,
            CreatedBy = user,
            LibraryCellId = libraryCell?.Id,
            LibraryCellUpdatedUtc = libraryCell?.UpdatedUtc,
            LibraryCellName = libraryCell?.Name,
        };
        revision.StatusChanges.Add(new DesignRevisionStatusChange
        {
            Sequence = 1,
            Status = RevisionStatus.Draft,
            ChangedBy = user,
            ChangedUtc = now,
            Note = "Saved.",
        });
        return revision;
    }

    /// <summary>
    /// Saves; returns null when saved, else why a concurrent change refused it (a concurrency token, the unique
    /// revision number, or a linked customer, job or cell deleted meanwhile). The tracker is cleared on any failure.
    /// </summary>
    private async Task<string?> TrySaveAsync(CancellationToken ct)
    {
        try
        {
            await db.SaveChangesAsync(ct);
            return null;
        }
        catch (DbUpdateConcurrencyException)
        {
            db.ChangeTracker.Clear();
            return ConcurrentSave;
        }
        catch (DbUpdateException ex) when (StorageFailure.IsUniqueViolation(ex))
        {
            db.ChangeTracker.Clear();
            return ConcurrentSave;
        }
        catch (DbUpdateException ex) when (StorageFailure.IsForeignKeyViolation(ex))
        {
            db.ChangeTracker.Clear();
            return "A customer, job or library cell this design refers to was deleted meanwhile. Reload and try again; nothing was saved.";
        }
        catch
        {
            db.ChangeTracker.Clear();
            throw;
        }
    }

    private const string ConcurrentSave = "Someone else saved first.";

    private async Task<StoreResult<DesignDetails>> GetCoreAsync(int designId, CancellationToken ct)
    {
        var d = await db.Designs.AsNoTracking()
            .Where(x => x.Id == designId)
            .Select(x => new
            {
                x.Id,
                x.Name,
                x.CustomerId,
                CustomerName = x.Customer!.Name,
                x.JobId,
                JobTitle = x.Job!.Title,
                x.CellId,
                CellName = x.Cell!.Name,
                x.CreatedUtc,
                x.UpdatedUtc,
                x.LatestRevisionNumber,
            })
            .FirstOrDefaultAsync(ct);
        if (d is null)
        {
            return NotFound<DesignDetails>(designId);
        }

        var latest = await LoadRevisionAsync(designId, d.LatestRevisionNumber, ct)
            ?? throw new InvalidOperationException(Text($"Design {designId} has no row for its latest revision {d.LatestRevisionNumber}."));
        return StoreResult<DesignDetails>.Ok(new DesignDetails(d.Id, d.Name, d.CustomerId, d.CustomerName, d.JobId, d.JobTitle,
            d.CellId, d.CellName, d.CreatedUtc, d.UpdatedUtc, d.LatestRevisionNumber, latest));
    }

    private async Task<RevisionDetails?> LoadRevisionAsync(int designId, int number, CancellationToken ct)
    {
        var r = await db.DesignRevisions.AsNoTracking()
            .Where(x => x.DesignId == designId && x.Number == number)
            .Select(x => new
            {
                Revision = x,
                Latest = x.Design!.LatestRevisionNumber,
                CellUpdatedUtc = db.Cells.Where(c => c.Id == x.LibraryCellId).Select(c => (DateTime?)c.UpdatedUtc).FirstOrDefault(),
            })
            .FirstOrDefaultAsync(ct);
        if (r is null)
        {
            return null;
        }

        var history = await db.DesignRevisionStatusChanges.AsNoTracking()
            .Where(s => s.RevisionId == r.Revision.Id)
            .OrderBy(s => s.Sequence)
            .Select(s => new StatusChangeDetails(s.Sequence, s.Status, s.ChangedBy, s.ChangedUtc, s.Note))
            .ToListAsync(ct);
        var x = r.Revision;
        LibraryCellSnapshot? snapshot = null;
        if (x.LibraryCellId is { } cellId)
        {
            var state = r.CellUpdatedUtc is null ? LibraryCellState.Deleted
                : r.CellUpdatedUtc == x.LibraryCellUpdatedUtc ? LibraryCellState.Unchanged
                : LibraryCellState.ChangedSince;
            snapshot = new LibraryCellSnapshot(cellId, x.LibraryCellName, x.LibraryCellUpdatedUtc, state);
        }

        return new RevisionDetails(x.Id, x.DesignId, x.Number, x.Number == r.Latest, CanonicalDesignJson.Deserialize(x.InputJson),
            x.InputJson, x.InputSha256, x.ResultJson, x.CalculationVersion, history.Count > 0 ? history[^1].Status : x.Status,
            x.Note, x.CreatedUtc, x.CreatedBy, snapshot, history);
    }

    /// <summary>Checks the customer and job; a job alone implies its customer. Returns the customer id to store.</summary>
    private async Task<int?> ResolveOwnerAsync(int? customerId, int? jobId, List<ValidationError> errors, CancellationToken ct)
    {
        if (customerId is { } c && !await db.Customers.AnyAsync(x => x.Id == c, ct))
        {
            errors.Add(new ValidationError("customerId", "There is no such customer."));
        }

        if (jobId is not { } j)
        {
            return customerId;
        }

        var jobCustomer = await db.Jobs.AsNoTracking().Where(x => x.Id == j).Select(x => (int?)x.CustomerId).FirstOrDefaultAsync(ct);
        if (jobCustomer is null)
        {
            errors.Add(new ValidationError("jobId", "There is no such job."));
            return customerId;
        }

        if (customerId is not null && customerId != jobCustomer)
        {
            errors.Add(new ValidationError("jobId", "The job belongs to another customer."));
        }

        return jobCustomer;
    }

    private async Task<CellStamp?> FindCellStampAsync(int? cellId, CancellationToken ct) =>
        cellId is not { } id
            ? null
            : await db.Cells.AsNoTracking().Where(c => c.Id == id).Select(c => new CellStamp(c.Id, c.UpdatedUtc, c.Name)).FirstOrDefaultAsync(ct);

    private static EvaluationResult? Evaluate(DesignInput input, List<ValidationError> errors)
    {
        var outcome = DesignEvaluator.Evaluate(input);
        errors.AddRange(outcome.Errors);
        return outcome.Result;
    }

    private static IQueryable<Design> Sort(IQueryable<Design> q, DesignSort sort) => sort switch
    {
        DesignSort.UpdatedNewest => q.OrderByDescending(d => d.UpdatedUtc).ThenByDescending(d => d.Id),
        DesignSort.UpdatedOldest => q.OrderBy(d => d.UpdatedUtc).ThenBy(d => d.Id),
        DesignSort.NameAscending => q.OrderBy(d => d.SearchKey).ThenBy(d => d.Id),
        DesignSort.NameDescending => q.OrderByDescending(d => d.SearchKey).ThenByDescending(d => d.Id),
        DesignSort.CustomerAscending => q.OrderBy(d => d.CustomerId == null).ThenBy(d => d.Customer!.SearchKey).ThenBy(d => d.Id),
        DesignSort.CustomerDescending => q.OrderBy(d => d.CustomerId == null).ThenByDescending(d => d.Customer!.SearchKey).ThenByDescending(d => d.Id),
        DesignSort.CellAscending => q.OrderBy(d => d.CellId == null).ThenBy(d => d.Cell!.SearchKey).ThenBy(d => d.Id),
        DesignSort.CellDescending => q.OrderBy(d => d.CellId == null).ThenByDescending(d => d.Cell!.SearchKey).ThenByDescending(d => d.Id),
        DesignSort.CreatedNewest => q.OrderByDescending(d => d.CreatedUtc).ThenByDescending(d => d.Id),
        DesignSort.CreatedOldest => q.OrderBy(d => d.CreatedUtc).ThenBy(d => d.Id),
        _ => throw new ArgumentOutOfRangeException(nameof(sort), sort, "Unknown sort order."),
    };

    private static StoreResult<T> NotFound<T>(int designId) => StoreResult<T>.NotFound(Text($"There is no design {designId}."));

    private static StoreResult<T> StaleRevision<T>(int latest, int basedOn) => StoreResult<T>.Conflict(Text(
        $"This design has revision {latest} now, saved after revision {basedOn} that your changes are based on. Reload it to see the changes; nothing was saved."));

    private static string Describe(RevisionStatus s) => s switch
    {
        RevisionStatus.SignedOff => "signed off",
        _ => s.ToString().ToLowerInvariant(),
    };

    private static string Text(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);

    private sealed record CellStamp(int Id, DateTime? UpdatedUtc, string? Name);
}
