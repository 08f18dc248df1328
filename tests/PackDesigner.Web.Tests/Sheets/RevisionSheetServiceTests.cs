using PackDesigner.Core.Evaluation;
using PackDesigner.Data.Entities;
using PackDesigner.Reports.Formatting;
using PackDesigner.Reports.Model;
using PackDesigner.Web.Pages.Sheets;
using Microsoft.Extensions.DependencyInjection;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>The service that turns a stored revision into the sheet's model.</summary>
public sealed class RevisionSheetServiceTests(SheetAppFactory factory) : IClassFixture<SheetAppFactory>
{
    [Fact]
    public async Task LoadAsync_SavedRevision_HeaderFromTheStoredRevision()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard, SheetDesigns.Customer, SheetDesigns.Job);
        var revision = design.LatestRevision;

        var model = await factory.ModelAsync(design.Id, 1);

        Assert.Equal(SheetDesigns.Name, model.DesignName);
        Assert.Equal($"Customer: {design.CustomerName} · Job: {SheetDesigns.Job}", model.CustomerLine);
        Assert.Equal("Revision 1", model.RevisionText);
        // The sheet's time is the revision's, never the clock's.
        Assert.Equal(SheetFormatter.DateTimeUtc(revision.CreatedUtc), model.DateText);
        Assert.Equal(revision.CreatedUtc, model.Header.CreatedAtUtc);
        Assert.Equal("Calculation " + DesignEvaluator.CalculationVersion, model.CalculationText);
        Assert.Equal(revision.InputSha256, model.Header.InputHash);
        Assert.Equal(revision.InputSha256[..12], model.ShortInputHash);
        Assert.Contains(model.Identity, f => f.Key == "status" && f.Value == "draft");
        Assert.True(model.IsDraft);
    }

    [Fact]
    public async Task LoadAsync_OlderRevision_PrintsThatRevisionsInput()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var second = await factory.SaveRevisionAsync(design.Id, 1, SheetDesigns.Changed);

        var first = await factory.ModelAsync(design.Id, 1);
        var latest = await factory.ModelAsync(design.Id, 2);

        Assert.Equal(24, first.Input.Series);
        Assert.Equal(design.LatestRevision.InputSha256, first.Header.InputHash);
        Assert.Equal(25, latest.Input.Series);
        Assert.Equal(second.LatestRevision.InputSha256, latest.Header.InputHash);
        Assert.NotEqual(first.Header.InputHash, latest.Header.InputHash);
    }

    [Fact]
    public async Task LoadAsync_UnknownDesignOrRevision_NotFound()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        await using var scope = factory.Services.CreateAsyncScope();
        var service = scope.ServiceProvider.GetRequiredService<RevisionSheetService>();

        Assert.Equal(RevisionSheetState.NotFound, (await service.LoadAsync(design.Id, 2)).State);
        Assert.Equal(RevisionSheetState.NotFound, (await service.LoadAsync(design.Id, 0)).State);
        Assert.Equal(RevisionSheetState.NotFound, (await service.LoadAsync(int.MaxValue, 1)).State);
    }

    [Fact]
    public async Task LoadAsync_OtherCalculationVersion_SaysSoInsteadOfPrinting()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var number = await factory.InsertRevisionAsync(design.Id, "0.9.0");
        await using var scope = factory.Services.CreateAsyncScope();

        var sheet = await scope.ServiceProvider.GetRequiredService<RevisionSheetService>().LoadAsync(design.Id, number);

        Assert.Equal(RevisionSheetState.CalculationVersionDiffers, sheet.State);
        Assert.Null(sheet.Model);
        Assert.Equal("0.9.0", sheet.StoredCalculationVersion);
        Assert.Contains("computed with calculation version 0.9.0", sheet.Message, StringComparison.Ordinal);
        Assert.Contains("restore it as a new revision to print it with the current rules", sheet.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task LoadAsync_StoredResultDiffersFromTheRecomputedOne_ThrowsIntegrityError()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var number = await factory.InsertRevisionAsync(design.Id, DesignEvaluator.CalculationVersion, json => json.Replace("\"series\":24", "\"series\":23", StringComparison.Ordinal));
        await using var scope = factory.Services.CreateAsyncScope();
        var service = scope.ServiceProvider.GetRequiredService<RevisionSheetService>();

        var e = await Assert.ThrowsAsync<SheetIntegrityException>(() => service.LoadAsync(design.Id, number));
        Assert.Contains("does not give the stored result", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task LoadAsync_SubmittedRevision_DesignerRecordedButStillADraft()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        await factory.ChangeStatusAsync(design.Id, 1, RevisionStatus.Submitted, "Test designer");

        var model = await factory.ModelAsync(design.Id, 1);

        Assert.True(model.IsDraft);
        Assert.Equal(DesignSheetModel.DraftMarkingText, model.SignOffMarking);
        Assert.Contains(model.Identity, f => f.Key == "status" && f.Value == "submitted for review");
        Assert.Equal([true, false, false], model.SignOff.Select(l => l.Recorded));
        Assert.Equal("Test designer", model.SignOff[0].Name);
    }

    [Fact]
    public async Task LoadAsync_SignedOffRevision_ApprovalFromTheSignOffChange()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        await factory.ChangeStatusAsync(design.Id, 1, RevisionStatus.Submitted, "Test designer");
        await factory.ChangeStatusAsync(design.Id, 1, RevisionStatus.SignedOff, "Test approver");
        var history = (await factory.RevisionAsync(design.Id, 1)).StatusHistory;

        var model = await factory.ModelAsync(design.Id, 1);

        Assert.False(model.IsDraft);
        Assert.Equal($"Approved by Test approver on {SheetFormatter.DateUtc(history[^1].ChangedUtc)}", model.SignOffMarking);
        Assert.Equal(["Test designer", "", "Test approver"], model.SignOff.Select(l => l.Name));
        Assert.Contains(model.Identity, f => f.Key == "status" && f.Value == "signed off");
    }

    [Fact]
    public async Task LoadAsync_ReturnedRevision_NoSignatureAndADraft()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        await factory.ChangeStatusAsync(design.Id, 1, RevisionStatus.Submitted, "Test designer");
        await factory.ChangeStatusAsync(design.Id, 1, RevisionStatus.Returned, "Test checker");

        var model = await factory.ModelAsync(design.Id, 1);

        Assert.True(model.IsDraft);
        Assert.All(model.SignOff, l => Assert.False(l.Recorded));
        Assert.Contains(model.Identity, f => f.Key == "status" && f.Value == "returned for changes");
    }
}
