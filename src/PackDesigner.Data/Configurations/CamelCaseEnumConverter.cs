using System.Text.Json;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace PackDesigner.Data.Configurations;

/// <summary>Stores an enum as its camelCase name (<c>signedOff</c>), the same text the canonical JSON uses.</summary>
internal static class CamelCaseEnumConverter
{
    public static ValueConverter<T, string> For<T>() where T : struct, Enum =>
        new(v => JsonNamingPolicy.CamelCase.ConvertName(v.ToString()), s => Parse<T>(s));

    private static T Parse<T>(string s) where T : struct, Enum =>
        Enum.TryParse<T>(s, ignoreCase: true, out var v) && Enum.IsDefined(v)
            ? v
            : throw new InvalidOperationException($"Stored value '{s}' is not a {typeof(T).Name}.");
}
