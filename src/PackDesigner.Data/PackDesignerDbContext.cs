using System.Text;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.ChangeTracking;
using PackDesigner.Data.Configurations;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data;

/// <summary>
/// The shop's database: customers, jobs, library cells, designs and their append-only revisions. One model for
/// both providers (SQLite, PostgreSQL); snake_case table and column names so hand-written SQL needs no quoting.
/// </summary>
public sealed class PackDesignerDbContext(DbContextOptions<PackDesignerDbContext> options) : DbContext(options)
{
    public DbSet<Customer> Customers => Set<Customer>();
    public DbSet<Job> Jobs => Set<Job>();
    public DbSet<Cell> Cells => Set<Cell>();
    public DbSet<Design> Designs => Set<Design>();
    public DbSet<DesignRevision> DesignRevisions => Set<DesignRevision>();
    public DbSet<DesignRevisionStatusChange> DesignRevisionStatusChanges => Set<DesignRevisionStatusChange>();

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        configurationBuilder.Properties<DateTime>().HaveConversion<UtcDateTimeConverter>();
        configurationBuilder.Properties<DateTime?>().HaveConversion<UtcDateTimeConverter>();
    }

    protected override void OnModelCreating(ModelBuilder modelBuilder)
    {
        modelBuilder.ApplyConfigurationsFromAssembly(typeof(PackDesignerDbContext).Assembly);
        ApplySnakeCaseNames(modelBuilder);
    }

    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        PrepareSave();
        return base.SaveChanges(acceptAllChangesOnSuccess);
    }

    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        PrepareSave();
        return base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken);
    }

    /// <summary>
    /// Refuses changes to append-only rows, raises the cells' version and refreshes the search keys.
    /// Bulk <c>ExecuteUpdate</c>/<c>ExecuteDelete</c> and raw SQL pass by here: the database triggers catch those.
    /// </summary>
    private void PrepareSave()
    {
        ChangeTracker.DetectChanges();
        foreach (var entry in ChangeTracker.Entries())
        {
            if (entry.Entity is DesignRevision or DesignRevisionStatusChange
                && entry.State is EntityState.Modified or EntityState.Deleted)
            {
                throw new AppendOnlyViolationException(entry.Metadata.ClrType.Name, entry.State);
            }

            if (entry.Entity is Cell && entry.State == EntityState.Modified)
            {
                RaiseVersion(entry.Property(nameof(Cell.Version)));
            }

            if (entry.Entity is ISearchable s && entry.State is EntityState.Added or EntityState.Modified)
            {
                var key = ISearchable.KeyFor(s.SearchSource);
                if (s.SearchKey != key)
                {
                    s.SearchKey = key;
                }
            }
        }
    }

    private static void RaiseVersion(PropertyEntry version)
    {
        // OriginalValue stays what was read, so the UPDATE checks it; CurrentValue is the new token.
        version.CurrentValue = (long)version.OriginalValue! + 1;
    }

    private static void ApplySnakeCaseNames(ModelBuilder modelBuilder)
    {
        foreach (var entity in modelBuilder.Model.GetEntityTypes())
        {
            foreach (var property in entity.GetProperties())
            {
                property.SetColumnName(SnakeCase(property.Name));
            }

            foreach (var key in entity.GetKeys())
            {
                key.SetName(SnakeCase(key.GetDefaultName()!));
            }

            foreach (var fk in entity.GetForeignKeys())
            {
                fk.SetConstraintName(SnakeCase(fk.GetDefaultName()!));
            }

            foreach (var index in entity.GetIndexes())
            {
                index.SetDatabaseName(SnakeCase(index.GetDefaultDatabaseName()!));
            }
        }
    }

    /// <summary><c>LatestRevisionNumber</c> → <c>latest_revision_number</c>; <c>IX_designs_Name</c> → <c>ix_designs_name</c>.</summary>
    internal static string SnakeCase(string name)
    {
        var sb = new StringBuilder(name.Length + 8);
        for (var i = 0; i < name.Length; i++)
        {
            var c = name[i];
            if (char.IsUpper(c))
            {
                var prevLowerOrDigit = i > 0 && (char.IsLower(name[i - 1]) || char.IsDigit(name[i - 1]));
                var nextLower = i > 0 && i + 1 < name.Length && char.IsUpper(name[i - 1]) && char.IsLower(name[i + 1]);
                if (prevLowerOrDigit || nextLower)
                {
                    sb.Append('_');
                }

                sb.Append(char.ToLowerInvariant(c));
            }
            else
            {
                sb.Append(c);
            }
        }

        return sb.ToString();
    }
}
