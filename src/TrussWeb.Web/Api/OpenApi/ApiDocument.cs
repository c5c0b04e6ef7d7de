using System.Text.Json.Nodes;
using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace TrussWeb.Web.Api.OpenApi;

/// <summary>
/// The OpenAPI document at /openapi/v1.json: only the /api routes, the bearer security scheme on every
/// operation, and an example body for each request that takes one.
/// </summary>
public static class ApiDocument
{
    public const string SchemeId = "bearer";

    public static void Configure(OpenApiOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        options.ShouldInclude = d => d.RelativePath?.StartsWith("api/", StringComparison.OrdinalIgnoreCase) == true;
        options.AddDocumentTransformer((document, _, _) =>
        {
            document.Info = new OpenApiInfo
            {
                Title = "TrussWeb API",
                Version = "v1",
                Description = "Projects, trusses, members, stateless member checks and truss analysis, review actions. Units: mm, N, MPa, kPa. " +
                    "Authenticate with a personal access token: Authorization: Bearer <token>. Errors are RFC 9457 problem details. " + Core.Caution.Text,
            };
            document.Components ??= new OpenApiComponents();
            document.Components.SecuritySchemes ??= new Dictionary<string, IOpenApiSecurityScheme>();
            document.Components.SecuritySchemes[SchemeId] = new OpenApiSecurityScheme
            {
                Type = SecuritySchemeType.Http,
                Scheme = "bearer",
                BearerFormat = "TrussWeb personal access token (tw_…)",
                Description = "Create a token on your profile page (/account/profile) or with the create-token admin verb.",
            };
            return Task.CompletedTask;
        });
        options.AddOperationTransformer((operation, context, _) =>
        {
            operation.Security ??= [];
            operation.Security.Add(new OpenApiSecurityRequirement { [new OpenApiSecuritySchemeReference(SchemeId, context.Document)] = [] });
            var name = context.Description.ActionDescriptor.EndpointMetadata.OfType<IEndpointNameMetadata>().FirstOrDefault()?.EndpointName;
            if (name is not null && ApiExamples.Requests.TryGetValue(name, out var example) && operation.RequestBody?.Content is { } content
                && content.TryGetValue("application/json", out var media))
            {
                media.Example = JsonNode.Parse(example);
            }

            return Task.CompletedTask;
        });
    }
}
