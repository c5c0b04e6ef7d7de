using BenchmarkDotNet.Attributes;
using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;

namespace TrussWeb.Benchmarks;

/// <summary>
/// Compression checks of single angles (SANS 10162-1 cl. 13.3 with the flexural-torsional cubic):
/// the resistance alone without and with its calculation record, and the whole member check
/// (slenderness, class, compression) without and with the record. One operation = one angle; the
/// benchmark cycles over 64 catalogue angles at assorted lengths so no single branch is favoured.
/// Targets: 1 000 000 checks/s per core without the record, 100 000/s with it.
/// </summary>
[MemoryDiagnoser]
public class CompressionBenchmarks
{
    private const int Count = 64;
    private readonly Sans10162Standard _standard = new();
    private SectionProperties[] _sections = null!;
    private EffectiveLengths[] _lengths = null!;
    private DesignMember[] _members = null!;
    private readonly Material _steel = new("S355JR", 355, 470, Material.SansE, Material.SansG);
    private readonly MemberForces _forces = new(0, 80_000);

    [GlobalSetup]
    public void Setup()
    {
        var catalogue = SectionCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "sections"));
        var angles = catalogue.OfFamily(SectionFamily.Angle).Select(e => e.Properties).ToArray();
        _sections = Enumerable.Range(0, Count).Select(i => angles[i % angles.Length]).ToArray();
        _lengths = Enumerable.Range(0, Count).Select(i => EffectiveLengths.Uniform(800 + 97.0 * i)).ToArray();
        _members = Enumerable.Range(0, Count).Select(i => new DesignMember
        {
            Mark = "D" + i,
            Section = _sections[i],
            Material = _steel,
            Lengths = _lengths[i],
        }).ToArray();
    }

    [Benchmark(OperationsPerInvoke = Count, Baseline = true)]
    public double ResistanceWithoutRecord()
    {
        var sum = 0.0;
        for (var i = 0; i < Count; i++)
        {
            sum += Compression.Resistance(_sections[i], _steel, _lengths[i], 1.34, _sections[i].Area, null, null).Cr;
        }

        return sum;
    }

    [Benchmark(OperationsPerInvoke = Count)]
    public double ResistanceWithRecord()
    {
        var sum = 0.0;
        for (var i = 0; i < Count; i++)
        {
            var record = new Core.Records.CalcRecord("compression");
            sum += Compression.Resistance(_sections[i], _steel, _lengths[i], 1.34, _sections[i].Area, null, record).Cr + record.Steps.Count;
        }

        return sum;
    }

    [Benchmark(OperationsPerInvoke = Count)]
    public double MemberCheckWithoutRecord()
    {
        var sum = 0.0;
        for (var i = 0; i < Count; i++)
        {
            sum += _standard.CheckMember(_members[i], _forces, withRecord: false).Utilization;
        }

        return sum;
    }

    [Benchmark(OperationsPerInvoke = Count)]
    public double MemberCheckWithRecord()
    {
        var sum = 0.0;
        for (var i = 0; i < Count; i++)
        {
            sum += _standard.CheckMember(_members[i], _forces, withRecord: true).Utilization;
        }

        return sum;
    }
}
