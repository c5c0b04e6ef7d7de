using TrussWeb.Core.Materials;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Admin;

/// <summary>A grade as typed in the grade form, with its checks (Core's <see cref="SteelGrade.Validate"/>) keyed by input field.</summary>
public sealed class GradeEditModel
{
    public Guid? Id { get; set; }
    public long Version { get; set; }
    public string Name { get; set; } = "";
    public string Standard { get; set; } = "SANS 50025";
    public double FuMPa { get; set; }
    public double EMPa { get; set; } = Material.SansE;
    public double GMPa { get; set; } = Material.SansG;
    public List<BandRow> Bands { get; set; } = [new BandRow()];

    public static GradeEditModel From(GradeView g)
    {
        ArgumentNullException.ThrowIfNull(g);
        return new GradeEditModel
        {
            Id = g.Id,
            Version = g.Version,
            Name = g.Name,
            Standard = g.Standard,
            FuMPa = g.FuMPa,
            EMPa = g.EMPa,
            GMPa = g.GMPa,
            Bands = g.Bands.Select(b => new BandRow { MaxThicknessMm = b.MaxThicknessMm, FyMPa = b.FyMPa }).ToList(),
        };
    }

    public GradeInput ToInput() => new(Id, Version, Name.Trim(), Standard.Trim(), Bands.Select(b => new ThicknessBandView(b.MaxThicknessMm, b.FyMPa)).ToList(), FuMPa, EMPa, GMPa);

    /// <summary>Messages per input field (Name, Bands, FuMPa, EMPa, GMPa); empty when the grade is plausible.</summary>
    public Dictionary<string, string> Validate()
    {
        var grade = new SteelGrade(Name, Standard, Bands.Select(b => new ThicknessBand(b.MaxThicknessMm, b.FyMPa)).ToList(), FuMPa, EMPa, GMPa);
        var errors = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var issue in grade.Validate())
        {
            var field = FieldOf(issue.Field);
            var message = issue.Field == "Fy" ? $"fy {issue.Message}" : issue.Message;
            errors[field] = errors.TryGetValue(field, out var earlier) ? $"{earlier}; {message}" : message;
        }

        return errors;
    }

    /// <summary>Input field for a Core or service field name.</summary>
    public static string FieldOf(string field) => field switch
    {
        nameof(SteelGrade.Fu) or nameof(GradeInput.FuMPa) => nameof(FuMPa),
        nameof(SteelGrade.E) or nameof(GradeInput.EMPa) => nameof(EMPa),
        nameof(SteelGrade.G) or nameof(GradeInput.GMPa) => nameof(GMPa),
        "Fy" => nameof(Bands),
        _ when field.StartsWith(nameof(Bands), StringComparison.Ordinal) => nameof(Bands),
        _ => field,
    };

    public sealed class BandRow
    {
        public double MaxThicknessMm { get; set; }
        public double FyMPa { get; set; }
    }
}
