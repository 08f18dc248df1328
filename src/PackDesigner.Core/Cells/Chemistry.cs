namespace PackDesigner.Core.Cells;

/// <summary>Cell chemistry families the presets know; <see cref="Custom"/> has no preset and needs every figure.</summary>
public enum Chemistry
{
    Lfp,
    Nmc,
    Nca,
    Lto,
    Custom,
}
