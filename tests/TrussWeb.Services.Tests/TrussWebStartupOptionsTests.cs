using Microsoft.Extensions.Configuration;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Services.Tests;

public sealed class TrussWebStartupOptionsTests
{
    private static IConfiguration Config(params (string Key, string Value)[] values) =>
        new ConfigurationBuilder().AddInMemoryCollection(values.Select(v => new KeyValuePair<string, string?>(v.Key, v.Value))).Build();

    [Fact]
    public void Demo_mode_comes_from_the_command_line_switch_or_the_configuration_key()
    {
        Assert.True(TrussWebStartupOptions.From(Config(), ["--urls", "http://127.0.0.1:1", "--demo"], AppContext.BaseDirectory).Demo);
        Assert.True(TrussWebStartupOptions.From(Config((TrussWebStartupOptions.DemoKey, "true")), [], AppContext.BaseDirectory).Demo);
        Assert.False(TrussWebStartupOptions.From(Config((TrussWebStartupOptions.DemoKey, "false")), ["--demonstrate"], AppContext.BaseDirectory).Demo);
    }

    [Fact]
    public void The_seed_data_folder_and_the_administrator_settings_are_read()
    {
        var options = TrussWebStartupOptions.From(Config((TrussWebStartupOptions.AdminPasswordKey, "configured-pass-1"), (TrussWebStartupOptions.AdminEmailKey, "it@example.test")),
            [], Path.GetTempPath());

        Assert.Equal(Path.Combine(AppContext.BaseDirectory, "seed-data"), options.SeedDataPath);
        Assert.Equal("configured-pass-1", options.AdminPassword);
        Assert.Equal("it@example.test", options.AdminEmail);
        Assert.Null(TrussWebStartupOptions.From(Config((SeedData.PathKey, "/no/such/folder")), [], Path.GetTempPath()).SeedDataPath);
        Assert.Null(TrussWebStartupOptions.From(Config(), [], Path.GetTempPath()).AdminPassword);
    }

    [Fact]
    public void Start_up_migration_is_on_unless_the_key_says_false()
    {
        Assert.True(TrussWebStartupOptions.From(Config(), [], AppContext.BaseDirectory).MigrateOnStart);
        Assert.True(TrussWebStartupOptions.From(Config((TrussWebStartupOptions.MigrateOnStartKey, "true")), [], AppContext.BaseDirectory).MigrateOnStart);
        Assert.False(TrussWebStartupOptions.From(Config((TrussWebStartupOptions.MigrateOnStartKey, "False")), [], AppContext.BaseDirectory).MigrateOnStart);
    }

    [Fact]
    public void An_absolute_web_seed_data_folder_also_serves_seeding_unless_the_seeding_key_is_set()
    {
        var folder = Path.Combine(AppContext.BaseDirectory, "seed-data");
        var moved = Path.Combine(Path.GetTempPath(), "trussweb-seed-" + Guid.NewGuid().ToString("N"));
        Assert.Equal(folder, TrussWebStartupOptions.From(Config((SeedData.FolderKey, folder)), [], moved).SeedDataPath);
        Assert.Null(TrussWebStartupOptions.From(Config((SeedData.FolderKey, folder), (SeedData.PathKey, "/no/such/folder")), [], moved).SeedDataPath);
        Assert.Null(TrussWebStartupOptions.From(Config((SeedData.FolderKey, "/no/such/folder")), [], moved).SeedDataPath);
    }

    [Fact]
    public void Generated_passwords_meet_the_password_rules_and_differ()
    {
        var a = TrussWebStartup.GeneratePassword();
        var b = TrussWebStartup.GeneratePassword();
        Assert.True(a.Length >= ServiceCollectionExtensions.PasswordLength);
        Assert.Contains(a, char.IsAsciiDigit);
        Assert.NotEqual(a, b);
    }
}
