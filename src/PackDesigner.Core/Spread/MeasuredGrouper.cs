namespace PackDesigner.Core.Spread;

/// <summary>Assigns a list of measured cell capacities to S parallel groups of P cells.</summary>
public static class MeasuredGrouper
{
    /// <summary>
    /// Forms S groups of P cells from <paramref name="capacitiesAh"/> (at least S·P values; exactly S·P for
    /// <see cref="MeasuredGrouping.AsListed"/>). Balanced: of the cells sorted by capacity, the S·P consecutive ones
    /// with the smallest range are used; then, largest first, each joins the unfilled group with the smallest total
    /// (ties to the lower group number). Groups are numbered 1…S; cell numbers are 1-based list positions.
    /// </summary>
    /// <exception cref="ArgumentException">The list is too short for S·P cells.</exception>
    public static IReadOnlyList<MeasuredGroup> Assign(IReadOnlyList<double> capacitiesAh, int series, int parallel, MeasuredGrouping grouping)
    {
        var needed = series * parallel;
        if (capacitiesAh.Count < needed || (grouping == MeasuredGrouping.AsListed && capacitiesAh.Count != needed))
        {
            throw new ArgumentException($"{needed} cells are needed for {series}S{parallel}P.", nameof(capacitiesAh));
        }

        if (grouping == MeasuredGrouping.AsListed)
        {
            return Enumerable.Range(0, series)
                .Select(g =>
                {
                    var cells = Enumerable.Range(g * parallel, parallel).ToArray();
                    return new MeasuredGroup(g + 1, cells.Select(c => c + 1).ToArray(), cells.Sum(c => capacitiesAh[c]));
                })
                .ToArray();
        }

        var order = Enumerable.Range(0, capacitiesAh.Count).OrderBy(i => capacitiesAh[i]).ThenBy(i => i).ToArray();
        var start = 0;
        var bestRange = double.PositiveInfinity;
        for (var i = 0; i + needed <= order.Length; i++)
        {
            var range = capacitiesAh[order[i + needed - 1]] - capacitiesAh[order[i]];
            if (range < bestRange)
            {
                bestRange = range;
                start = i;
            }
        }

        var members = new List<int>[series];
        var sums = new double[series];
        var queue = new PriorityQueue<int, (double Sum, int Group)>();
        for (var g = 0; g < series; g++)
        {
            members[g] = new List<int>(parallel);
            queue.Enqueue(g, (0, g));
        }

        for (var k = start + needed - 1; k >= start; k--)
        {
            var cell = order[k];
            var g = queue.Dequeue();
            members[g].Add(cell);
            sums[g] += capacitiesAh[cell];
            if (members[g].Count < parallel)
            {
                queue.Enqueue(g, (sums[g], g));
            }
        }

        return Enumerable.Range(0, series)
            .Select(g => new MeasuredGroup(g + 1, members[g].Select(c => c + 1).Order().ToArray(), sums[g]))
            .ToArray();
    }
}
