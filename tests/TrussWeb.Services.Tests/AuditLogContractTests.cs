using System.Reflection;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Tests;

/// <summary>
/// Nothing in the service contracts can address an audit entry: the only audit methods read or export, and
/// no method takes an audit id (a long other than a row version) or an audit row.
/// </summary>
public sealed class AuditLogContractTests
{
    [Fact]
    public void No_service_method_takes_an_audit_entry_or_changes_the_log()
    {
        var methods = AuthorizationTableTests.InterfaceMethods().ToList();
        var auditMethods = methods.Where(m => m.Contains("Audit", StringComparison.Ordinal)).ToList();
        var parameters = typeof(IProjectService).Assembly.GetTypes()
            .Where(t => t.IsInterface && t.Namespace == typeof(IProjectService).Namespace && t.Name.EndsWith("Service", StringComparison.Ordinal))
            .SelectMany(t => t.GetMethods(BindingFlags.Public | BindingFlags.Instance)).SelectMany(m => m.GetParameters()).ToList();

        Assert.Equal(["IReviewService.ExportAuditCsvAsync", "IReviewService.GetAuditAsync"], auditMethods.Order(StringComparer.Ordinal));
        Assert.DoesNotContain(parameters, p => p.Name!.Contains("audit", StringComparison.OrdinalIgnoreCase)
            || p.ParameterType == typeof(AuditEntryView) || p.ParameterType == typeof(AuditEntry)
            || (p.ParameterType == typeof(long) && p.Name != "version"));
    }
}
