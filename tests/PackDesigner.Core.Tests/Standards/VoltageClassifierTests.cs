using PackDesigner.Core.Standards;

namespace PackDesigner.Core.Tests.Standards;

public sealed class VoltageClassifierTests
{
    [Theory]
    [InlineData(3.65, VoltageClass.A)]
    [InlineData(60.0, VoltageClass.A)]
    [InlineData(60.01, VoltageClass.B)]
    [InlineData(400, VoltageClass.B)]
    [InlineData(1500, VoltageClass.B)]
    [InlineData(1500.01, VoltageClass.AboveB)]
    public void Classify_DcVoltage_ReturnsIso6469Class(double volts, VoltageClass expected)
    {
        // ISO 6469-3 voltage classes: A ≤ 60 V DC; B above 60 V up to 1500 V DC (high, from memory).
        Assert.Equal(expected, VoltageClassifier.Classify(volts));
    }

    [Fact]
    public void Limits_Values_AreIso6469Boundaries()
    {
        Reference.AssertClose(60.0, VoltageClassifier.ClassALimitVdc, 0, "ISO 6469-3: class A up to 60 V DC");
        Reference.AssertClose(1500.0, VoltageClassifier.ClassBLimitVdc, 0, "ISO 6469-3: class B up to 1500 V DC");
    }
}
