namespace PackDesigner.Core.Standards;

/// <summary>
/// Standard ampere ratings of fuses and inverse-time circuit breakers, NFPA 70 (NEC) 240.6(A),
/// including the additional standard fuse ratings 1, 3, 6, 10 and 601 A.
/// </summary>
public static class StandardRatings
{
    /// <summary>The NEC 240.6(A) list, ascending, A.</summary>
    public static IReadOnlyList<double> FuseRatingsA { get; } =
    [
        1, 3, 6, 10, 15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250,
        300, 350, 400, 450, 500, 600, 601, 700, 800, 1000, 1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000,
    ];

    /// <summary>The 125 % factor for continuous loads (load lasting 3 h or more), NEC 210.20(A) and 215.3.</summary>
    public const double ContinuousLoadFactor = 1.25;

    /// <summary>Smallest standard rating at or above <paramref name="amps"/>, or null above 6000 A.</summary>
    public static double? NextStandardFuseRating(double amps)
    {
        foreach (var rating in FuseRatingsA)
        {
            if (rating >= amps - 1e-9)
            {
                return rating;
            }
        }

        return null;
    }

    /// <summary>Minimum overcurrent-device rating for a continuous load: 125 % of it (NEC 210.20(A)).</summary>
    public static double MinimumRatingForContinuousLoad(double continuousAmps, double nonContinuousAmps = 0) =>
        nonContinuousAmps + ContinuousLoadFactor * continuousAmps;
}
