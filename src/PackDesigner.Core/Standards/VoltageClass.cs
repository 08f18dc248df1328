namespace PackDesigner.Core.Standards;

/// <summary>Voltage classes of ISO 6469-3: A up to 60 V DC, B above 60 V up to 1500 V DC.</summary>
public enum VoltageClass
{
    A,
    B,
    /// <summary>Above 1500 V DC: outside ISO 6469-3 class B.</summary>
    AboveB,
}

/// <summary>Classifies a DC working voltage per ISO 6469-3 (class A ≤ 60 V DC; class B 60–1500 V DC).</summary>
public static class VoltageClassifier
{
    public const double ClassALimitVdc = 60.0;
    public const double ClassBLimitVdc = 1500.0;

    public static VoltageClass Classify(double maxWorkingVoltageDc) =>
        maxWorkingVoltageDc <= ClassALimitVdc ? VoltageClass.A
        : maxWorkingVoltageDc <= ClassBLimitVdc ? VoltageClass.B
        : VoltageClass.AboveB;
}
