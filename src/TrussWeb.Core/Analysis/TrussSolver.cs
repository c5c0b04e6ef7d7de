using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Analysis;

/// <summary>
/// Linear direct-stiffness analysis of a plane pin-jointed truss, 2 DOF per node, member stiffness
/// EA/L along its axis. Nodes are renumbered by Reverse Cuthill–McKee and the banded stiffness matrix
/// is factorised once (<see cref="BandedLdlt"/>, LDLᵀ) and reused for every load case; combinations
/// are superposed from the case results (linear analysis).
/// Member force N = (EA/L)·(Δu·c + Δv·s), tension positive. Reactions come from nodal equilibrium:
/// R = −F − Σ(member forces on the node), so their sum balances the applied loads to round-off.
/// A model that fails <see cref="TrussModelValidator"/> (including a mechanism) is rejected with an
/// <see cref="InputValidationException"/> naming the problem; no NaN is ever returned.
/// </summary>
public static class TrussSolver
{
    /// <summary>Relative size below which a member force is round-off and is shown as zero (2026-12-01 choice: far above double precision noise, far below any design force).</summary>
    public const double RoundOffRelative = 1e-12;

    /// <summary>Smallest member area the solver accepts, mm² (below it the stiffness matrix loses meaning).</summary>
    public const double MinAreaMm2 = 1;

    /// <summary>Largest member area the solver accepts, mm² (10 m²; any steel section is far smaller).</summary>
    public const double MaxAreaMm2 = 1e7;

    /// <summary>As <see cref="Analyse"/>, but returns the issues instead of throwing when the input is invalid.</summary>
    public static bool TryAnalyse(TrussModel model, IReadOnlyList<LoadCase> cases, IReadOnlyList<LoadCombination> combinations, AnalysisOptions options,
        out AnalysisResult? result, out IReadOnlyList<ValidationIssue> issues)
    {
        try
        {
            result = Analyse(model, cases, combinations, options);
            issues = [];
            return true;
        }
        catch (InputValidationException ex)
        {
            result = null;
            issues = ex.Issues;
            return false;
        }
    }

    /// <summary>Analyses the model for every case and combination; throws <see cref="InputValidationException"/> naming every problem.</summary>
    public static AnalysisResult Analyse(TrussModel model, IReadOnlyList<LoadCase> cases, IReadOnlyList<LoadCombination> combinations, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(cases);
        ArgumentNullException.ThrowIfNull(combinations);
        ArgumentNullException.ThrowIfNull(options);
        var issues = new List<ValidationIssue>();
        var tables = TrussModelValidator.Validate(model);
        issues.AddRange(tables);
        Guard.Positive(issues, nameof(AnalysisOptions.DeflectionLimitDivisor), options.DeflectionLimitDivisor, string.Empty);
        Guard.ThrowIfAny(issues);

        var stiffness = new double[model.Members.Count];
        for (var e = 0; e < model.Members.Count; e++)
        {
            var m = model.Members[e];
            var (ea, area) = options.Members.TryGetValue(m.Id, out var ms) ? (ms.ElasticModulus, ms.Area) : (options.DefaultElasticModulus, options.DefaultArea(m));
            if (!(ea >= PlausibleRange.MinModulusMPa && ea <= PlausibleRange.MaxModulusMPa) || !(area >= MinAreaMm2 && area <= MaxAreaMm2))
            {
                issues.Add(new ValidationIssue("Stiffness", $"member {m.Id} needs E from {PlausibleRange.MinModulusMPa} to {PlausibleRange.MaxModulusMPa} MPa and A from {MinAreaMm2} to {MaxAreaMm2:G3} mm² (got E = {ea} MPa, A = {area} mm²)"));
            }

            stiffness[e] = ea * area;
        }

        var system = StiffnessSystem.Build(model, (e, length) => stiffness[e] / length);
        foreach (var (node, direction) in system.Mechanisms())
        {
            issues.Add(new ValidationIssue("Stability", $"mechanism: node {node} has no stiffness in the {direction} direction; add a member or a support there"));
        }

        var caseIds = new HashSet<string>(StringComparer.Ordinal);
        foreach (var c in cases)
        {
            if (!caseIds.Add(c.Id))
            {
                issues.Add(new ValidationIssue("LoadCases", $"load case id '{c.Id}' is used twice"));
            }

            foreach (var l in c.Loads)
            {
                if (!system.NodeIndex.ContainsKey(l.Node))
                {
                    issues.Add(new ValidationIssue("LoadCases", $"load case {c.Id} has a load at unknown node '{l.Node}'"));
                }
                else if (!double.IsFinite(l.Fx) || !double.IsFinite(l.Fy))
                {
                    issues.Add(new ValidationIssue("LoadCases", $"load case {c.Id} has a load at node {l.Node} that is not a finite number"));
                }
                else if (Math.Abs(l.Fx) > PlausibleRange.MaxForceN || Math.Abs(l.Fy) > PlausibleRange.MaxForceN)
                {
                    issues.Add(new ValidationIssue("LoadCases", $"load case {c.Id} has a load at node {l.Node} above {PlausibleRange.MaxForceN:G3} N"));
                }
            }
        }

        Guard.ThrowIfAny(issues);

        var raw = cases.Select(c => SolveCase(system, c).WithRoundOffRemoved()).ToList();
        var caseResults = raw.Select((r, i) => ToResult(model, system, cases[i].Id, null, r)).ToList();
        var comboResults = new List<LoadResult>(combinations.Count);
        var comboRaw = new List<Raw>(combinations.Count);
        foreach (var combo in combinations)
        {
            var r = Raw.Zero(model.Nodes.Count, model.Members.Count);
            for (var i = 0; i < cases.Count; i++)
            {
                var f = combo.FactorFor(cases[i]);
                if (f != 0)
                {
                    r.AddScaled(raw[i], f);
                }
            }

            r = r.WithRoundOffRemoved();
            comboRaw.Add(r);
            comboResults.Add(ToResult(model, system, combo.Name, combo.LimitState, r));
        }

        return new AnalysisResult
        {
            Cases = caseResults,
            Combinations = comboResults,
            Envelopes = Envelopes(model, combinations, comboRaw),
            Deflections = Deflections(model, combinations, comboRaw, options.DeflectionLimitDivisor),
            HalfBandwidth = system.Ldlt.HalfBandwidth,
        };
    }

