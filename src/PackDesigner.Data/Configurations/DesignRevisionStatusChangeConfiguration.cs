using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Configurations;

internal sealed class DesignRevisionStatusChangeConfiguration : IEntityTypeConfiguration<DesignRevisionStatusChange>
{
    public void Configure(EntityTypeBuilder<DesignRevisionStatusChange> b)
    {
        b.ToTable("design_revision_status_changes");
        b.HasIndex(x => new { x.RevisionId, x.Sequence }).IsUnique();
        b.Property(x => x.Status).HasConversion(CamelCaseEnumConverter.For<RevisionStatus>()).HasMaxLength(FieldLengths.Status);
        b.Property(x => x.ChangedBy).HasMaxLength(FieldLengths.UserName);
        b.Property(x => x.Note).HasMaxLength(FieldLengths.Note);
    }
}
