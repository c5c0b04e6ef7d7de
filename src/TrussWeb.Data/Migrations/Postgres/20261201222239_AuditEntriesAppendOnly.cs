using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TrussWeb.Data.Migrations.Postgres
{
    /// <summary>Database triggers that refuse UPDATE, DELETE and TRUNCATE on the audit log (hand-written SQL).</summary>
    public partial class AuditEntriesAppendOnly : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql(
                "CREATE FUNCTION trussweb_audit_append_only() RETURNS trigger LANGUAGE plpgsql AS $$ " +
                "BEGIN RAISE EXCEPTION 'AuditEntries is append-only: % is not allowed', TG_OP; END; $$;");
            migrationBuilder.Sql(
                "CREATE TRIGGER \"AuditEntries_append_only\" BEFORE UPDATE OR DELETE ON \"AuditEntries\" " +
                "FOR EACH ROW EXECUTE FUNCTION trussweb_audit_append_only();");
            migrationBuilder.Sql(
                "CREATE TRIGGER \"AuditEntries_no_truncate\" BEFORE TRUNCATE ON \"AuditEntries\" " +
                "FOR EACH STATEMENT EXECUTE FUNCTION trussweb_audit_append_only();");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS \"AuditEntries_no_truncate\" ON \"AuditEntries\";");
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS \"AuditEntries_append_only\" ON \"AuditEntries\";");
            migrationBuilder.Sql("DROP FUNCTION IF EXISTS trussweb_audit_append_only();");
        }
    }
}
