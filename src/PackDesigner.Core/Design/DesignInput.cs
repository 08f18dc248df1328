using PackDesigner.Core.Cells;

namespace PackDesigner.Core.Design;

/// <summary>How the string's cells are matched.</summary>
public enum BalancingMethod
{
    /// <summary>Cells matched at empty; charged conservatively so the smallest group never overshoots at the top.</summary>
    Bottom,
    /// <summary>Cells matched at full; the smallest group reaches empty first.</summary>
    Top,
}

/// <summary>Main pack cable: copper cross-section (mm²) and total conductor length, both ways (m).</summary>
public sealed record CableInput(double CrossSectionMm2, double LengthM);

/// <summary>The state-of-charge window the pack is used between, %.</summary>
public sealed record SocWindowInput(double MinPercent, double MaxPercent);

/// <summary>Motor controller or inverter limits. Voltages in V, currents in A, capacitance in µF, times in s.</summary>
public sealed record ControllerInput(
    double MinVoltage,
    double MaxVoltage,
    double ContinuousCurrentA,
    double PeakCurrentA,
    double PeakDurationS,
    double RegenCurrentA,
    double DcLinkCapacitanceMicrofarad,
    double PrechargeTimeS);

/// <summary>Charger limits. <see cref="TargetCellVoltage"/> (V per cell) replaces the window's top as the charge target.</summary>
public sealed record ChargerInput(
    double MaxVoltage,
    double MaxCurrentA,
    double VoltageStepV,
    bool FloatStage,
    double? TargetCellVoltage = null);

/// <summary>Coldest and hottest ambient temperature the pack will see, °C.</summary>
public sealed record AmbientInput(double MinC, double MaxC);

/// <summary>
/// Protection margins and hysteresis; every value has a default (common practice). Voltages in V per cell,
/// temperatures in K (°C differences), delays in s.
/// </summary>
public sealed record MarginsInput
{
    /// <summary>OV trip sits this far below the datasheet maximum charge voltage.</summary>
    public double OverVoltageTripBelowMaxV { get; init; } = 0.05;
    /// <summary>OV release sits this far below the OV trip (common practice 50–200 mV).</summary>
    public double OverVoltageHysteresisV { get; init; } = 0.10;
    /// <summary>UV trip sits this far above the datasheet minimum discharge voltage.</summary>
    public double UnderVoltageTripAboveMinV { get; init; } = 0.20;
    /// <summary>UV release sits this far above the UV trip (common practice 100–400 mV).</summary>
    public double UnderVoltageHysteresisV { get; init; } = 0.15;
    /// <summary>Temperature trips sit this far inside the datasheet windows.</summary>
    public double TemperatureMarginC { get; init; } = 2;
    /// <summary>Temperature release hysteresis (common practice about 5 °C).</summary>
    public double TemperatureHysteresisC { get; init; } = 5;
    /// <summary>The charger's CC stays this far below the BMS charge over-current trip, %.</summary>
    public double ChargeCurrentMarginPercent { get; init; } = 10;
    /// <summary>Short-circuit trip as a multiple of the peak discharge current.</summary>
    public double ShortCircuitTripFactor { get; init; } = 1.5;
    public double OverVoltageDelayS { get; init; } = 1;
    public double UnderVoltageDelayS { get; init; } = 2;
    public double ChargeOverCurrentDelayS { get; init; } = 10;
    public double ShortCircuitDelayMicroseconds { get; init; } = 300;
}

/// <summary>A pack design: the cell, the S×P configuration and the equipment around it.</summary>
public sealed record DesignInput
{
    public required CellInput Cell { get; init; }
    public required int Series { get; init; }
    public required int Parallel { get; init; }
    /// <summary>Resistance of each series link between groups (busbar plus contacts), mΩ.</summary>
    public double LinkResistanceMilliohm { get; init; }
    public CableInput? Cable { get; init; }
    public BalancingMethod Balancing { get; init; } = BalancingMethod.Bottom;
    public required SocWindowInput SocWindow { get; init; }
    public required ControllerInput Controller { get; init; }
    public required ChargerInput Charger { get; init; }
    public required AmbientInput Ambient { get; init; }
    public MarginsInput? Margins { get; init; }
}
