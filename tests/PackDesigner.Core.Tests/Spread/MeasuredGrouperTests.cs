using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

public class MeasuredGrouperTests
{
    [Fact]
    public void Assign_SixCellsInThreeGroupsOfTwo_BalancesTheTotalsAsWorkedByHand()
    {
        // Largest first into the unfilled group with the smallest total (Graham 1969): 10→1, 9→2, 8→3, 7→3 (8 is
        // smallest), 6→2 (9), 5→1 (10): every group holds 15 Ah.
        var groups = MeasuredGrouper.Assign([10, 9, 8, 7, 6, 5], 3, 2, MeasuredGrouping.Balanced);
        Assert.All(groups, g => Assert.Equal(15, g.CapacityAh));
        Assert.Equal([1, 6], groups[0].CellNumbers);
        Assert.Equal([2, 5], groups[1].CellNumbers);
        Assert.Equal([3, 4], groups[2].CellNumbers);
    }

    [Fact]
    public void Assign_SpareCells_UsesTheWindowWithTheSmallestRange()
    {
        // Four of [100, 10, 10.2, 9.9, 10.1, 50]: the sorted window 9.9–10.2 (range 0.3) is the tightest.
        var groups = MeasuredGrouper.Assign([100, 10, 10.2, 9.9, 10.1, 50], 2, 2, MeasuredGrouping.Balanced);
        var used = groups.SelectMany(g => g.CellNumbers).Order().ToArray();
        Assert.Equal([2, 3, 4, 5], used);
        Assert.All(groups, g => Assert.Equal(20.1, g.CapacityAh, 9));
    }

    [Fact]
    public void Assign_AsListed_KeepsTheListsOrder()
    {
        var groups = MeasuredGrouper.Assign([1, 2, 3, 4, 5, 6], 2, 3, MeasuredGrouping.AsListed);
        Assert.Equal([1, 2, 3], groups[0].CellNumbers);
        Assert.Equal(6, groups[0].CapacityAh);
        Assert.Equal([4, 5, 6], groups[1].CellNumbers);
        Assert.Equal(15, groups[1].CapacityAh);
    }

    [Fact]
    public void Assign_TooFewCells_Throws()
    {
        Assert.Throws<ArgumentException>(() => MeasuredGrouper.Assign([1, 2, 3], 2, 2, MeasuredGrouping.Balanced));
    }
}
