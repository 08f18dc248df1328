using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Standards;
using PackDesigner.Core.Thermal;

namespace PackDesigner.Core.Evaluation;

/// <summary>
/// The validated design with its derived electrical constants, shared by the calculators.
/// Resistances in Ω, SOC as fractions.
/// </summary>
public sealed record PackContext(
    DesignInput Input,
    CellSpec Cell,
    MarginsInput Margins,
    double CellResistanceOhm,
    double CellResistanceColdOhm,
    double CellResistanceHotOhm,
    bool ColdResistanceEstimated,
    double LinksOhm,
    double? CableOhm)
{
    public int S => Input.Series;
    public int P => Input.Parallel;
    public double SocLow => Input.SocWindow.MinPercent / 100.0;
    public double SocHigh => Input.SocWindow.MaxPercent / 100.0;
    public double GroupCapacityAh => Cell.CapacityAh * P;

    /// <summary>Weakest group at the low end of the capacity tolerance; for S = 1 there is no other group to differ from.</summary>
    public double WeakestGroupCapacityAh => S == 1 ? GroupCapacityAh : GroupCapacityAh * (1 - Cell.CapacityTolerancePercent / 100.0);

    /// <summary>Links and cable, Ω.</summary>
    public double ExternalOhm => LinksOhm + (CableOhm ?? 0);

    /// <summary>Pack resistance at 25 °C: S·R_cell/P + links + cable, Ω.</summary>
    public double PackResistanceOhm => S * CellResistanceOhm / P + ExternalOhm;

    /// <summary>Pack resistance at the coldest ambient, Ω.</summary>
    public double PackResistanceColdOhm => S * CellResistanceColdOhm / P + ExternalOhm;

    public static PackContext Create(DesignInput input, CellSpec cell)
    {
        var r25 = cell.InternalResistanceMilliohm / 1000.0;
        var estimated = cell.ColdInternalResistanceMilliohm is null;
        var ea = estimated
            ? Arrhenius.DefaultResistanceActivationEnergyJPerMol
            : Arrhenius.ActivationEnergyFromResistances(cell.InternalResistanceMilliohm, cell.ColdInternalResistanceMilliohm!.Value, cell.ColdResistanceTemperatureC!.Value);
        var coldest = Math.Min(input.Ambient.MinC, Arrhenius.ReferenceC);
        var hottest = Math.Max(input.Ambient.MaxC, Arrhenius.ReferenceC);
        var cable = input.Cable is { } c ? Conductors.CopperResistanceOhm(c.CrossSectionMm2, c.LengthM) : (double?)null;
        return new PackContext(
            input,
            cell,
            input.Margins ?? new MarginsInput(),
            r25,
            Arrhenius.ResistanceAt(r25, ea, coldest),
            Arrhenius.ResistanceAt(r25, ea, hottest),
            estimated,
            Math.Max(0, input.Series - 1) * input.LinkResistanceMilliohm / 1000.0,
            cable);
    }
}
