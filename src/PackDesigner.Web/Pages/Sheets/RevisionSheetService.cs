using System.Globalization;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Spread;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Json;
using PackDesigner.Data.Results;
using PackDesigner.Reports;
using PackDesigner.Reports.Model;

namespace PackDesigner.Web.Pages.Sheets;

/// <summary>How loading a revision's sheet ended.</summary>
public enum RevisionSheetState
{
    /// <summary>The sheet's model is ready to print.</summary>
    Ready,
    /// <summary>There is no such design, or the design has no such revision.</summary>
    NotFound,
    /// <summary>
    /// The revision was computed with other calculation rules than this build's: its figures are not printed with
    /// today's rules behind the user's back; restoring it as a new revision re-computes it openly.
    /// </summary>
    CalculationVersionDiffers,
}

/// <summary>The outcome of <see cref="RevisionSheetService.LoadAsync"/>: a model, or a message for a person.</summary>
public sealed record RevisionSheetResult(RevisionSheetState State, DesignSheetModel? Model, string? Message, string? StoredCalculationVersion = null)
{
    public static RevisionSheetResult Ready(DesignSheetModel model) => new(RevisionSheetState.Ready, model, null);

    public static RevisionSheetResult NotFound(string message) => new(RevisionSheetState.NotFound, null, message);

    public static RevisionSheetResult VersionDiffers(string message, string stored) =>
        new(RevisionSheetState.CalculationVersionDiffers, null, message, stored);
}

/// <summary>A stored revision that does not reproduce: a bug or tampering, never the user's doing (500, logged).</summary>
public sealed class SheetIntegrityException(string message) : Exception(message);

/// <summary>
/// Builds the design sheet of a saved revision. The stored input is evaluated again with Core's
/// <see cref="DesignEvaluator"/> (pure and deterministic), so the sheet is printed from the same numbers that were
/// saved, and the result is checked against the stored result JSON (serialized as the data layer stored it). The
/// sheet's time is the revision's, so one revision always prints the same sheet; the cell-spread analysis is run on
/// the stored input with the default (deterministic) settings. A database that cannot be
/// reached surfaces as the data layer's <c>StorageUnavailableException</c> (503 at the edges).
/// </summary>
public sealed class RevisionSheetService(DesignStore store)
{
    /// <summary>Loads design <paramref name="designId"/>'s revision <paramref name="revisionNumber"/> and builds its sheet model.</summary>
    /// <exception cref="SheetIntegrityException">The stored input, hash and result do not agree.</exception>
    public async Task<RevisionSheetResult> LoadAsync(int designId, int revisionNumber, CancellationToken ct = default)
    {
        var design = await store.GetDesignAsync(designId, ct);
        if (design.Status == StoreStatus.NotFound)
        {
            return RevisionSheetResult.NotFound(design.Message ?? Text($"There is no design {designId}."));
        }

        var d = design.Value ?? throw new InvalidOperationException(Text($"Loading design {designId} ended as {design.Status}."));
        var revision = d.LatestRevision;
        if (revision.Number != revisionNumber)
        {
            var found = await store.GetRevisionAsync(designId, revisionNumber, ct);
            if (found.Status == StoreStatus.NotFound)
            {
                return RevisionSheetResult.NotFound(found.Message ?? Text($"Design {designId} has no revision {revisionNumber}."));
            }

            revision = found.Value ?? throw new InvalidOperationException(Text($"Loading revision {revisionNumber} of design {designId} ended as {found.Status}."));
        }

        if (!string.Equals(revision.CalculationVersion, DesignEvaluator.CalculationVersion, StringComparison.Ordinal))
        {
            return RevisionSheetResult.VersionDiffers(VersionMessage(revision.Number, revision.CalculationVersion), revision.CalculationVersion);
        }

        var result = Reproduce(revision);
        var header = new SheetHeader(d.Name, d.CustomerName, d.JobTitle, revision.Number, revision.CreatedUtc,
            revision.CalculationVersion, revision.InputSha256, StatusName(revision.Status), SignOff(revision));
        return RevisionSheetResult.Ready(DesignSheetModel.Create(header, revision.Input, result, Spread(revision, ct)));
    }

