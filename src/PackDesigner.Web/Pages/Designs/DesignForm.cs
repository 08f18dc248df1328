using System.ComponentModel.DataAnnotations;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// The design form as typed: every value is kept as text so that it is shown back exactly as entered and parsed
/// with the invariant culture by <see cref="DesignFormMapper"/>. Property names mirror the API's field paths
/// (<c>Input.Controller.MaxVoltage</c> ↔ <c>controller.maxVoltage</c>), see <see cref="FormFieldPaths"/>.
/// </summary>
public sealed class DesignForm
{
    [Display(Name = "Cell")]
    public CellForm Cell { get; set; } = new();

    [Display(Name = "Cells in series (S)")]
    public string? Series { get; set; }

    [Display(Name = "Cells in parallel (P)")]
    public string? Parallel { get; set; }

    [Display(Name = "Series link resistance")]
    public string? LinkResistanceMilliohm { get; set; }

    [Display(Name = "Main cable")]
    public CableForm Cable { get; set; } = new();

    [Display(Name = "Balancing")]
    public string? Balancing { get; set; }

    [Display(Name = "Operating window")]
    public SocWindowForm SocWindow { get; set; } = new();

    [Display(Name = "Controller")]
    public ControllerForm Controller { get; set; } = new();

    [Display(Name = "Charger")]
    public ChargerForm Charger { get; set; } = new();

    [Display(Name = "Ambient")]
    public AmbientForm Ambient { get; set; } = new();

    [Display(Name = "Margins")]
    public MarginsForm Margins { get; set; } = new();
}

public sealed class CellForm
{
    [Display(Name = "Chemistry")]
    public string? Chemistry { get; set; }

    [Display(Name = "Capacity")]
    public string? CapacityAh { get; set; }

    [Display(Name = "Nominal voltage")]
    public string? NominalVoltage { get; set; }

    [Display(Name = "Maximum charge voltage")]
    public string? MaxChargeVoltage { get; set; }

    [Display(Name = "Minimum discharge voltage")]
    public string? MinDischargeVoltage { get; set; }

    [Display(Name = "Maximum continuous charge current")]
    public string? MaxChargeCurrentA { get; set; }

    [Display(Name = "Maximum continuous discharge current")]
    public string? MaxDischargeCurrentA { get; set; }

    [Display(Name = "Peak discharge current")]
    public string? PeakDischargeCurrentA { get; set; }

    [Display(Name = "Peak discharge duration")]
    public string? PeakDischargeDurationS { get; set; }

    [Display(Name = "Internal resistance at 25 °C")]
    public string? InternalResistanceMilliohm { get; set; }

    [Display(Name = "Internal resistance when cold")]
    public string? ColdInternalResistanceMilliohm { get; set; }

    [Display(Name = "Temperature of the cold resistance")]
    public string? ColdResistanceTemperatureC { get; set; }

    [Display(Name = "Mass")]
    public string? MassKg { get; set; }

    [Display(Name = "Capacity tolerance")]
    public string? CapacityTolerancePercent { get; set; }

    [Display(Name = "Charge temperature, lowest")]
    public string? ChargeTemperatureMinC { get; set; }

    [Display(Name = "Charge temperature, highest")]
    public string? ChargeTemperatureMaxC { get; set; }

    [Display(Name = "Discharge temperature, lowest")]
    public string? DischargeTemperatureMinC { get; set; }

    [Display(Name = "Discharge temperature, highest")]
    public string? DischargeTemperatureMaxC { get; set; }

    [Display(Name = "Charge termination current")]
    public string? TerminationCurrentA { get; set; }

    /// <summary>One "socPercent,voltage" row per line; blank for the chemistry's typical curve.</summary>
    [Display(Name = "Open-circuit voltage table")]
    public string? OcvTable { get; set; }
}

public sealed class CableForm
{
    [Display(Name = "Cross-section")]
    public string? CrossSectionMm2 { get; set; }

    [Display(Name = "Length, both conductors")]
    public string? LengthM { get; set; }
}

public sealed class SocWindowForm
{
    [Display(Name = "Lowest state of charge")]
    public string? MinPercent { get; set; }

    [Display(Name = "Highest state of charge")]
    public string? MaxPercent { get; set; }
}

public sealed class ControllerForm
{
    [Display(Name = "Minimum input voltage")]
    public string? MinVoltage { get; set; }

    [Display(Name = "Maximum input voltage")]
    public string? MaxVoltage { get; set; }

    [Display(Name = "Continuous current")]
    public string? ContinuousCurrentA { get; set; }

    [Display(Name = "Peak current")]
    public string? PeakCurrentA { get; set; }

    [Display(Name = "Peak duration")]
    public string? PeakDurationS { get; set; }

    [Display(Name = "Regenerative current")]
    public string? RegenCurrentA { get; set; }

    [Display(Name = "DC-link capacitance")]
    public string? DcLinkCapacitanceMicrofarad { get; set; }

    [Display(Name = "Precharge time to 95 %")]
    public string? PrechargeTimeS { get; set; }
}

public sealed class ChargerForm
{
    [Display(Name = "Maximum output voltage")]
    public string? MaxVoltage { get; set; }

    [Display(Name = "Maximum output current")]
    public string? MaxCurrentA { get; set; }

    [Display(Name = "Voltage setting step")]
    public string? VoltageStepV { get; set; }

    [Display(Name = "Has a float stage that cannot be switched off")]
    public bool FloatStage { get; set; }

    [Display(Name = "Target cell voltage")]
    public string? TargetCellVoltage { get; set; }
}

public sealed class AmbientForm
{
    [Display(Name = "Coldest ambient")]
    public string? MinC { get; set; }

    [Display(Name = "Hottest ambient")]
    public string? MaxC { get; set; }
}

public sealed class MarginsForm
{
    [Display(Name = "Over-voltage trip below the datasheet maximum")]
    public string? OverVoltageTripBelowMaxV { get; set; }

    [Display(Name = "Over-voltage release hysteresis")]
    public string? OverVoltageHysteresisV { get; set; }

    [Display(Name = "Under-voltage trip above the datasheet minimum")]
    public string? UnderVoltageTripAboveMinV { get; set; }

    [Display(Name = "Under-voltage release hysteresis")]
    public string? UnderVoltageHysteresisV { get; set; }

    [Display(Name = "Temperature trips inside the datasheet windows by")]
    public string? TemperatureMarginC { get; set; }

    [Display(Name = "Temperature release hysteresis")]
    public string? TemperatureHysteresisC { get; set; }

    [Display(Name = "Charger current below the BMS charge trip by")]
    public string? ChargeCurrentMarginPercent { get; set; }

    [Display(Name = "Short-circuit trip, multiple of the peak current")]
    public string? ShortCircuitTripFactor { get; set; }

    [Display(Name = "Over-voltage delay")]
    public string? OverVoltageDelayS { get; set; }

    [Display(Name = "Under-voltage delay")]
    public string? UnderVoltageDelayS { get; set; }

    [Display(Name = "Charge over-current delay")]
    public string? ChargeOverCurrentDelayS { get; set; }

    [Display(Name = "Short-circuit delay")]
    public string? ShortCircuitDelayMicroseconds { get; set; }
}
