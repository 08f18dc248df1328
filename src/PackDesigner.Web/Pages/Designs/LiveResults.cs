namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// The results panel beside the design editor: the results, or why there are none. <see cref="ListProblems"/> is
/// true for the fragment the page's script fetches (the messages beside the fields are not refreshed then).
/// </summary>
public sealed record LiveResults(ResultSheet? Sheet, IReadOnlyList<SummaryError> Problems, bool ListProblems);

/// <summary>A save refused because someone else saved first; the user's input stays in the form.</summary>
public sealed record SaveConflict(int DesignId, string Message, int BasedOn, int? Latest);
