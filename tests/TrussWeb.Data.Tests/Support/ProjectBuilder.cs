using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Tests.Support;

/// <summary>
/// Builds a small invented project: one 9 m pitched truss with 4 nodes, 2 supports, 2 groups,
/// 5 members, actions, a point load, 2 combinations and 2 snapshots.
/// </summary>
public static class ProjectBuilder
{
    public const string Fingerprint = "0f3c9a4be1d2c8a7f6e5d4c3b2a1908f7e6d5c4b3a29180f7e6d5c4b3a291800";

    public static Project Build(string? memberUserId = null)
    {
        var project = new Project
        {
            Name = "Warehouse roof",
            Client = "Example Logistics",
            Reference = "J-2041",
            Location = "Midrand",
            Revision = "A",
            StandardCode = "SANS 10162-1",
            DefaultGradeName = "S355JR",
            Units = "SI-kN-m",
        };
        if (memberUserId is not null)
        {
            project.Memberships.Add(new ProjectMembership { UserId = memberUserId, Role = Roles.ProjectLead });
        }

        var truss = new Truss
        {
            Name = "T1",
            Kind = "Pratt",
            GeneratorParametersJson = """{"panels":2,"pitchDeg":10}""",
            SpanMm = 9000,
            SpacingMm = 6000,
            PurlinSpacingMm = 1500.5,
            DeflectionLimitRatio = 250,
            ConnectionAllowanceFraction = 0.1,
            Notes = "Invented truss for tests.",
        };
        project.Trusses.Add(truss);

        var n1 = new TrussNode { Label = "N1", XMm = 0, YMm = 0, IsPurlinPoint = true, IsLaterallyRestrained = true };
        var n2 = new TrussNode { Label = "N2", XMm = 4500, YMm = 0 };
        var n3 = new TrussNode { Label = "N3", XMm = 9000, YMm = 0, IsPurlinPoint = true, IsLaterallyRestrained = true };
        var n4 = new TrussNode { Label = "N4", XMm = 4500, YMm = 793.4567, IsPurlinPoint = true };
        n1.Support = new TrussSupport { Kind = SupportKind.Pin };
        n3.Support = new TrussSupport { Kind = SupportKind.RollerX };
        truss.Nodes.AddRange([n1, n2, n3, n4]);

        var chords = new MemberGroup
        {
            Name = "Chords",
            Role = "TopChord",
            AllowedSectionsJson = """{"families":["DoubleAngle"],"maxLegMm":100}""",
            GradeName = "S355JR",
            SectionDesignation = "2L 60x60x6",
            DoubleAngleGapMm = 10,
            BackToBackOrientation = "EqualLegs",
        };
        var webs = new MemberGroup { Name = "Webs", Role = "Web", GradeName = "S355JR" };
        truss.Groups.AddRange([chords, webs]);

        truss.Members.AddRange(
        [
            new TrussMember { Mark = "T1", StartNode = n1, EndNode = n4, Group = chords, Kx = 0.9, LengthYMm = 4571.3, SubmittedUtc = new DateTime(2026, 3, 1, 12, 0, 0, DateTimeKind.Unspecified), ConnectorCount = 3, ConnectorSpacingMm = 1100, UseModifiedSlenderness = true },
            new TrussMember { Mark = "T2", StartNode = n4, EndNode = n3, Group = chords },
            new TrussMember { Mark = "B1", StartNode = n1, EndNode = n2, Group = chords },
            new TrussMember { Mark = "B2", StartNode = n2, EndNode = n3, Group = chords },
            new TrussMember
            {
                Mark = "W1", StartNode = n2, EndNode = n4, Group = webs, SectionDesignationOverride = "L 50x50x5",
                KLuMm = 700, KLvMm = 650.25, ConnectionDetailsJson = """{"bolts":2,"diameterMm":16}""",
                OptionsJson = """{"tensionOnly":false}""",
            },
        ]);

        truss.Actions = new TrussActions
        {
            CoveringKPa = 0.1,
            PurlinsAndServicesKPa = 0.15,
            ImposedKPa = 0.25,
            WindCasesJson = """[{"name":"W1","leftSlopeKPa":-0.6,"rightSlopeKPa":-0.4}]""",
        };
        truss.PointLoads.Add(new PointLoad { Node = n2, CaseName = "Services", FxN = 0, FyN = -2500.5 });
        truss.Combinations.AddRange(
        [
            new LoadCombination { Name = "1.2D + 1.6L", LimitState = LimitState.Uls, FactorsJson = """{"D":1.2,"L":1.6}""", SortOrder = 1 },
            new LoadCombination { Name = "1.1D + 1.0L", LimitState = LimitState.Sls, FactorsJson = """{"D":1.1,"L":1.0}""", SortOrder = 2 },
        ]);
        return project;
    }

    public static DesignSnapshot Snapshot(Truss truss, TrussMember? member) => new()
    {
        Truss = truss,
        Member = member,
        Fingerprint = Fingerprint,
        CoreVersion = "0.1.0",
        StandardCode = "SANS 10162-1",
        StandardVersion = "2011",
        InputsJson = """{"mark":"W1","forceN":-12345.6}""",
        ResultJson = """{"steps":[{"symbol":"Cr","value":45678.9,"unit":"N"}]}""",
        Utilization = 0.27031,
        Status = "Pass",
    };
}
