namespace PackDesigner.Core.Curves;

/// <summary>One row of an open-circuit-voltage table: state of charge in % (0–100) and rest voltage in V.</summary>
public sealed record OcvPoint(double SocPercent, double Voltage);
