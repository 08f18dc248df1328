using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>Charger setpoints and the end-of-charge state they lead to.</summary>
internal sealed class ChargerSection : ISheetSection
{
    public string Title => "Charger settings";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        layout.Table(Settings(Title, model.ChargerSettings));
        layout.SubHeading("Expected at the end of charge");
        layout.Table(Settings("Expected at the end of charge", model.EndOfCharge));
    }

    internal static SheetTable Settings(string title, IReadOnlyList<SettingRow> rows) => new(
        title,
        [new("Setting", 1.6), new("Value", 0.8, ColumnAlign.Right, Bold: true), new("Note", 2)],
        rows.Select(r => SheetTableRow.Of(r.Label, r.Value.Text, r.Note ?? "")).ToList());
}
