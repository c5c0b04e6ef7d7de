using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.TrussDesign;

/// <summary>
/// Designs a whole truss for its current sections: self-weight from the sections, loads, analysis of
/// every case and combination, design lengths, and every member checked for its envelope of ultimate
/// combinations (the largest tension and largest compression with their combinations) by the standard.
/// </summary>
public static class TrussDesigner
{
    /// <summary>Issues with the input that stop a design, naming the field.</summary>
    public static IReadOnlyList<ValidationIssue> Validate(TrussDesignInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var issues = new List<ValidationIssue>(TrussModelValidator.Validate(input.Model));
        foreach (var group in input.Model.Members.Select(m => m.Group).Distinct(StringComparer.Ordinal))
        {
            if (!input.Groups.TryGetValue(group, out var settings))
            {
                issues.Add(new ValidationIssue($"Groups[{group}]", $"group '{group}' has members but no design settings"));
            }
            else if (settings.Section is null && input.Model.Members.Any(m => m.Group == group && !input.MemberSections.ContainsKey(m.Id)))
            {
                issues.Add(new ValidationIssue($"Groups[{group}].Section", $"group '{group}' has no section; choose one or size the truss"));
            }
        }

        if (input.Combinations.All(c => c.LimitState != LimitState.Uls))
        {
            issues.Add(new ValidationIssue(nameof(input.Combinations), "at least one ultimate limit state combination is needed"));
        }

        if (!(input.DeflectionLimitDivisor > 0) || !double.IsFinite(input.DeflectionLimitDivisor))
        {
            issues.Add(new ValidationIssue(nameof(input.DeflectionLimitDivisor), $"must be greater than 0 (got {input.DeflectionLimitDivisor})"));
        }

        return issues;
    }

    /// <summary>Designs the truss; <paramref name="withRecords"/> false skips the calculation records (sizing rounds).</summary>
    /// <exception cref="InputValidationException">The input fails <see cref="Validate"/>.</exception>
    public static TrussDesignResult Design(TrussDesignInput input, bool withRecords = true)
    {
        Guard.ThrowIfAny(Validate(input));
        var model = input.Model;
        var sections = model.Members.ToDictionary(m => m.Id, m => SectionOf(input, m), StringComparer.Ordinal);

        var actions = input.Actions with
        {
            MassPerMetreByMember = sections.ToDictionary(p => p.Key, p => p.Value.MassPerMetre, StringComparer.Ordinal),
            MassPerMetreByGroup = new Dictionary<string, double>(),
        };
        var loads = LoadBuilder.Build(model, actions);
        var options = new AnalysisOptions
        {
            DefaultArea = m => sections[m.Id].Area,
            DefaultElasticModulus = input.Grade.E,
            DeflectionLimitDivisor = input.DeflectionLimitDivisor,
        };
        var analysis = TrussSolver.Analyse(model, loads.Cases, input.Combinations, options);
        var lengths = DesignLengthBuilder.Build(model, input.LengthOverrides);

        var outcomes = new List<MemberOutcome>(model.Members.Count);
        foreach (var member in model.Members)
        {
            var section = sections[member.Id];
            var settings = input.Groups[member.Group];
            var designMember = new DesignMember
            {
                Mark = member.Id,
                Section = section,
                Material = input.Grade.For(section.GoverningThickness),
                Lengths = lengths[member.Id],
                Connection = settings.Connection,
                Connectors = section.Family == SectionFamily.DoubleAngle ? settings.Connectors ?? new ConnectorLayout() : null,
                Options = input.MemberOptions.TryGetValue(member.Id, out var o) ? o : settings.Options,
            };
            var envelope = analysis.EnvelopeOf(member.Id);
            var forces = envelope.ToMemberForces();
            var result = input.Standard.CheckMember(designMember, forces, withRecords);
            var length = model.LengthOf(member);
            outcomes.Add(new MemberOutcome(member.Id, member.Group, length, envelope, designMember.Lengths, result,
                GoverningCombination(input.Standard, designMember, forces))
            {
                Section = section,
                Mass = length / 1000 * section.MassPerMetre,
            });
        }

        var status = outcomes.Any(o => o.Design.Status == CheckStatus.Fail) || analysis.Deflections.Any(d => !d.Passes)
            ? CheckStatus.Fail
            : outcomes.Any(o => o.Design.Status == CheckStatus.OutOfScope) ? CheckStatus.OutOfScope : CheckStatus.Pass;
        var totals = outcomes
            .GroupBy(o => sections[o.Mark].Designation, StringComparer.Ordinal)
            .Select(g => new SectionTotal(g.Key, g.Count(), g.Sum(o => o.Length), g.Sum(o => o.Mass)))
            .OrderBy(t => t.Designation, StringComparer.Ordinal)
            .ToList();
        var mass = totals.Sum(t => t.Mass);
        return new TrussDesignResult(analysis, outcomes, loads.Warnings, status, mass, mass * input.Actions.ConnectionAllowance, totals)
        {
            LoadCases = loads.Cases,
        };
    }

    /// <summary>The section a member uses: its own override, else its group's.</summary>
    public static SectionProperties SectionOf(TrussDesignInput input, Member member)
    {
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(member);
        return input.MemberSections.TryGetValue(member.Id, out var own)
            ? own
            : input.Groups[member.Group].Section ?? throw new InputValidationException($"Groups[{member.Group}].Section", $"group '{member.Group}' has no section");
    }

    /// <summary>
    /// The combination behind the governing utilization: the member is checked under its largest
    /// tension alone and its largest compression alone (without records); the larger utilization
    /// names the combination. Independent of how a standard names its checks.
    /// </summary>
    private static string? GoverningCombination(IDesignStandard standard, DesignMember member, MemberForces forces)
    {
        if (forces.Tension <= 0)
        {
            return forces.CompressionCombination;
        }

        if (forces.Compression <= 0)
        {
            return forces.TensionCombination;
        }

        var t = standard.CheckMember(member, forces with { Compression = 0 }, withRecord: false).Utilization;
        var c = standard.CheckMember(member, forces with { Tension = 0 }, withRecord: false).Utilization;
        return c >= t ? forces.CompressionCombination : forces.TensionCombination;
    }
}
