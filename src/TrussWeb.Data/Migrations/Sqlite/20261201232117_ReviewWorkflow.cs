using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TrussWeb.Data.Migrations.Sqlite
{
    /// <inheritdoc />
    public partial class ReviewWorkflow : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "ApprovedInputsJson",
                table: "TrussMembers",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "ApprovedResultJson",
                table: "TrussMembers",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "DesignerOfRecordId",
                table: "TrussMembers",
                type: "TEXT",
                maxLength: 450,
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "Comment",
                table: "AuditEntries",
                type: "TEXT",
                nullable: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "ApprovedInputsJson",
                table: "TrussMembers");

            migrationBuilder.DropColumn(
                name: "ApprovedResultJson",
                table: "TrussMembers");

            migrationBuilder.DropColumn(
                name: "DesignerOfRecordId",
                table: "TrussMembers");

            migrationBuilder.DropColumn(
                name: "Comment",
                table: "AuditEntries");
        }
    }
}
