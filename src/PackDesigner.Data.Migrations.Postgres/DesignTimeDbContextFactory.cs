using Microsoft.EntityFrameworkCore.Design;
using PackDesigner.Data.DependencyInjection;

namespace PackDesigner.Data.Migrations.Postgres;

/// <summary>
/// Used by <c>dotnet ef</c> when this project is the startup project: always Npgsql with this assembly as the
/// migrations assembly, whatever the environment says. No connection is opened for <c>migrations add</c>,
/// <c>migrations script</c> or <c>has-pending-model-changes</c>.
/// </summary>
public sealed class DesignTimeDbContextFactory : IDesignTimeDbContextFactory<PackDesignerDbContext>
{
    public PackDesignerDbContext CreateDbContext(string[] args) =>
        new(PackDesignerDbContextOptions.Create(StorageSettings.ForPostgres("Host=127.0.0.1;Database=packdesigner_design_time;Username=postgres")));
}
