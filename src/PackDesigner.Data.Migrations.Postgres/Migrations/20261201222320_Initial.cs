using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace PackDesigner.Data.Migrations.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class Initial : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "cells",
                columns: table => new
                {
                    id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    name = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    search_key = table.Column<string>(type: "character varying(602)", maxLength: 602, nullable: false),
                    maker = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    model = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    notes = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    chemistry = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    capacity_ah = table.Column<double>(type: "double precision", nullable: true),
                    nominal_voltage = table.Column<double>(type: "double precision", nullable: true),
                    max_charge_voltage = table.Column<double>(type: "double precision", nullable: true),
                    min_discharge_voltage = table.Column<double>(type: "double precision", nullable: true),
                    max_charge_current_a = table.Column<double>(type: "double precision", nullable: true),
                    max_discharge_current_a = table.Column<double>(type: "double precision", nullable: true),
                    peak_discharge_current_a = table.Column<double>(type: "double precision", nullable: true),
                    peak_discharge_duration_s = table.Column<double>(type: "double precision", nullable: true),
                    internal_resistance_milliohm = table.Column<double>(type: "double precision", nullable: true),
                    cold_internal_resistance_milliohm = table.Column<double>(type: "double precision", nullable: true),
                    cold_resistance_temperature_c = table.Column<double>(type: "double precision", nullable: true),
                    mass_kg = table.Column<double>(type: "double precision", nullable: true),
                    capacity_tolerance_percent = table.Column<double>(type: "double precision", nullable: true),
                    charge_temperature_min_c = table.Column<double>(type: "double precision", nullable: true),
                    charge_temperature_max_c = table.Column<double>(type: "double precision", nullable: true),
                    discharge_temperature_min_c = table.Column<double>(type: "double precision", nullable: true),
                    discharge_temperature_max_c = table.Column<double>(type: "double precision", nullable: true),
                    termination_current_a = table.Column<double>(type: "double precision", nullable: true),
                    ocv_curve_json = table.Column<string>(type: "text", nullable: true),
                    created_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    updated_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("pk_cells", x => x.id);
                });

            migrationBuilder.CreateTable(
                name: "customers",
                columns: table => new
                {
                    id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    name = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    search_key = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    contact = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: true),
                    notes = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    created_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    updated_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("pk_customers", x => x.id);
                });

            migrationBuilder.CreateTable(
                name: "jobs",
                columns: table => new
                {
                    id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    customer_id = table.Column<int>(type: "integer", nullable: false),
                    title = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    vehicle_or_system = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    notes = table.Column<string>(type: "character varying(4000)", maxLength: 4000, nullable: true),
                    created_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    updated_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("pk_jobs", x => x.id);
                    table.ForeignKey(
                        name: "fk_jobs_customers_customer_id",
                        column: x => x.customer_id,
                        principalTable: "customers",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "designs",
                columns: table => new
                {
                    id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    name = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    search_key = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    customer_id = table.Column<int>(type: "integer", nullable: true),
                    job_id = table.Column<int>(type: "integer", nullable: true),
                    cell_id = table.Column<int>(type: "integer", nullable: true),
                    created_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    updated_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    latest_revision_number = table.Column<int>(type: "integer", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("pk_designs", x => x.id);
                    table.ForeignKey(
                        name: "fk_designs_cells_cell_id",
                        column: x => x.cell_id,
                        principalTable: "cells",
                        principalColumn: "id",
                        onDelete: ReferentialAction.SetNull);
                    table.ForeignKey(
                        name: "fk_designs_customers_customer_id",
                        column: x => x.customer_id,
                        principalTable: "customers",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "fk_designs_jobs_job_id",
                        column: x => x.job_id,
                        principalTable: "jobs",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "design_revisions",
                columns: table => new
                {
                    id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    design_id = table.Column<int>(type: "integer", nullable: false),
                    number = table.Column<int>(type: "integer", nullable: false),
                    input_json = table.Column<string>(type: "text", nullable: false),
                    input_sha256 = table.Column<string>(type: "character(64)", fixedLength: true, maxLength: 64, nullable: false),
                    result_json = table.Column<string>(type: "text", nullable: false),
                    calculation_version = table.Column<string>(type: "character varying(32)", maxLength: 32, nullable: false),
                    series = table.Column<int>(type: "integer", nullable: false),
                    parallel = table.Column<int>(type: "integer", nullable: false),
                    status = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    note = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true),
                    created_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    created_by = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    library_cell_id = table.Column<int>(type: "integer", nullable: true),
                    library_cell_updated_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true),
                    library_cell_name = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("pk_design_revisions", x => x.id);
                    table.ForeignKey(
                        name: "fk_design_revisions_designs_design_id",
                        column: x => x.design_id,
                        principalTable: "designs",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "design_revision_status_changes",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    revision_id = table.Column<int>(type: "integer", nullable: false),
                    sequence = table.Column<int>(type: "integer", nullable: false),
                    status = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    changed_by = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    changed_utc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    note = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("pk_design_revision_status_changes", x => x.id);
                    table.ForeignKey(
                        name: "fk_design_revision_status_changes_design_revisions_revision_id",
                        column: x => x.revision_id,
                        principalTable: "design_revisions",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateIndex(
                name: "ix_cells_search_key",
                table: "cells",
                column: "search_key");

            migrationBuilder.CreateIndex(
                name: "ix_customers_search_key",
                table: "customers",
                column: "search_key");

            migrationBuilder.CreateIndex(
                name: "ix_design_revision_status_changes_revision_id_sequence",
                table: "design_revision_status_changes",
                columns: new[] { "revision_id", "sequence" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "ix_design_revisions_design_id_number",
                table: "design_revisions",
                columns: new[] { "design_id", "number" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "ix_designs_cell_id",
                table: "designs",
                column: "cell_id");

            migrationBuilder.CreateIndex(
                name: "ix_designs_customer_id",
                table: "designs",
                column: "customer_id");

            migrationBuilder.CreateIndex(
                name: "ix_designs_job_id",
                table: "designs",
                column: "job_id");

            migrationBuilder.CreateIndex(
                name: "ix_designs_search_key",
                table: "designs",
                column: "search_key");

            migrationBuilder.CreateIndex(
                name: "ix_designs_updated_utc",
                table: "designs",
                column: "updated_utc");

            migrationBuilder.CreateIndex(
                name: "ix_jobs_customer_id",
                table: "jobs",
                column: "customer_id");

            AppendOnlyTriggers.Create(migrationBuilder);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            AppendOnlyTriggers.Drop(migrationBuilder);

            migrationBuilder.DropTable(
                name: "design_revision_status_changes");

            migrationBuilder.DropTable(
                name: "design_revisions");

            migrationBuilder.DropTable(
                name: "designs");

            migrationBuilder.DropTable(
                name: "cells");

            migrationBuilder.DropTable(
                name: "jobs");

            migrationBuilder.DropTable(
                name: "customers");
        }
    }
}
