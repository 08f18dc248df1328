using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Json;

namespace PackDesigner.Web.Tests.Data;

public sealed class CellMappingTests
{
    [Fact]
    public void Entity_EveryCellInputProperty_HasAColumn()
    {
        // Guards the hand mapping: a property added to CellInput but not to the entity fails here.
        var entity = typeof(Cell).GetProperties().Select(p => p.Name).ToHashSet();

        Assert.All(typeof(CellInput).GetProperties(), p =>
            Assert.True(entity.Contains(p.Name) || (p.Name == nameof(CellInput.OcvCurve) && entity.Contains(nameof(Cell.OcvCurveJson))), p.Name));
    }

    [Fact]
    public void ApplyThenToInput_EveryFigureDistinct_GivesTheSameInput()
    {
        // Distinct values per property, so two swapped assignments in the mapping would show.
        var values = typeof(CellInput).GetProperties().Where(p => p.PropertyType == typeof(double?)).Select((p, i) => (p, i)).ToList();
        var input = new CellInput { Chemistry = Chemistry.Lto, OcvCurve = [new OcvPoint(0, 1.8), new OcvPoint(100, 2.7)] };
        foreach (var (p, i) in values)
        {
            p.SetValue(input, 100.0 + i);
        }

        var cell = new Cell { Name = "x" };
        CellMapping.ApplyFigures(cell, input);
        var back = CellMapping.ToInput(cell);

        Assert.All(values, v => Assert.Equal(100.0 + v.i, (double?)v.p.GetValue(back)));
        Assert.Equal(Chemistry.Lto, back.Chemistry);
        Assert.Equal(CanonicalDesignJson.SerializeCurve(input.OcvCurve!), cell.OcvCurveJson);
        Assert.Equal(input.OcvCurve, back.OcvCurve);
    }
}
