using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Configurations;

internal sealed class CustomerConfiguration : IEntityTypeConfiguration<Customer>
{
    public void Configure(EntityTypeBuilder<Customer> b)
    {
        b.ToTable("customers");
        b.Property(x => x.Name).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.SearchKey).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.Contact).HasMaxLength(FieldLengths.Contact);
        b.Property(x => x.Notes).HasMaxLength(FieldLengths.Notes);
        b.HasIndex(x => x.SearchKey);
        b.HasMany(x => x.Jobs).WithOne(x => x.Customer).HasForeignKey(x => x.CustomerId).OnDelete(DeleteBehavior.Restrict);
    }
}
