using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Configurations;

internal sealed class DesignRevisionConfiguration : IEntityTypeConfiguration<DesignRevision>
{
    public void Configure(EntityTypeBuilder<DesignRevision> b)
    {
        b.ToTable("design_revisions");
        // The last line of defence against two saves of the same revision number.
        b.HasIndex(x => new { x.DesignId, x.Number }).IsUnique();
        b.Property(x => x.InputSha256).HasMaxLength(FieldLengths.Sha256Hex).IsFixedLength();
        b.Property(x => x.CalculationVersion).HasMaxLength(FieldLengths.CalculationVersion);
        b.Property(x => x.Status).HasConversion(CamelCaseEnumConverter.For<RevisionStatus>()).HasMaxLength(FieldLengths.Status);
        b.Property(x => x.Note).HasMaxLength(FieldLengths.Note);
        b.Property(x => x.CreatedBy).HasMaxLength(FieldLengths.UserName);
        b.Property(x => x.LibraryCellName).HasMaxLength(FieldLengths.Name);
        b.HasMany(x => x.StatusChanges).WithOne(x => x.Revision).HasForeignKey(x => x.RevisionId).OnDelete(DeleteBehavior.Restrict);
    }
}
