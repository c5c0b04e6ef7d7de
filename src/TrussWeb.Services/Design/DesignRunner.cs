using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Core.Validation;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Design;

/// <summary>
/// Runs Core's truss design for a mapped truss and turns the result into snapshot rows (one per member,
/// one for the truss) with fingerprints. Core computes; this class only assembles and stores.
/// </summary>
internal static class DesignRunner
{
    public sealed record Outcome(TrussDesignResult Result, IReadOnlyList<DesignSnapshot> Snapshots, DesignSnapshot TrussSnapshot);

    /// <summary>
    /// Designs and replaces the truss's snapshots in <paramref name="db"/> (not saved yet), then applies the
    /// review consequences (designer of record, stale approvals; <see cref="ReviewStaleness"/>) in the same
    /// unit of work. Issues when Core refuses the input; review events to publish after the commit.
    /// </summary>
    public static async Task<(Outcome? Outcome, IReadOnlyList<ValidationIssue> Issues, IReadOnlyList<ReviewEvent> ReviewEvents)> DesignAndStageAsync(
        TrussWebDbContext db, Truss truss, ICallerContext caller, TimeProvider clock, CancellationToken cancellationToken)
    {
        // Snapshots of an existing truss are replaced only under its write lock (TrussWriteLock): otherwise two saves of
        // different rows of one truss would race on these rows, and one would store a design of a state it never saw.
        if (db.Entry(truss).State != EntityState.Added && !TrussWriteLock.IsHeld(db))
        {
            throw new InvalidOperationException($"Truss {truss.Id}: its snapshots are replaced only under the truss write lock; load it with TrussUnitOfWork.LoadForWriteAsync or take TrussWriteLock.AcquireAsync first.");
        }

        var old = await db.DesignSnapshots.Where(s => s.TrussId == truss.Id).ToListAsync(cancellationToken).ConfigureAwait(false);
        var previous = old.Where(s => s.MemberId is not null).ToDictionary(s => s.MemberId!.Value, s => s.Fingerprint);
        db.DesignSnapshots.RemoveRange(old);

        var (context, issues) = await DesignInputBuilder.BuildAsync(db, truss, forSizing: false, cancellationToken).ConfigureAwait(false);
        Outcome? outcome = null;
        if (context is not null)
        {
            try
            {
                outcome = Design(context);
            }
            catch (InputValidationException ex)
            {
                issues = ex.Issues;
            }
        }

        var current = new Dictionary<Guid, string>();
        if (outcome is not null)
        {
            db.DesignSnapshots.AddRange(outcome.Snapshots);
            db.DesignSnapshots.Add(outcome.TrussSnapshot);
            foreach (var s in outcome.Snapshots)
            {
                current[s.MemberId!.Value] = s.Fingerprint;
            }
        }

        var events = ReviewStaleness.Apply(db, truss, previous, current, caller, clock);
        return (outcome, outcome is null ? issues : [], events);
    }

    public static Outcome Design(DesignContext context)
    {
        var input = context.Input;
        var result = TrussDesigner.Design(input, withRecords: true);
        result = ApplyMemberConnectors(context, result);
        var snapshots = new List<DesignSnapshot>();
        var fingerprints = new SortedDictionary<string, string>(StringComparer.Ordinal);
        foreach (var outcome in result.Members)
        {
            var member = context.MembersByMark[outcome.Mark];
            var (inputs, results) = Documents(context, outcome);
            var fingerprint = DesignFingerprint.Compute(inputs, results);
            fingerprints[outcome.Mark] = fingerprint;
            snapshots.Add(new DesignSnapshot
            {
                TrussId = context.Truss.Id,
                MemberId = member.Id,
                Fingerprint = fingerprint,
                CoreVersion = DesignFingerprint.CoreVersion,
                StandardCode = input.Standard.Code,
                StandardVersion = input.Standard.Version,
                InputsJson = Json.Write(inputs),
                ResultJson = Json.Write(results),
                Utilization = double.IsFinite(outcome.Design.Utilization) ? outcome.Design.Utilization : null,
                Status = outcome.Design.Status.ToString(),
            });
        }

        var trussInputs = TrussDocument(context);
        var trussResults = new TrussResultDoc(
            result.Status.ToString(),
            result.MaxUtilization,
            result.Mass,
            result.MassWithAllowance,
            result.Totals.Select(t => new SectionTotalView(t.Designation, t.Count, t.Length, t.Mass)).ToList(),
            result.Warnings.Select(w => new FieldError(w.Field, w.Message)).ToList(),
            result.Analysis.Deflections.Select(d => $"{d.Combination} {d.Node}: {d.Deflection:R} mm / limit {d.Limit:R} mm {(d.Passes ? "OK" : "exceeded")}").ToList(),
            fingerprints);
        var trussSnapshot = new DesignSnapshot
        {
            TrussId = context.Truss.Id,
            MemberId = null,
            Fingerprint = DesignFingerprint.Compute(trussInputs, trussResults),
            CoreVersion = DesignFingerprint.CoreVersion,
            StandardCode = input.Standard.Code,
            StandardVersion = input.Standard.Version,
            InputsJson = Json.Write(trussInputs),
            ResultJson = Json.Write(trussResults),
            Utilization = double.IsFinite(result.MaxUtilization) ? result.MaxUtilization : null,
            Status = result.Status.ToString(),
        };
        return new Outcome(result, snapshots, trussSnapshot);
    }

