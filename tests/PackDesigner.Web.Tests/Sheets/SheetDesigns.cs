using PackDesigner.Core.Design;
using PackDesigner.Web.Tests.Reports;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>Inputs and names for the sheet tests: the Reports tests' 24S2P test design (ours, not the demo data).</summary>
internal static class SheetDesigns
{
    /// <summary>A name with non-Latin letters and symbols, so every route shows it is carried as text, not bytes.</summary>
    public const string Name = "Test trailer é ü Ω ≤ 24S2P";

    public const string Customer = "Test customer Ødegård";

    public const string Job = "Test job 17 (≤ 90 V)";

    /// <summary>Bottom-balanced 24S2P LFP with a cable and a DC link, and one error finding.</summary>
    public static DesignInput Standard => new SheetTestDesign().Input;

    /// <summary>The standard design with one more cell in series, for a second revision that differs.</summary>
    public static DesignInput Changed => Standard with { Series = 25 };
}