    /// <summary>The message shown instead of a sheet computed with other rules.</summary>
    public static string VersionMessage(int revisionNumber, string storedVersion) => Text(
        $"Revision {revisionNumber} was computed with calculation version {storedVersion}; this PackDesigner computes with version {DesignEvaluator.CalculationVersion}. Its sheet is not printed with rules it was not computed with: restore it as a new revision to print it with the current rules.");

    /// <summary>The review status as the sheet prints it.</summary>
    public static string StatusName(RevisionStatus status) => status switch
    {
        RevisionStatus.Draft => "draft",
        RevisionStatus.Submitted => "submitted for review",
        RevisionStatus.SignedOff => "signed off",
        RevisionStatus.Returned => "returned for changes",
        _ => throw new ArgumentOutOfRangeException(nameof(status), status, "Unknown revision status."),
    };

    /// <summary>
    /// The sign-off from the status history: once the revision is signed off, the approval is that status change
    /// and "designed by" is whoever submitted it for review. No status change records a separate check yet (the
    /// review workflow will), so "checked by" stays blank for a signature by hand. A revision that is not signed
    /// off has no recorded signature and prints as a draft.
    /// </summary>
    public static SheetSignOff? SignOff(RevisionDetails revision)
    {
        ArgumentNullException.ThrowIfNull(revision);
        var history = revision.StatusHistory;
        if (history.Count == 0 || history[^1].Status is not (RevisionStatus.SignedOff or RevisionStatus.Submitted))
        {
            return null;
        }

        var approval = history[^1].Status == RevisionStatus.SignedOff ? history[^1] : null;
        var submitted = history.LastOrDefault(s => s.Status == RevisionStatus.Submitted);
        return new SheetSignOff(
            submitted is null ? null : new SignOffEntry(submitted.ChangedBy, submitted.ChangedUtc),
            null,
            approval is null ? null : new SignOffEntry(approval.ChangedBy, approval.ChangedUtc));
    }

    private static EvaluationResult Reproduce(RevisionDetails revision)
    {
        var where = Text($"Revision {revision.Number} of design {revision.DesignId}");
        if (!string.Equals(CanonicalDesignJson.Sha256Hex(revision.InputJson), revision.InputSha256, StringComparison.Ordinal))
        {
            throw new SheetIntegrityException($"{where}: the stored input does not hash to the stored input hash.");
        }

        var outcome = DesignEvaluator.Evaluate(revision.Input);
        if (outcome.Result is not { } result)
        {
            throw new SheetIntegrityException(
                $"{where}: the stored input no longer evaluates ({string.Join("; ", outcome.Errors.Select(e => e.Field + ": " + e.Message))}).");
        }

        if (!string.Equals(CanonicalDesignJson.SerializeResult(result), revision.ResultJson, StringComparison.Ordinal))
        {
            throw new SheetIntegrityException(
                $"{where}: re-computing its input with calculation version {result.CalculationVersion} does not give the stored result.");
        }

        return result;
    }

    /// <summary>
    /// The cell-spread analysis of the stored input with the default settings (fixed trials and seed, σ from the
    /// datasheet tolerance), so one revision always prints the same figures.
    /// </summary>
    private static SpreadResult Spread(RevisionDetails revision, CancellationToken ct)
    {
        var outcome = SpreadMonteCarlo.Analyze(new SpreadRequest { Design = revision.Input, Spread = new SpreadSettings() }, ct);
        return outcome.Result ?? throw new SheetIntegrityException(Text(
            $"Revision {revision.Number} of design {revision.DesignId}: the stored input evaluates but its spread analysis does not ({string.Join("; ", outcome.Errors.Select(e => e.Field + ": " + e.Message))})."));
    }

    private static string Text(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
