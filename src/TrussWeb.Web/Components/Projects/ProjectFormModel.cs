using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Projects;

/// <summary>The typed values of the project settings form (kept as typed when a save is refused).</summary>
public sealed class ProjectFormModel
{
    public string Name { get; set; } = string.Empty;

    public string? Client { get; set; }

    public string? Reference { get; set; }

    public string? Location { get; set; }

    public string Revision { get; set; } = "A";

    public string StandardCode { get; set; } = "SANS 10162-1";

    public string? DefaultGradeName { get; set; }

    public static ProjectFormModel From(ProjectDetail p)
    {
        ArgumentNullException.ThrowIfNull(p);
        return new()
        {
            Name = p.Name, Client = p.Client, Reference = p.Reference, Location = p.Location,
            Revision = p.Revision, StandardCode = p.StandardCode, DefaultGradeName = p.DefaultGradeName,
        };
    }

    public ProjectInput ToInput() => new(Name, Client, Reference, Location, Revision, StandardCode, DefaultGradeName);
}
