using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

/// <summary>Small builder of <see cref="DesignMember"/>s for the SANS 10162-1 tests.</summary>
internal sealed class MemberBuilder
{
    private SectionProperties _section = SectionBuilder.L4x3x3_8();
    private Material _material = new("350W", 350, 450, Material.SansE, Material.SansG);
    private EffectiveLengths _lengths = EffectiveLengths.Uniform(2000);
    private TensionConnection? _connection;
    private ConnectorLayout? _connectors;
    private DesignOptions _options = new();

    public MemberBuilder Section(SectionProperties s)
    {
        _section = s;
        return this;
    }

    public MemberBuilder Steel(double fy, double fu, string grade = "test grade")
    {
        _material = new Material(grade, fy, fu, Material.SansE, Material.SansG);
        return this;
    }

    public MemberBuilder Lengths(EffectiveLengths l)
    {
        _lengths = l;
        return this;
    }

    public MemberBuilder Length(double l) => Lengths(EffectiveLengths.Uniform(l));

    public MemberBuilder Connection(TensionConnection c)
    {
        _connection = c;
        return this;
    }

    public MemberBuilder Connectors(ConnectorLayout c)
    {
        _connectors = c;
        return this;
    }

    public MemberBuilder Options(DesignOptions o)
    {
        _options = o;
        return this;
    }

    public DesignMember Build() => new()
    {
        Mark = "W1",
        Section = _section,
        Material = _material,
        Lengths = _lengths,
        Connection = _connection,
        Connectors = _connectors,
        Options = _options,
    };

    /// <summary>The AC40 strut: 2L89x64x7.9 SLBB, Fy 300 MPa, L = 3000 mm, K = 1 (REFERENCES.md §3).</summary>
    public static MemberBuilder Ac40() => new MemberBuilder()
        .Section(SectionBuilder.Ac40DoubleAngle())
        .Steel(300, 450, "300W")
        .Length(3000);
}
