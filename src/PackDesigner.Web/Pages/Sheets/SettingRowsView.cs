using PackDesigner.Reports.Model;

namespace PackDesigner.Web.Pages.Sheets;

/// <summary>A table of setting rows (value and note) for <c>_SettingRows</c>; <see cref="TestId"/> marks each row.</summary>
public sealed record SettingRowsView(IReadOnlyList<SettingRow> Rows, string TestId);
