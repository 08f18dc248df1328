using System.Globalization;
using PackDesigner.Core.Validation;

namespace PackDesigner.Data.Infrastructure;

/// <summary>Checks of the free-text fields the services store; messages name the field and the limit.</summary>
internal static class TextRules
{
    /// <summary>Trimmed text, or an error when it is missing or too long.</summary>
    public static string Required(List<ValidationError> errors, string field, string? value, int maxLength, string what)
    {
        var text = value?.Trim() ?? "";
        if (text.Length == 0)
        {
            errors.Add(new ValidationError(field, $"Enter {what}."));
        }
        else
        {
            CheckLength(errors, field, text, maxLength);
        }

        return text;
    }

    /// <summary>Trimmed text or null when blank; an error when too long.</summary>
    public static string? Optional(List<ValidationError> errors, string field, string? value, int maxLength)
    {
        var text = value?.Trim();
        if (string.IsNullOrEmpty(text))
        {
            return null;
        }

        CheckLength(errors, field, text, maxLength);
        return text;
    }

    /// <summary>Shortens <paramref name="text"/> to at most <paramref name="maxLength"/> characters without splitting a surrogate pair.</summary>
    public static string Truncate(string text, int maxLength)
    {
        if (text.Length <= maxLength)
        {
            return text;
        }

        var cut = char.IsHighSurrogate(text[maxLength - 1]) ? maxLength - 1 : maxLength;
        return text[..cut];
    }

    private static void CheckLength(List<ValidationError> errors, string field, string text, int maxLength)
    {
        if (text.Length > maxLength)
        {
            errors.Add(new ValidationError(field, string.Create(CultureInfo.InvariantCulture,
                $"At most {maxLength} characters (got {text.Length}).")));
        }
    }
}
