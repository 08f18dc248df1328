using System.Collections;
using System.Globalization;
using System.Reflection;

namespace PackDesigner.Core.Tests.TestData;

/// <summary>Walks an object graph through its public properties and lists every number that is not finite, by path.</summary>
public static class ResultWalker
{
    public static IReadOnlyList<string> NonFiniteNumbers(object root)
    {
        var found = new List<string>();
        Walk(root, "result", found, depth: 0);
        return found;
    }

    /// <summary>How many numbers the walk visits (to show that the walk reaches into the result).</summary>
    public static int CountNumbers(object root)
    {
        var count = 0;
        Visit(root, "result", (_, _) => count++, 0);
        return count;
    }

    private static void Walk(object? value, string path, List<string> found, int depth) =>
        Visit(value, path, (p, d) =>
        {
            if (!double.IsFinite(d))
            {
                found.Add(string.Create(CultureInfo.InvariantCulture, $"{p} = {d}"));
            }
        }, depth);

    private static void Visit(object? value, string path, Action<string, double> onNumber, int depth)
    {
        Assert.True(depth < 20, "The result graph is deeper than expected at " + path);
        switch (value)
        {
            case null or string or bool or Enum:
                return;
            case double d:
                onNumber(path, d);
                return;
            case float f:
                onNumber(path, f);
                return;
            case int or long or decimal:
                return;
            case IDictionary dictionary:
                foreach (DictionaryEntry entry in dictionary)
                {
                    Visit(entry.Value, $"{path}[{entry.Key}]", onNumber, depth + 1);
                }

                return;
            case IEnumerable items:
                var i = 0;
                foreach (var item in items)
                {
                    Visit(item, string.Create(CultureInfo.InvariantCulture, $"{path}[{i++}]"), onNumber, depth + 1);
                }

                return;
        }

        foreach (var property in value.GetType().GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            if (property.GetIndexParameters().Length == 0 && property.Name != "EqualityContract")
            {
                Visit(property.GetValue(value), path + "." + property.Name, onNumber, depth + 1);
            }
        }
    }
}
