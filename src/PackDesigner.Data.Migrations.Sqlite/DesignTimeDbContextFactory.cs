using Microsoft.EntityFrameworkCore.Design;
using PackDesigner.Data.DependencyInjection;

namespace PackDesigner.Data.Migrations.Sqlite;

/// <summary>
/// Used by <c>dotnet ef</c> when this project is the startup project: always SQLite with this assembly as the
/// migrations assembly, whatever the environment says. The file is never opened for <c>migrations add</c>.
/// </summary>
public sealed class DesignTimeDbContextFactory : IDesignTimeDbContextFactory<PackDesignerDbContext>
{
    public PackDesignerDbContext CreateDbContext(string[] args) =>
        new(PackDesignerDbContextOptions.Create(StorageSettings.ForSqliteFile(Path.Combine(Path.GetTempPath(), "packdesigner-design-time.db"))));
}
