using System.Globalization;
using PackDesigner.Core.Standards;

namespace PackDesigner.Core.Tests.Standards;

public sealed class StandardRatingsTests
{
    /// <summary>Rows of ReferenceData/nec-240-6a-next-rating.csv: required current → next NEC 240.6(A) rating (null: none).</summary>
    public static TheoryData<double, double?> NecNextRatingRows()
    {
        var data = new TheoryData<double, double?>();
        var path = Path.Combine(AppContext.BaseDirectory, "ReferenceData", "nec-240-6a-next-rating.csv");
        foreach (var line in File.ReadLines(path).Where(l => !l.StartsWith('#')).Skip(1))
        {
            var cells = line.Split(',');
            var required = double.Parse(cells[0], CultureInfo.InvariantCulture);
            double? expected = cells[1].Length == 0 ? null : double.Parse(cells[1], CultureInfo.InvariantCulture);
            data.Add(required, expected);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(NecNextRatingRows))]
    public void NextStandardFuseRating_RequiredCurrent_ReturnsNecTable240_6ARating(double requiredA, double? expectedRatingA)
    {
        // Source: NFPA 70 (NEC) 240.6(A) standard ampere ratings, table-driven from the reference data file.
        Assert.Equal(expectedRatingA, StandardRatings.NextStandardFuseRating(requiredA));
    }

    [Fact]
    public void NecNextRatingRows_DataFile_CoversEveryStandardRating()
    {
        // The data file is independent of Core's list; every rating Core knows must appear as an expected value.
        var expected = NecNextRatingRows().Select(row => (double?)row[1]).Where(v => v is not null).Distinct().ToList();

        Assert.Equal(expected.Count, StandardRatings.FuseRatingsA.Count);
        Assert.All(StandardRatings.FuseRatingsA, r => Assert.Contains(r, expected));
    }

    [Fact]
    public void FuseRatingsA_List_IsStrictlyAscending()
    {
        var ratings = StandardRatings.FuseRatingsA;

        Assert.All(ratings.Zip(ratings.Skip(1)), pair => Assert.True(pair.Second > pair.First));
    }

    [Fact]
    public void NextStandardFuseRating_JustAboveRatingByBinaryRounding_KeepsThatRating()
    {
        // 0.1 + 0.2 = 0.30000000000000004: a computed 125 A must not round up to 150 A.
        Assert.Equal(125, StandardRatings.NextStandardFuseRating(100 * 1.25 * (0.1 + 0.2) / 0.3));
    }

    [Theory]
    [InlineData(100, 0, 125)]
    [InlineData(80, 0, 100)]
    [InlineData(100, 20, 145)]
    [InlineData(0, 30, 30)]
    public void MinimumRatingForContinuousLoad_Load_IsNonContinuousPlus125PercentOfContinuous(double continuousA, double nonContinuousA, double expectedA)
    {
        // NFPA 70 (NEC) 210.20(A) / 215.3: not less than the non-continuous load plus 125 % of the continuous load.
        Reference.AssertClose(expectedA, StandardRatings.MinimumRatingForContinuousLoad(continuousA, nonContinuousA), 1e-15, "NEC 210.20(A)");
    }

    [Fact]
    public void ContinuousLoadFactor_Value_Is125Percent()
    {
        Reference.AssertClose(1.25, StandardRatings.ContinuousLoadFactor, 0, "NEC 210.20(A): 125 % of the continuous load");
    }
}
