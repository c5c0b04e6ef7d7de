using Microsoft.Extensions.Options;

namespace TrussWeb.Web.Options;

/// <summary>Checks on start that the seed-data folder can be found, naming the configuration key when not.</summary>
public sealed class TrussWebOptionsValidator(IHostEnvironment environment) : IValidateOptions<TrussWebOptions>
{
    public ValidateOptionsResult Validate(string? name, TrussWebOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (string.IsNullOrWhiteSpace(options.SeedDataFolder))
        {
            return ValidateOptionsResult.Fail($"{TrussWebOptions.SeedDataKey} must name the seed-data folder");
        }

        return CatalogueServiceExtensions.ResolveSeedDataFolder(options.SeedDataFolder, environment.ContentRootPath, AppContext.BaseDirectory) is null
            ? ValidateOptionsResult.Fail(
                $"{TrussWebOptions.SeedDataKey} = '{options.SeedDataFolder}': no such folder under the content root '{environment.ContentRootPath}' " +
                $"or above '{AppContext.BaseDirectory}'")
            : ValidateOptionsResult.Success;
    }
}