    private sealed class Raw(double[] u, double[] load, double[] forces)
    {
        public double[] U { get; } = u;

        public double[] Load { get; } = load;

        public double[] Forces { get; } = forces;

        /// <summary>
        /// Member forces whose magnitude is below <see cref="RoundOffRelative"/> of the largest force of
        /// the same case are set to zero: they are round-off of the solution (2026-12-01: a zero-force
        /// member came out as 1e-11 N and was then checked in compression), not forces.
        /// </summary>
        public Raw WithRoundOffRemoved()
        {
            var max = 0.0;
            foreach (var f in Forces)
            {
                max = Math.Max(max, Math.Abs(f));
            }

            var floor = max * RoundOffRelative;
            for (var i = 0; i < Forces.Length; i++)
            {
                if (Math.Abs(Forces[i]) <= floor)
                {
                    Forces[i] = 0;
                }
            }

            return this;
        }

        public static Raw Zero(int nodes, int members) => new(new double[2 * nodes], new double[2 * nodes], new double[members]);

        public void AddScaled(Raw other, double factor)
        {
            for (var i = 0; i < U.Length; i++)
            {
                U[i] += factor * other.U[i];
                Load[i] += factor * other.Load[i];
            }

            for (var i = 0; i < Forces.Length; i++)
            {
                Forces[i] += factor * other.Forces[i];
            }
        }
    }

    private static Raw SolveCase(StiffnessSystem system, LoadCase loadCase)
    {
        var model = system.Model;
        var n = model.Nodes.Count;
        var load = new double[2 * n];
        foreach (var l in loadCase.Loads)
        {
            var i = system.NodeIndex[l.Node];
            load[2 * i] += l.Fx;
            load[(2 * i) + 1] += l.Fy;
        }

        var rhs = new double[2 * n];
        for (var i = 0; i < n; i++)
        {
            rhs[system.Dof(i, 0)] = load[2 * i];
            rhs[system.Dof(i, 1)] = load[(2 * i) + 1];
        }

        var x = system.Ldlt.Solve(rhs);
        var u = new double[2 * n];
        for (var i = 0; i < n; i++)
        {
            u[2 * i] = x[system.Dof(i, 0)];
            u[(2 * i) + 1] = x[system.Dof(i, 1)];
        }

        var forces = new double[model.Members.Count];
        for (var e = 0; e < forces.Length; e++)
        {
            var a = system.NodeIndex[model.Members[e].StartNode];
            var b = system.NodeIndex[model.Members[e].EndNode];
            var elongation = ((u[2 * b] - u[2 * a]) * system.Cos[e]) + ((u[(2 * b) + 1] - u[(2 * a) + 1]) * system.Sin[e]);
            forces[e] = system.AxialStiffness[e] * elongation;
        }

        return new Raw(u, load, forces);
    }

