namespace PackDesigner.Core.Validation;

/// <summary>An input problem, keyed by the camelCase field path it concerns (for example <c>cell.capacityAh</c>).</summary>
public sealed record ValidationError(string Field, string Message);
