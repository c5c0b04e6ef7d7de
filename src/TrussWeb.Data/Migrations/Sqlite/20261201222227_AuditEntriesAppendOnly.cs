using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TrussWeb.Data.Migrations.Sqlite
{
    /// <summary>Database triggers that refuse UPDATE and DELETE on the audit log (hand-written SQL).</summary>
    public partial class AuditEntriesAppendOnly : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql(
                "CREATE TRIGGER \"AuditEntries_no_update\" BEFORE UPDATE ON \"AuditEntries\" " +
                "BEGIN SELECT RAISE(ABORT, 'AuditEntries is append-only: rows cannot be updated'); END;");
            migrationBuilder.Sql(
                "CREATE TRIGGER \"AuditEntries_no_delete\" BEFORE DELETE ON \"AuditEntries\" " +
                "BEGIN SELECT RAISE(ABORT, 'AuditEntries is append-only: rows cannot be deleted'); END;");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS \"AuditEntries_no_update\";");
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS \"AuditEntries_no_delete\";");
        }
    }
}
