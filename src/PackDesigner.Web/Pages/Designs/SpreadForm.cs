using System.ComponentModel.DataAnnotations;
using System.Globalization;
using PackDesigner.Core.Spread;
using PackDesigner.Core.Validation;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>The spread settings of the design's spread page, as typed (query string, so the page works without script).</summary>
public sealed class SpreadForm
{
    public const string Prefix = "Input";

    [Display(Name = "Distribution")]
    public string? Distribution { get; set; } = "normal";

    [Display(Name = "σ of capacity")]
    public string? CapacitySigmaPercent { get; set; }

    [Display(Name = "σ of resistance")]
    public string? ResistanceSigmaPercent { get; set; }

    [Display(Name = "Trials")]
    public string? Trials { get; set; } = SpreadLimits.DefaultTrials.ToString(CultureInfo.InvariantCulture);

    [Display(Name = "Seed")]
    public string? Seed { get; set; } = "1";

    [Display(Name = "Allowed trip risk")]
    public string? TripRiskPercent { get; set; } = (100 * SpreadLimits.DefaultTripRisk).ToString(CultureInfo.InvariantCulture);

    /// <summary>Core's field path → the form key its error is shown beside.</summary>
    private static readonly Dictionary<string, string> FormKeys = new(StringComparer.Ordinal)
    {
        ["spread.distribution"] = Key(nameof(Distribution)),
        ["spread.capacitySigmaPercent"] = Key(nameof(CapacitySigmaPercent)),
        ["spread.resistanceSigmaPercent"] = Key(nameof(ResistanceSigmaPercent)),
        ["spread.trials"] = Key(nameof(Trials)),
        ["spread.seed"] = Key(nameof(Seed)),
        ["spread.tripRisk"] = Key(nameof(TripRiskPercent)),
    };

    public static string Key(string property) => Prefix + "." + property;

    /// <summary>The form key of one of Core's spread errors, or null when it is about the design itself.</summary>
    public static string? FormKeyOf(string field) => FormKeys.GetValueOrDefault(field);

    /// <summary>The settings, or null with the errors keyed by form key when a figure does not parse.</summary>
    public SpreadSettings? TryMap(out IReadOnlyList<ValidationError> errors)
    {
        var list = new List<ValidationError>();
        var distribution = (Distribution ?? string.Empty).Trim().ToLowerInvariant() switch
        {
            "normal" or "" => SpreadDistribution.Normal,
            "uniform" => SpreadDistribution.Uniform,
            _ => (SpreadDistribution?)null,
        };
        if (distribution is null)
        {
            list.Add(new ValidationError(Key(nameof(Distribution)), "Choose normal or uniform."));
        }

        var capacity = Number(nameof(CapacitySigmaPercent), CapacitySigmaPercent, list, optional: true);
        var resistance = Number(nameof(ResistanceSigmaPercent), ResistanceSigmaPercent, list, optional: true);
        var risk = Number(nameof(TripRiskPercent), TripRiskPercent, list, optional: true);
        // Digit groups typed with spaces ("10 000") are accepted.
        var trialsText = new string((Trials ?? string.Empty).Where(c => !char.IsWhiteSpace(c)).ToArray());
        if (!int.TryParse(trialsText, NumberStyles.None, CultureInfo.InvariantCulture, out var trials))
        {
            list.Add(new ValidationError(Key(nameof(Trials)), string.Create(CultureInfo.InvariantCulture,
                $"Enter a whole number of trials from {SpreadLimits.MinTrials} to {SpreadLimits.MaxTrials}.")));
        }

        if (!long.TryParse(Seed?.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var seed))
        {
            list.Add(new ValidationError(Key(nameof(Seed)), "Enter a whole number; the same seed gives the same result."));
        }

        errors = list;
        return list.Count > 0 ? null : new SpreadSettings
        {
            Distribution = distribution!.Value,
            CapacitySigmaPercent = capacity,
            ResistanceSigmaPercent = resistance,
            Trials = trials,
            Seed = seed,
            TripRisk = risk / 100,
        };
    }

    /// <summary>The query string of these settings, for links (the same page with other settings).</summary>
    public string ToQuery() => string.Join('&', new (string Name, string? Value)[]
        {
            (nameof(Distribution), Distribution), (nameof(CapacitySigmaPercent), CapacitySigmaPercent),
            (nameof(ResistanceSigmaPercent), ResistanceSigmaPercent), (nameof(Trials), Trials), (nameof(Seed), Seed),
            (nameof(TripRiskPercent), TripRiskPercent),
        }
        .Where(p => !string.IsNullOrWhiteSpace(p.Value))
        .Select(p => Uri.EscapeDataString(Key(p.Name)) + "=" + Uri.EscapeDataString(p.Value!.Trim())));

    private static double? Number(string property, string? text, List<ValidationError> errors, bool optional)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            if (!optional)
            {
                errors.Add(new ValidationError(Key(property), "Required."));
            }

            return null;
        }

        if (double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var v) && double.IsFinite(v))
        {
            return v;
        }

        errors.Add(new ValidationError(Key(property), "Enter a number with a point as the decimal separator, e.g. 1.5."));
        return null;
    }
}
