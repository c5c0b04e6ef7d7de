using TrussWeb.Core.Design;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;

namespace TrussWeb.Services.Tests;

/// <summary>The fingerprint is a pure function of the normalised inputs, results and versions.</summary>
public sealed class DesignFingerprintTests
{
    private static MemberInputsDoc Inputs() => new(
        "TC1", "TopChord", 1553.2,
        new SectionDoc("2L50x50x5 s=10", SectionFamily.DoubleAngle, new SortedDictionary<string, double>(StringComparer.Ordinal) { ["b"] = 50, ["d"] = 50, ["r1"] = 7, ["r2"] = 3.5, ["t"] = 5 },
            10, BackToBack.EqualLegs, 960, 7.54),
        new MaterialDoc("S355JR", 355, 470, 200000, 77000),
        new LengthsView(1553.2, 3106.4, 3106.4, 1, 1, 1, null, null, "node to node", "between restraints", "equal to the out-of-plane length"),
        new ConnectorLayout(), new DesignOptions(),
        new ForcesView(0, null, 48123.25, "1.2D + 1.6Q"),
        "SANS 10162-1", "1.0.0", "0.1.0.0");

    private static MemberResultDoc Results() => new(0.81, "Compression", "1.2D + 1.6Q", "Pass",
        [new CheckView("Compression", 48123.25, 59411.4, 0.81, "Pass", "N", "cl. 13.3")], [], []);

    [Fact]
    public void Identical_inputs_give_identical_fingerprints()
    {
        Assert.Equal(DesignFingerprint.Compute(Inputs(), Results()), DesignFingerprint.Compute(Inputs(), Results()));
        Assert.Matches("^[0-9a-f]{64}$", DesignFingerprint.Compute(Inputs(), Results()));
    }

    [Fact]
    public void The_record_text_does_not_enter_the_fingerprint_but_the_results_do()
    {
        var withSteps = Results() with { Steps = [new StepView("TC1", "Cr", "Resistance", "φAFy", "...", 1, "N", "cl. 13.3")], Notes = ["a note"] };
        Assert.Equal(DesignFingerprint.Compute(Inputs(), Results()), DesignFingerprint.Compute(Inputs(), withSteps));
        Assert.NotEqual(DesignFingerprint.Compute(Inputs(), Results()), DesignFingerprint.Compute(Inputs(), Results() with { Utilization = 0.82 }));
    }

    public static TheoryData<string> Changes() => ["standard version", "standard code", "core version", "dimension", "fy", "E", "force", "combination", "K", "options", "connectors", "gap"];

    [Theory]
    [MemberData(nameof(Changes))]
    public void Any_change_of_a_normalised_input_gives_a_different_fingerprint(string change)
    {
        var i = Inputs();
        var changed = change switch
        {
            "standard version" => i with { StandardVersion = "1.0.1" },
            "standard code" => i with { StandardCode = "SANS 10162-2" },
            "core version" => i with { CoreVersion = "0.2.0.0" },
            "dimension" => i with { Section = i.Section with { Dimensions = new SortedDictionary<string, double>(i.Section.Dimensions, StringComparer.Ordinal) { ["r1"] = 7.5 } } },
            "fy" => i with { Material = i.Material with { FyMPa = 345 } },
            "E" => i with { Material = i.Material with { EMPa = 205000 } },
            "force" => i with { Forces = i.Forces with { MaxCompressionN = 48123.26 } },
            "combination" => i with { Forces = i.Forces with { CompressionCombination = "1.35D" } },
            "K" => i with { Lengths = i.Lengths with { Ky = 0.9 } },
            "options" => i with { Options = new DesignOptions { FirstWebMemberFactor = true } },
            "connectors" => i with { Connectors = new ConnectorLayout { IntermediateCount = 2 } },
            "gap" => i with { Section = i.Section with { Gap = 12 } },
            _ => throw new ArgumentOutOfRangeException(nameof(change)),
        };

        Assert.NotEqual(DesignFingerprint.Compute(i, Results()), DesignFingerprint.Compute(changed, Results()));
    }
}
