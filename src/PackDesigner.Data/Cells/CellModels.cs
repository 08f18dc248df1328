using PackDesigner.Core.Cells;

namespace PackDesigner.Data.Cells;

/// <summary>What a person enters for a library cell: names as free text and the datasheet figures.</summary>
public sealed record CellData(string Name, CellInput Figures, string? Maker = null, string? Model = null, string? Notes = null);

/// <summary>A library cell with its figures as a Core <see cref="CellInput"/>.</summary>
public sealed record CellDetails(
    int Id,
    string Name,
    string? Maker,
    string? Model,
    string? Notes,
    CellInput Figures,
    DateTime CreatedUtc,
    DateTime UpdatedUtc,
    long Version);

/// <summary>One row of the cell library list.</summary>
public sealed record CellRow(
    int Id,
    string Name,
    string? Maker,
    string? Model,
    Chemistry Chemistry,
    double? CapacityAh,
    double? NominalVoltage,
    bool HasOwnOcvCurve,
    DateTime UpdatedUtc,
    long Version);
