using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Admin;
using TrussWeb.Web.Tests.Support;
using TrussWeb.Web.Tests.Support.MemberPageFakes;

namespace TrussWeb.Web.Tests.Admin;

public class SystemInfoPanelTests : TrussWebTestContext
{
    [Fact]
    public void Shows_the_schema_version_and_pending_migrations_the_service_reports()
    {
        var users = new FakeUserAdminService
        {
            SystemInfo = new SystemInfoView("Microsoft.EntityFrameworkCore.Sqlite", "20261201233500_ReviewWorkflow", 2, "0.1.0.0", "SANS 10162-1", "1.0.0"),
        };
        Services.AddSingleton<IUserAdminService>(users);

        var cut = Render<SystemInfoPanel>();

        cut.WaitForAssertion(() => Assert.Equal("20261201233500_ReviewWorkflow", cut.Find("[data-testid=schema-version]").TextContent));
        Assert.Equal("2", cut.Find("[data-testid=pending-migrations]").TextContent);
        Assert.False(string.IsNullOrWhiteSpace(cut.Find("[data-testid=app-version]").TextContent));
    }
}
