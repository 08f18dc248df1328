namespace PackDesigner.Data.Entities;

/// <summary>Maximum lengths of text columns (characters), shared by the entity configurations and the services' checks.</summary>
public static class FieldLengths
{
    public const int Name = 200;
    /// <summary>Name, maker and model of a cell with two separators.</summary>
    public const int CellSearchKey = 3 * Name + 2;
    public const int Contact = 500;
    public const int Notes = 4000;
    public const int Note = 2000;
    public const int UserName = 200;
    public const int CalculationVersion = 32;
    /// <summary>SHA-256 as lower-case hex.</summary>
    public const int Sha256Hex = 64;
    public const int Status = 16;
}
