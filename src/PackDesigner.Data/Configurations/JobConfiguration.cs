using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Configurations;

internal sealed class JobConfiguration : IEntityTypeConfiguration<Job>
{
    public void Configure(EntityTypeBuilder<Job> b)
    {
        b.ToTable("jobs");
        b.Property(x => x.Title).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.VehicleOrSystem).HasMaxLength(FieldLengths.Name);
        b.Property(x => x.Notes).HasMaxLength(FieldLengths.Notes);
    }
}
