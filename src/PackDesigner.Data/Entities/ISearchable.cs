namespace PackDesigner.Data.Entities;

/// <summary>An entity whose name is searched case-insensitively through a lower-cased copy.</summary>
public interface ISearchable
{
    /// <summary>The text the key is made from.</summary>
    string SearchSource { get; }

    /// <summary>The lower-cased (invariant) copy of <see cref="SearchSource"/>.</summary>
    string SearchKey { get; set; }

    /// <summary>The key for a text: trimmed and lower-cased with the invariant culture (full Unicode case mapping).</summary>
    static string KeyFor(string text) => text.Trim().ToLowerInvariant();
}
