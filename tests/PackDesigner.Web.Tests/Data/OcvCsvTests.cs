using System.Text;
using PackDesigner.Core.Curves;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Tests.Data;

public sealed class OcvCsvTests
{
    [Fact]
    public void Parse_ValidTable_ReturnsPointsWithTheirLines()
    {
        var result = OcvCsv.Parse("socPercent,voltage\n0,2.5\n\n50,3.29\n100,3.6\n");

        Assert.True(result.IsValid);
        Assert.Equal([new OcvPoint(0, 2.5), new OcvPoint(50, 3.29), new OcvPoint(100, 3.6)], result.Points);
        Assert.Equal([2, 4, 5], result.Lines);
    }

    [Fact]
    public void Parse_HeaderInOtherOrderWithSpacesAndBom_IsAccepted()
    {
        var result = OcvCsv.Parse("\uFEFF Voltage , SOCPERCENT \r\n2.5, 0\r\n3.6 ,100\r\n");

        Assert.True(result.IsValid);
        Assert.Equal([new OcvPoint(0, 2.5), new OcvPoint(100, 3.6)], result.Points);
    }

    [Fact]
    public void Parse_BadRows_ReportsEachRowWithItsLine()
    {
        var result = OcvCsv.Parse("socPercent,voltage\n0,2.5\n10,abc\n20,3,25\n130,3.3\n40,\n100,3.6\n");

        Assert.False(result.IsValid);
        Assert.Equal(
        [
            "Line 3: voltage 'abc' is not a number in V (use a dot as the decimal separator, no unit sign).",
            "Line 4: Expected 2 values (socPercent,voltage), found 3. Use a dot as the decimal separator and a comma between the values.",
            "Line 5: socPercent 130 is outside 0–100 %.",
            "Line 6: voltage is empty.",
        ], result.Errors.Select(e => e.ToString()));
        Assert.Empty(result.Points);
    }

    [Fact]
    public void Parse_SocAsFractions_IsRefusedAsAUnitMistake()
    {
        var result = OcvCsv.Parse("socPercent,voltage\n0,2.5\n0.5,3.29\n1,3.6\n");

        var error = Assert.Single(result.Errors);
        Assert.Null(error.Line);
        Assert.Contains("fraction", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_Millivolts_IsRefusedAsAUnitMistake()
    {
        var result = OcvCsv.Parse("socPercent,voltage\n0,2500\n50,3290\n100,3600\n");

        var error = Assert.Single(result.Errors);
        Assert.Null(error.Line);
        Assert.Contains("millivolts", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_OneMillivoltRow_NamesItsLine()
    {
        var result = OcvCsv.Parse("socPercent,voltage\n0,2.5\n50,3290\n100,3.6\n");

        var error = Assert.Single(result.Errors);
        Assert.Equal(3, error.Line);
        Assert.Contains("millivolts", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_VoltageAboveASingleCell_IsRefused()
    {
        var result = OcvCsv.Parse("socPercent,voltage\n0,2.5\n100,48\n");

        Assert.Equal("Line 3: voltage 48 V is outside 0–6 V; give the rest voltage of one cell in volts.", Assert.Single(result.Errors).ToString());
    }

    [Theory]
    [InlineData("socPercent;voltage\n0;2.5\n100;3.6\n", "semicolons")]
    [InlineData("soc,volts\n0,2.5\n100,3.6\n", "Found: soc,volts.")]
    [InlineData("   \n", "empty")]
    [InlineData("socPercent,voltage\n0,2.5\n", "at least two rows")]
    [InlineData("socPercent,voltage\nNaN,2.5\n100,Infinity\n", "is not a number")]
    public void Parse_MalformedFile_ExplainsTheProblem(string csv, string expected)
    {
        var result = OcvCsv.Parse(csv);

        Assert.False(result.IsValid);
        Assert.Contains(result.Errors, e => e.Message.Contains(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void Parse_MoreThanTheRowLimit_IsRefused()
    {
        var sb = new StringBuilder("socPercent,voltage\n");
        for (var i = 0; i <= OcvCsv.MaxRows; i++)
        {
            sb.Append(i * 100.0 / (OcvCsv.MaxRows + 1)).Append(",3.2\n");
        }

        var result = OcvCsv.Parse(sb.ToString());

        Assert.Contains(result.Errors, e => e.Message.StartsWith("More than 1000 rows", StringComparison.Ordinal));
    }

    [Fact]
    public async Task ParseAsync_StreamOverTheSizeLimit_IsRefusedWithoutReadingItAll()
    {
        var big = new MemoryStream(Encoding.UTF8.GetBytes("socPercent,voltage\n" + new string('1', OcvCsv.MaxBytes * 4)));

        var result = await OcvCsv.ParseAsync(big);

        Assert.Contains("larger than 64 KiB", Assert.Single(result.Errors).Message, StringComparison.Ordinal);
        Assert.Equal(OcvCsv.MaxBytes + 1, big.Position);
    }

    [Fact]
    public async Task ParseAsync_NotUtf8_IsRefused()
    {
        var latin1 = new MemoryStream([.. Encoding.ASCII.GetBytes("socPercent,voltage\n0,2.5\n"), 0xFF, 0xFE, 0x41]);

        var result = await OcvCsv.ParseAsync(latin1);

        Assert.Contains("UTF-8", Assert.Single(result.Errors).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Write_Table_ParsesBackToTheSamePoints()
    {
        OcvPoint[] points = [new(0, 2.5), new(12.5, 3.1875), new(100.0 / 3, 3.2666666666666666), new(100, 3.65)];

        var csv = OcvCsv.Write(points);
        var back = OcvCsv.Parse(csv);

        Assert.StartsWith("socPercent,voltage\r\n0,2.5\r\n12.5,3.1875\r\n", csv, StringComparison.Ordinal);
        Assert.Equal(points, back.Points);
    }
}
