namespace PackDesigner.Core.Findings;

/// <summary>How much a finding matters: an error makes the design unsafe or unworkable as entered.</summary>
public enum Severity
{
    Error,
    Warning,
    Info,
}

/// <summary>
/// One result of a check: a stable <see cref="Code"/>, a message with the numbers and units, and the input
/// fields (camelCase paths) it concerns.
/// </summary>
public sealed record Finding(Severity Severity, string Code, string Message, IReadOnlyList<string> Fields);
