namespace PackDesigner.Core.Protection;

/// <summary>Prospective short-circuit current of a string: I_sc = V_oc / (S·R_cell/P + R_external) (Ohm's law).</summary>
public static class ShortCircuit
{
    /// <summary>Loop resistance of the string, Ω.</summary>
    public static double LoopResistanceOhm(int series, int parallel, double cellResistanceOhm, double externalResistanceOhm) =>
        series * cellResistanceOhm / parallel + externalResistanceOhm;

    /// <summary>Prospective short-circuit current, A, for the pack's open-circuit voltage <paramref name="openCircuitVoltage"/> (V).</summary>
    public static double ProspectiveCurrentA(double openCircuitVoltage, int series, int parallel, double cellResistanceOhm, double externalResistanceOhm) =>
        openCircuitVoltage / LoopResistanceOhm(series, parallel, cellResistanceOhm, externalResistanceOhm);
}
