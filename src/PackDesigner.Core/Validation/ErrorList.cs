using System.Globalization;

namespace PackDesigner.Core.Validation;

/// <summary>Collects validation errors with range checks that state the bounds and units.</summary>
internal sealed class ErrorList : List<ValidationError>
{
    public void Add(string field, string message) => Add(new ValidationError(field, message));

    /// <summary>Checks lo ≤ value ≤ hi (or lo &lt; value with <paramref name="exclusiveLow"/>); returns whether it passed.</summary>
    public bool Range(string field, double value, double lo, double hi, string unit, bool exclusiveLow = false)
    {
        if (!double.IsFinite(value))
        {
            // A figure already reported (for example missing for a custom chemistry) gets no second message.
            if (!this.Any(e => e.Field == field))
            {
                Add(field, "Must be a finite number.");
            }

            return false;
        }

        var lowOk = exclusiveLow ? value > lo : value >= lo;
        if (lowOk && value <= hi)
        {
            return true;
        }

        var lowText = exclusiveLow ? "above" : "at least";
        Add(field, string.Create(CultureInfo.InvariantCulture,
            $"Must be {lowText} {lo:0.###} {unit} and at most {hi:0.###} {unit} (got {value:0.####})."));
        return false;
    }
}