    /// <summary>
    /// Core takes connectors per group; a member with its own connector layout is checked again by the
    /// standard with the same section, material, lengths and forces and that layout.
    /// </summary>
    private static TrussDesignResult ApplyMemberConnectors(DesignContext context, TrussDesignResult result)
    {
        if (context.MemberConnectors.Count == 0)
        {
            return result;
        }

        var input = context.Input;
        var members = result.Members.Select(o =>
        {
            if (!context.MemberConnectors.TryGetValue(o.Mark, out var layout))
            {
                return o;
            }

            var section = TrussDesigner.SectionOf(input, input.Model.Members.First(m => m.Id == o.Mark));
            if (section.Family != SectionFamily.DoubleAngle)
            {
                return o;
            }

            var settings = input.Groups[o.Group];
            var designMember = new DesignMember
            {
                Mark = o.Mark,
                Section = section,
                Material = input.Grade.For(section.GoverningThickness),
                Lengths = o.Lengths,
                Connection = settings.Connection,
                Connectors = layout,
                Options = input.MemberOptions.TryGetValue(o.Mark, out var opt) ? opt : settings.Options,
            };
            return o with { Design = input.Standard.CheckMember(designMember, o.Envelope.ToMemberForces(), withRecord: true) };
        }).ToList();
        var status = members.Any(o => o.Design.Status == CheckStatus.Fail) || result.Analysis.Deflections.Any(d => !d.Passes)
            ? CheckStatus.Fail
            : members.Any(o => o.Design.Status == CheckStatus.OutOfScope) ? CheckStatus.OutOfScope : CheckStatus.Pass;
        return result with { Members = members, Status = status };
    }

    private static (MemberInputsDoc Inputs, MemberResultDoc Results) Documents(DesignContext context, MemberOutcome outcome)
    {
        var input = context.Input;
        var coreMember = input.Model.Members.First(m => m.Id == outcome.Mark);
        var section = TrussDesigner.SectionOf(input, coreMember);
        var resolved = context.MemberSections.TryGetValue(outcome.Mark, out var own) ? own
            : context.GroupSections.GetValueOrDefault(outcome.Group) is { } g && g.Properties.Designation == section.Designation ? g
            : context.Sections.ResolveChosen(section, input.Groups[outcome.Group].DoubleAngleGap, input.Groups[outcome.Group].Orientation);
        var material = input.Grade.For(section.GoverningThickness);
        var settings = input.Groups[outcome.Group];
        var connectors = section.Family == SectionFamily.DoubleAngle
            ? context.MemberConnectors.GetValueOrDefault(outcome.Mark) ?? settings.Connectors ?? new ConnectorLayout()
            : null;
        var l = outcome.Lengths;
        var e = outcome.Envelope;
        var inputs = new MemberInputsDoc(
            outcome.Mark,
            outcome.Group,
            outcome.Length,
            resolved.ToDoc() with { Designation = section.Designation },
            new MaterialDoc(material.Grade, material.Fy, material.Fu, material.E, material.G),
            new LengthsView(l.Lx, l.Ly, l.Lz, l.Kx, l.Ky, l.Kz, l.KLu, l.KLv, l.LxSource, l.LySource, l.LzSource),
            connectors,
            input.MemberOptions.TryGetValue(outcome.Mark, out var o) ? o : settings.Options,
            new ForcesView(e.MaxTension, e.TensionCombination, e.MaxCompression, e.CompressionCombination),
            input.Standard.Code,
            input.Standard.Version,
            DesignFingerprint.CoreVersion);
        var d = outcome.Design;
        var record = d.Record;
        var results = new MemberResultDoc(
            d.Utilization,
            d.GoverningCheck,
            outcome.GoverningCombination,
            d.Status.ToString(),
            d.Checks.Select(c => new CheckView(c.Name, c.Demand, c.Resistance, c.Utilization, c.Status.ToString(), c.Unit, c.Reference)).ToList(),
            record?.Steps.Select(s => new StepView(record.Title, s.Symbol, s.Description, s.Expression, s.Substituted, s.Value, s.Unit, s.Reference)).ToList() ?? [],
            record?.Notes.ToList() ?? []);
        return (inputs, results);
    }

    private static TrussInputsDoc TrussDocument(DesignContext context)
    {
        var input = context.Input;
        var model = input.Model;
        static string N(double v) => v.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        return new TrussInputsDoc(
            model.Name,
            model.Span,
            model.TrussSpacing,
            input.DeflectionLimitDivisor,
            input.Actions.ConnectionAllowance,
            model.Nodes.Select(n => $"{n.Id} {N(n.X)} {N(n.Y)}").ToList(),
            model.Members.Select(m => $"{m.Id} {m.StartNode} {m.EndNode} {m.Group}").ToList(),
            model.Supports.Select(s => $"{s.Node} {s.Kind}").ToList(),
            model.LateralRestraints,
            model.PurlinNodes,
            input.Actions,
            input.Combinations.Select(c => new CombinationDoc(c.Name, c.LimitState,
                new SortedDictionary<string, double>(
                    c.KindFactors.ToDictionary(p => $"kind:{p.Key}", p => p.Value)
                        .Concat((c.CaseFactors ?? new Dictionary<string, double>()).ToDictionary(p => $"case:{p.Key}", p => p.Value))
                        .ToDictionary(p => p.Key, p => p.Value), StringComparer.Ordinal))).ToList(),
            input.Grade.Name,
            input.Standard.Code,
            input.Standard.Version,
            DesignFingerprint.CoreVersion);
    }
}
