using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Members;

/// <summary>What the user types on the member page: the overrides as editable values (null = use the default).</summary>
public sealed class MemberEditModel
{
    public string? SectionOverride { get; set; }
    public double? Kx { get; set; }
    public double? Ky { get; set; }
    public double? Kz { get; set; }
    public double? LengthXMm { get; set; }
    public double? LengthYMm { get; set; }
    public double? LengthZMm { get; set; }
    public double? KLuMm { get; set; }
    public double? KLvMm { get; set; }
    public int? ConnectorCount { get; set; }
    public double? ConnectorSpacingMm { get; set; }
    public bool UseModifiedSlenderness { get; set; }

    public static MemberEditModel From(MemberOverrides o)
    {
        ArgumentNullException.ThrowIfNull(o);
        return new MemberEditModel
        {
            SectionOverride = o.SectionOverride,
            Kx = o.Kx,
            Ky = o.Ky,
            Kz = o.Kz,
            LengthXMm = o.LengthXMm,
            LengthYMm = o.LengthYMm,
            LengthZMm = o.LengthZMm,
            KLuMm = o.KLuMm,
            KLvMm = o.KLvMm,
            ConnectorCount = o.ConnectorCount,
            ConnectorSpacingMm = o.ConnectorSpacingMm,
            UseModifiedSlenderness = o.UseModifiedSlenderness,
        };
    }

    public MemberOverrides ToOverrides() => new(
        string.IsNullOrWhiteSpace(SectionOverride) ? null : SectionOverride.Trim(),
        Kx, Ky, Kz, LengthXMm, LengthYMm, LengthZMm, KLuMm, KLvMm, ConnectorCount, ConnectorSpacingMm, UseModifiedSlenderness);
}