    private static LoadResult ToResult(TrussModel model, StiffnessSystem system, string name, LimitState? state, Raw r)
    {
        var n = model.Nodes.Count;

        // Nodal equilibrium: F + R + Σ N·e = 0, e the unit vector from the node along the member.
        var internalForce = new double[2 * n];
        for (var e = 0; e < model.Members.Count; e++)
        {
            var a = system.NodeIndex[model.Members[e].StartNode];
            var b = system.NodeIndex[model.Members[e].EndNode];
            var fx = r.Forces[e] * system.Cos[e];
            var fy = r.Forces[e] * system.Sin[e];
            internalForce[2 * a] += fx;
            internalForce[(2 * a) + 1] += fy;
            internalForce[2 * b] -= fx;
            internalForce[(2 * b) + 1] -= fy;
        }

        var reactions = new Dictionary<string, NodeVector>(StringComparer.Ordinal);
        foreach (var s in model.Supports)
        {
            var i = system.NodeIndex[s.Node];
            var rx = system.Restrained[2 * i] ? -r.Load[2 * i] - internalForce[2 * i] : 0;
            var ry = system.Restrained[(2 * i) + 1] ? -r.Load[(2 * i) + 1] - internalForce[(2 * i) + 1] : 0;
            reactions[s.Node] = new NodeVector(rx, ry);
        }

        var displacements = new Dictionary<string, NodeVector>(n, StringComparer.Ordinal);
        double tx = 0, ty = 0;
        for (var i = 0; i < n; i++)
        {
            displacements[model.Nodes[i].Id] = new NodeVector(r.U[2 * i], r.U[(2 * i) + 1]);
            tx += r.Load[2 * i];
            ty += r.Load[(2 * i) + 1];
        }

        var forces = new Dictionary<string, double>(model.Members.Count, StringComparer.Ordinal);
        for (var e = 0; e < model.Members.Count; e++)
        {
            forces[model.Members[e].Id] = r.Forces[e];
        }

        return new LoadResult
        {
            Name = name,
            LimitState = state,
            MemberForces = forces,
            Displacements = displacements,
            Reactions = reactions,
            AppliedTotal = new NodeVector(tx, ty),
        };
    }

    private static List<Envelope> Envelopes(TrussModel model, IReadOnlyList<LoadCombination> combinations, List<Raw> raw)
    {
        var list = new List<Envelope>(model.Members.Count);
        for (var e = 0; e < model.Members.Count; e++)
        {
            double tension = 0, compression = 0;
            string? tName = null, cName = null;
            for (var k = 0; k < combinations.Count; k++)
            {
                if (combinations[k].LimitState != LimitState.Uls)
                {
                    continue;
                }

                var f = raw[k].Forces[e];
                if (f > tension)
                {
                    tension = f;
                    tName = combinations[k].Name;
                }

                if (-f > compression)
                {
                    compression = -f;
                    cName = combinations[k].Name;
                }
            }

            list.Add(new Envelope(model.Members[e].Id, tension, tName, compression, cName));
        }

        return list;
    }

    private static List<DeflectionCheck> Deflections(TrussModel model, IReadOnlyList<LoadCombination> combinations, List<Raw> raw, double divisor)
    {
        var list = new List<DeflectionCheck>();
        var limit = model.Span / divisor;
        for (var k = 0; k < combinations.Count; k++)
        {
            if (combinations[k].LimitState != LimitState.Sls)
            {
                continue;
            }

            var worst = 0;
            for (var i = 1; i < model.Nodes.Count; i++)
            {
                if (Math.Abs(raw[k].U[(2 * i) + 1]) > Math.Abs(raw[k].U[(2 * worst) + 1]))
                {
                    worst = i;
                }
            }

            list.Add(new DeflectionCheck(combinations[k].Name, model.Nodes[worst].Id, raw[k].U[(2 * worst) + 1], limit, divisor));
        }

        return list;
    }
}
