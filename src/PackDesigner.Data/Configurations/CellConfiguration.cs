using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Configurations;

internal sealed class CellConfiguration : IEntityTypeConfiguration<Cell>
{
    public void Configure(EntityTypeBuilder<Cell> b)
    {
        b.ToTable("cells");
        b.Property(x => x.Name).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.SearchKey).HasMaxLength(FieldLengths.CellSearchKey);
        b.Property(x => x.Maker).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.Model).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.Notes).HasMaxLength(FieldLengths.Notes);
        b.Property(x => x.Chemistry).HasConversion(CamelCaseEnumConverter.For<Core.Cells.Chemistry>()).HasMaxLength(FieldLengths.Status);
        b.Property(x => x.Version).IsConcurrencyToken();
        b.HasIndex(x => x.SearchKey);
    }
}
