using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Configurations;

internal sealed class DesignConfiguration : IEntityTypeConfiguration<Design>
{
    public void Configure(EntityTypeBuilder<Design> b)
    {
        b.ToTable("designs");
        b.Property(x => x.Name).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.SearchKey).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.LatestRevisionNumber).IsConcurrencyToken();
        b.HasOne(x => x.Customer).WithMany().HasForeignKey(x => x.CustomerId).OnDelete(DeleteBehavior.Restrict);
        b.HasOne(x => x.Job).WithMany().HasForeignKey(x => x.JobId).OnDelete(DeleteBehavior.Restrict);
        b.HasOne(x => x.Cell).WithMany().HasForeignKey(x => x.CellId).OnDelete(DeleteBehavior.SetNull);
        b.HasMany(x => x.Revisions).WithOne(x => x.Design).HasForeignKey(x => x.DesignId).OnDelete(DeleteBehavior.Restrict);
        b.HasIndex(x => x.SearchKey);
        b.HasIndex(x => x.UpdatedUtc);
    }
}
