using PackDesigner.Core.Protection;

namespace PackDesigner.Core.Tests.Protection;

public sealed class ShortCircuitTests
{
    [Fact]
    public void ProspectiveCurrentA_96S2PWorkedExample_Gives4933A()
    {
        // REFERENCES.md worked example: 96S2P, 3.7 V, 1.5 mΩ → 72 mΩ, 4 933 A (Ohm's law).
        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PLoop, ShortCircuit.LoopResistanceOhm(96, 2, 1.5e-3, 0), 1e-14);
        var isc = ShortCircuit.ProspectiveCurrentA(96 * 3.7, 96, 2, 1.5e-3, 0);

        Reference.AssertClose(ReferenceValues.ShortCircuit96S2P, isc, 1e-13);
        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PPublished, isc, Reference.RoundingTolerance(4933, 4));
    }

    [Fact]
    public void ProspectiveCurrentA_96S2PWith10MilliohmExternal_Gives4332A()
    {
        var isc = ShortCircuit.ProspectiveCurrentA(96 * 3.7, 96, 2, 1.5e-3, 10e-3);

        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PWith10Milliohm, isc, 1e-13);
        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PWith10MilliohmPublished, isc, Reference.RoundingTolerance(4332, 4));
    }

    [Fact]
    public void ProspectiveCurrentA_16S1PLfpWorkedExample_Gives18Point3kA()
    {
        var isc = ShortCircuit.ProspectiveCurrentA(16 * 3.3, 16, 1, 0.18e-3, 0);

        Reference.AssertClose(ReferenceValues.ShortCircuit16S1P, isc, 1e-13);
        Reference.AssertClose(ReferenceValues.ShortCircuit16S1PPublished, isc, Reference.RoundingTolerance(18300, 3));
    }

    [Fact]
    public void ProspectiveCurrentA_SingleCell_IsCellVoltageOverCellResistance()
    {
        Reference.AssertClose(3.3 / 0.001, ShortCircuit.ProspectiveCurrentA(3.3, 1, 1, 0.001, 0), 1e-14, "Ohm's law, one cell");
    }
}
