using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Charging;

/// <summary>
/// Closed-form checks on a straight-line curve V(s) = a + b·s (a = 3.0 V, b = 0.6 V), S = 4 groups, the weakest
/// 90 % of the others (r = C_n/C_w = 10/9), η = 10 mV per group and a 20 mV series drop.
/// Bottom-balanced, w = r·s, so the terminal voltage is
///   U(s) = (S−1)(a + b·s + η) + (a + b·r·s + η) + drop = S·a + S·η + drop + b·s·(S − 1 + r),
/// and U(s) = CV gives s = (CV − S·a − S·η − drop) / (b·(S − 1 + r)).
/// Top-balanced, w = 1 − (1 − s)·r, so U(s) = S·a + S·η + drop + b·(1 − r) + b·s·(S − 1 + r).
/// </summary>
public sealed class StringChargeModelTests
{
    private const double A = 3.0, B = 0.6, Eta = 0.01, Drop = 0.02, Nominal = 100, Weakest = 90;
    private const int S = 4;
    private const double R = Nominal / Weakest;

    private static StringChargeModel Model(BalancingMethod method, int series = S, double weakestAh = Weakest) =>
        new(TestCells.LinearCurve(A, A + B), series, Nominal, weakestAh, method, Eta, Drop);

    private const string BottomClosedForm = "hand-derived: s = (CV − S·a − S·η − drop)/(b·(S − 1 + r)), w = r·s";
    private const string TopClosedForm = "hand-derived: s = (CV − S·a − S·η − drop − b·(1 − r))/(b·(S − 1 + r)), w = 1 − (1 − s)·r";

    [Fact]
    public void EndOfCharge_BottomBalancedLinearCurve_MatchesClosedForm()
    {
        const double cv = 13.5;
        var s = (cv - S * A - S * Eta - Drop) / (B * (S - 1 + R));
        var w = R * s;

        var eoc = Model(BalancingMethod.Bottom).EndOfCharge(cv);

        Reference.AssertClose(s, eoc.TypicalSoc, 1e-10, BottomClosedForm);
        Reference.AssertClose(w, eoc.WeakestSoc, 1e-10, BottomClosedForm);
        Reference.AssertClose(A + B * s + Eta, eoc.TypicalVoltage, 1e-12, BottomClosedForm);
        Reference.AssertClose(A + B * w + Eta, eoc.WeakestVoltage, 1e-12, BottomClosedForm);
        Assert.Equal(eoc.WeakestVoltage, eoc.HighestVoltage);
        Assert.False(eoc.WeakestForcedAboveFull);
        // The group voltages add up to the CV less the series drop.
        Reference.AssertClose(cv - Drop, (S - 1) * eoc.TypicalVoltage + eoc.WeakestVoltage, 1e-12, "Kirchhoff's voltage law");
    }

    [Fact]
    public void EndOfCharge_TopBalancedLinearCurve_MatchesClosedForm()
    {
        const double cv = 13.5;
        var s = (cv - S * A - S * Eta - Drop - B * (1 - R)) / (B * (S - 1 + R));
        var w = 1 - (1 - s) * R;

        var eoc = Model(BalancingMethod.Top).EndOfCharge(cv);

        Reference.AssertClose(s, eoc.TypicalSoc, 1e-10, TopClosedForm);
        Reference.AssertClose(w, eoc.WeakestSoc, 1e-10, TopClosedForm);
        Reference.AssertClose(A + B * w + Eta, eoc.WeakestVoltage, 1e-12, TopClosedForm);
        Assert.Equal(eoc.TypicalVoltage, eoc.HighestVoltage);
    }

    [Fact]
    public void EndOfCharge_BottomBalancedAboveWeakestFull_ForcesRestOfCvOntoWeakestGroup()
    {
        // U(1/r) = S·a + S·η + drop + b·(S − 1 + r)/r = 14.28 V < 15 V: the weakest group is full first.
        const double cv = 15;
        var sFull = 1 / R;

        var eoc = Model(BalancingMethod.Bottom).EndOfCharge(cv);

        Reference.AssertClose(sFull, eoc.TypicalSoc, 1e-12, "weakest group full at s = 1/r");
        Assert.Equal(1, eoc.WeakestSoc, 12);
        Reference.AssertClose(cv - (S - 1) * (A + B * sFull + Eta) - Drop, eoc.WeakestVoltage, 1e-12, "the rest of the CV across the weakest group");
        Assert.True(eoc.WeakestForcedAboveFull);
    }

    [Fact]
    public void EndOfCharge_TopBalancedAboveFull_SharesCvEqually()
    {
        // U(1) = S·(a + b + η) + drop = 14.46 V < 15 V: every group full, the excess shared.
        var eoc = Model(BalancingMethod.Top).EndOfCharge(15);

        Assert.Equal(1, eoc.TypicalSoc, 12);
        Reference.AssertClose((15 - Drop) / S, eoc.TypicalVoltage, 1e-12, "(CV − drop)/S per group");
        Reference.AssertClose((15 - Drop) / S, eoc.WeakestVoltage, 1e-12, "(CV − drop)/S per group");
        Assert.True(eoc.WeakestForcedAboveFull);
    }

