namespace PackDesigner.Reports.Formatting;

/// <summary>
/// A printed value: the number exactly as printed (invariant culture) and its unit, kept apart so that an export
/// can carry the same digits in one column and the unit in another. A word such as "off" has no unit and is not
/// numeric.
/// </summary>
public sealed record SheetValue(string Number, string Unit, bool IsNumeric = true)
{
    /// <summary>The value as printed on the sheet: number, a space, the unit (SI style, also for % and °C).</summary>
    public string Text => Unit.Length == 0 ? Number : Number + " " + Unit;

    /// <summary>A non-numeric value, for example "off".</summary>
    public static SheetValue Word(string text) => new(text, "", IsNumeric: false);

    public override string ToString() => Text;
}