    [Fact]
    public void EndOfCharge_CvBelowEmptyString_StaysEmpty()
    {
        // U(0) = S·a + S·η + drop = 12.06 V.
        var eoc = Model(BalancingMethod.Bottom).EndOfCharge(12);

        Assert.Equal(0, eoc.TypicalSoc);
        Assert.Equal(0, eoc.WeakestSoc);
        Assert.Equal(A + Eta, eoc.TypicalVoltage, 12);
    }

    [Fact]
    public void EndOfCharge_SingleGroup_IsTheCurveInverted()
    {
        var model = new StringChargeModel(TestCells.LinearCurve(A, A + B), 1, Nominal, Nominal, BalancingMethod.Bottom, Eta, Drop);

        var eoc = model.EndOfCharge(3.4);

        Reference.AssertClose((3.4 - A - Eta - Drop) / B, eoc.TypicalSoc, 1e-10, "V = a + b·s + η + drop");
        Assert.Equal(eoc.TypicalSoc, eoc.WeakestSoc);
        Assert.Equal(eoc.TypicalVoltage, eoc.WeakestVoltage);
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom)]
    [InlineData(BalancingMethod.Top)]
    public void EndOfCharge_EqualCapacities_SameForBothMethods(BalancingMethod method)
    {
        var eoc = Model(method, weakestAh: Nominal).EndOfCharge(13.5);

        Reference.AssertClose((13.5 - S * A - S * Eta - Drop) / (B * S), eoc.TypicalSoc, 1e-10, "equal groups: s = (CV − S·(a + η) − drop)/(S·b)");
        Assert.Equal(eoc.TypicalSoc, eoc.WeakestSoc, 12);
    }

    [Fact]
    public void ConstantVoltageForHighestGroup_BottomBalanced_MatchesClosedForm()
    {
        // Weakest group at 3.5 V with η: w = (3.5 − η − a)/b, s = w/r, CV = (S−1)(a + b·s + η) + 3.5 + drop.
        var w = (3.5 - Eta - A) / B;
        var s = w / R;
        var model = Model(BalancingMethod.Bottom);

        var cv = model.ConstantVoltageForHighestGroup(3.5);

        Reference.AssertClose((S - 1) * (A + B * s + Eta) + 3.5 + Drop, cv, 1e-12, BottomClosedForm);
        Reference.AssertClose(3.5, model.EndOfCharge(cv).HighestVoltage, 1e-10, "round trip through the end-of-charge solve");
    }

    [Fact]
    public void ConstantVoltageForHighestGroup_TopBalanced_MatchesClosedForm()
    {
        // Typical group at 3.5 V: s = (3.5 − η − a)/b, w = 1 − (1 − s)·r, CV = (S−1)·3.5 + a + b·w + η + drop.
        var s = (3.5 - Eta - A) / B;
        var w = 1 - (1 - s) * R;
        var model = Model(BalancingMethod.Top);

        var cv = model.ConstantVoltageForHighestGroup(3.5);

        Reference.AssertClose((S - 1) * 3.5 + A + B * w + Eta + Drop, cv, 1e-12, TopClosedForm);
        Reference.AssertClose(3.5, model.EndOfCharge(cv).HighestVoltage, 1e-10, "round trip through the end-of-charge solve");
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom, 3.7)]
    [InlineData(BalancingMethod.Top, 3.7)]
    [InlineData(BalancingMethod.Bottom, 3.2)]
    [InlineData(BalancingMethod.Top, 3.2)]
    public void ConstantVoltageForHighestGroup_AnyGroupVoltage_RoundTripsThroughEndOfCharge(BalancingMethod method, double groupVoltage)
    {
        var model = Model(method);

        Reference.AssertClose(groupVoltage, model.EndOfCharge(model.ConstantVoltageForHighestGroup(groupVoltage)).HighestVoltage, 1e-10, "inverse of the end-of-charge solve");
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom, 0.5)]
    [InlineData(BalancingMethod.Bottom, 0.9)]
    [InlineData(BalancingMethod.Top, 0.5)]
    [InlineData(BalancingMethod.Top, 1.0)]
    public void ConstantVoltageForTypicalSoc_ReachableSoc_RoundTripsThroughEndOfCharge(BalancingMethod method, double soc)
    {
        var model = Model(method);

        Reference.AssertClose(soc, model.EndOfCharge(model.ConstantVoltageForTypicalSoc(soc)).TypicalSoc, 1e-9, "inverse of the end-of-charge solve");
    }

    [Fact]
    public void ConstantVoltageForTypicalSoc_BottomBalancedBeyondWeakestFull_IsInfinite()
    {
        // With r = 10/9 the weakest group is full at s = 0.9: the typical group cannot reach 95 %.
        Assert.Equal(double.PositiveInfinity, Model(BalancingMethod.Bottom).ConstantVoltageForTypicalSoc(0.95));
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom, 0.45, 0.5)]
    [InlineData(BalancingMethod.Top, 0.45, 1 - 0.55 * 10.0 / 9)]
    public void WeakestSoc_TypicalSoc_FollowsBalancingPoint(BalancingMethod method, double typical, double weakest)
    {
        var model = Model(method);

        Assert.Equal(weakest, model.WeakestSoc(typical), 12);
        Assert.Equal(typical, model.TypicalSoc(model.WeakestSoc(typical)), 12);
    }
}
