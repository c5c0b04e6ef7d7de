using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Model;

/// <summary>
/// Builds a <see cref="TrussModel"/> of a common layout from <see cref="TrussParameters"/>.
/// Conventions: bottom-chord nodes L0, L1, … from the left heel; top-chord nodes U0/U1, …; marks TC1…
/// (top chord), BC1… (bottom chord), D1… (diagonals), V1… (verticals), numbered left to right.
/// With heel depth 0 the top and bottom chords meet at L0 and at the right heel node.
/// Supports: pin at the left heel, roller free in x at the right heel. Every top-chord node is a purlin
/// point and is laterally restrained (purlins with bracing, common practice); the bottom chord is
/// restrained at the supports, at every N-th node when asked and at any nodes named.
/// The result is an ordinary model: edit it with <c>with { ... }</c> like one built from tables.
/// </summary>
public static class TrussGenerator
{
    /// <summary>Generates the truss; throws <see cref="InputValidationException"/> naming each bad field.</summary>
    public static TrussModel Generate(TrussParameters parameters)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        Guard.ThrowIfAny(parameters.Validate());
        var b = new Builder(parameters);
        switch (parameters.Type)
        {
            case TrussType.PitchedHowe:
            case TrussType.PitchedPratt:
                b.Pitched(parameters.Type == TrussType.PitchedPratt);
                break;
            case TrussType.Fink:
                b.Fink();
                break;
            case TrussType.ParallelPratt:
            case TrussType.ParallelHowe:
                b.ParallelVerticals(parameters.Type == TrussType.ParallelPratt);
                break;
            case TrussType.ParallelWarren:
                b.Warren();
                break;
            case TrussType.MonoPitch:
                b.MonoPitch();
                break;
            default:
                throw new OutOfScopeException($"no generator for truss type {parameters.Type}");
        }

        // Parameters can be valid one by one and still give a degenerate truss (a pitch so flat that
        // the first vertical is shorter than the coincidence tolerance): say so, naming the parameters.
        var model = b.ToModel();
        var issues = TrussModelValidator.Validate(model);
        if (issues.Count > 0)
        {
            throw new InputValidationException(issues
                .Select(i => new ValidationIssue("Geometry", $"these parameters give an invalid truss (check span, pitch or apex height, heel depth and panels): {i.Message}"))
                .Distinct()
                .ToList());
        }

        return model;
    }

    private sealed class Builder(TrussParameters p)
    {
        private readonly List<Node> _nodes = [];
        private readonly List<Member> _members = [];
        private readonly List<string> _bottom = [];
        private string _leftHeel = "L0";
        private string _rightHeel = "L0";
        private int _tc;
        private int _bc;
        private int _d;
        private int _v;

        private bool HasHeel => p.HeelDepth > 0;

        public void Pitched(bool pratt)
        {
            var n = p.PanelCount;
            var h = n / 2;
            var top = PitchedTopAndBottom(n, x => PitchedHeight(x));
            for (var i = 0; i < n; i++)
            {
                Add("TC", top[i], top[i + 1], MemberGroup.TopChord.Name);
            }

            Bottom(n);
            var first = HasHeel ? 0 : 1;
            var last = HasHeel ? n : n - 1;
            for (var i = first; i <= last; i++)
            {
                Add("V", top[i], L(i), MemberGroup.Verticals.Name);
            }

            for (var i = first; i < h; i++)
            {
                if (pratt)
                {
                    Add("D", L(i), top[i + 1], MemberGroup.Diagonals.Name);
                }
                else
                {
                    Add("D", top[i], L(i + 1), MemberGroup.Diagonals.Name);
                }
            }

            for (var i = h + 1; i <= last; i++)
            {
                if (pratt)
                {
                    Add("D", L(i), top[i - 1], MemberGroup.Diagonals.Name);
                }
                else
                {
                    Add("D", top[i], L(i - 1), MemberGroup.Diagonals.Name);
                }
            }
        }

        public void Fink()
        {
            var n = p.PanelCount;
            var nb = n - 1;
            for (var j = 0; j <= nb; j++)
            {
                AddNode(L(j), p.Span * j / nb, 0);
                _bottom.Add(L(j));
            }

            _leftHeel = L(0);
            _rightHeel = L(nb);
            var top = new string[n + 1];
            for (var i = 0; i <= n; i++)
            {
                var x = p.Span * i / n;
                if (!HasHeel && (i == 0 || i == n))
                {
                    top[i] = i == 0 ? L(0) : L(nb);
                }
                else
                {
                    top[i] = U(i);
                    AddNode(U(i), x, PitchedHeight(x));
                }
            }

            for (var i = 0; i < n; i++)
            {
                Add("TC", top[i], top[i + 1], MemberGroup.TopChord.Name);
            }

            for (var j = 0; j < nb; j++)
            {
                Add("BC", L(j), L(j + 1), MemberGroup.BottomChord.Name);
            }

            if (HasHeel)
            {
                Add("V", top[0], L(0), MemberGroup.Verticals.Name);
                Add("D", L(0), top[1], MemberGroup.Diagonals.Name);
            }

            for (var j = 1; j <= n - 2; j++)
            {
                Add("D", top[j], L(j), MemberGroup.Diagonals.Name);
                Add("D", L(j), top[j + 1], MemberGroup.Diagonals.Name);
            }

            if (HasHeel)
            {
                Add("D", top[n - 1], L(nb), MemberGroup.Diagonals.Name);
                Add("V", top[n], L(nb), MemberGroup.Verticals.Name);
            }
        }

        public void ParallelVerticals(bool pratt)
        {
            var n = p.PanelCount;
            var h = n / 2;
            var top = PitchedTopAndBottom(n, _ => p.HeelDepth);
            for (var i = 0; i < n; i++)
            {
                Add("TC", top[i], top[i + 1], MemberGroup.TopChord.Name);
            }

            Bottom(n);
            for (var i = 0; i <= n; i++)
            {
                Add("V", top[i], L(i), MemberGroup.Verticals.Name);
            }

            for (var i = 0; i < n; i++)
            {
                // Pratt: diagonals run down towards mid-span from the top chord (left half: U(i)–L(i+1));
                // Howe: the mirror image (left half: L(i)–U(i+1)).
                var leftHalf = i < h;
                if (pratt == leftHalf)
                {
                    Add("D", top[i], L(i + 1), MemberGroup.Diagonals.Name);
                }
                else
                {
                    Add("D", L(i), top[i + 1], MemberGroup.Diagonals.Name);
                }
            }
        }

        public void Warren()
        {
            var n = p.PanelCount;
            var panel = p.Span / n;
            for (var i = 0; i <= n; i++)
            {
                AddNode(L(i), panel * i, 0);
                _bottom.Add(L(i));
            }

            for (var i = 1; i <= n; i++)
            {
                AddNode(U(i), panel * (i - 0.5), p.HeelDepth);
            }

            _leftHeel = L(0);
            _rightHeel = L(n);
            for (var i = 1; i < n; i++)
            {
                Add("TC", U(i), U(i + 1), MemberGroup.TopChord.Name);
            }

            for (var i = 0; i < n; i++)
            {
                Add("BC", L(i), L(i + 1), MemberGroup.BottomChord.Name);
            }

            for (var i = 1; i <= n; i++)
            {
                Add("D", L(i - 1), U(i), MemberGroup.Diagonals.Name);
                Add("D", U(i), L(i), MemberGroup.Diagonals.Name);
            }
        }

        public void MonoPitch()
        {
            var n = p.PanelCount;
            var rise = p.RiseToApex();
            var top = new string[n + 1];
            for (var i = 0; i <= n; i++)
            {
                AddNode(L(i), p.Span * i / n, 0);
                _bottom.Add(L(i));
            }

            for (var i = 0; i <= n; i++)
            {
                if (i == 0 && !HasHeel)
                {
                    top[i] = L(0);
                    continue;
                }

                top[i] = U(i);
                var x = p.Span * i / n;
                AddNode(U(i), x, p.HeelDepth + ((rise - p.HeelDepth) * x / p.Span));
            }

            _leftHeel = L(0);
            _rightHeel = L(n);
            for (var i = 0; i < n; i++)
            {
                Add("TC", top[i], top[i + 1], MemberGroup.TopChord.Name);
            }

            for (var i = 0; i < n; i++)
            {
                Add("BC", L(i), L(i + 1), MemberGroup.BottomChord.Name);
            }

            var first = HasHeel ? 0 : 1;
            for (var i = first; i <= n; i++)
            {
                Add("V", top[i], L(i), MemberGroup.Verticals.Name);
            }

            for (var i = first; i < n; i++)
            {
                Add("D", L(i), top[i + 1], MemberGroup.Diagonals.Name);
            }
        }

        public TrussModel ToModel()
        {
            var topNodes = new HashSet<string>(StringComparer.Ordinal);
            foreach (var m in _members.Where(m => m.Group == MemberGroup.TopChord.Name))
            {
                topNodes.Add(m.StartNode);
                topNodes.Add(m.EndNode);
            }

            var byId = _nodes.ToDictionary(n => n.Id, StringComparer.Ordinal);
            var purlins = topNodes.OrderBy(id => byId[id].X).ToList();
            var restraints = new List<string>(purlins);
            void Restrain(string id)
            {
                if (!restraints.Contains(id))
                {
                    restraints.Add(id);
                }
            }

            Restrain(_leftHeel);
            Restrain(_rightHeel);
            if (p.BottomRestraintEvery is { } every)
            {
                for (var j = 0; j < _bottom.Count; j += every)
                {
                    Restrain(_bottom[j]);
                }
            }

            foreach (var id in p.BottomRestraintNodes)
            {
                Restrain(id);
            }

            return new TrussModel
            {
                Name = $"{p.Type} {p.Span:0} mm, {p.PanelCount} panels",
                Nodes = _nodes,
                Members = _members,
                Supports = [new Support(_leftHeel, SupportKind.Pin), new Support(_rightHeel, SupportKind.RollerX)],
                LateralRestraints = restraints,
                PurlinNodes = purlins,
                Span = p.Span,
                TrussSpacing = p.TrussSpacing,
            };
        }

        private static string L(int i) => "L" + i.ToString(System.Globalization.CultureInfo.InvariantCulture);

        private static string U(int i) => "U" + i.ToString(System.Globalization.CultureInfo.InvariantCulture);

        private double PitchedHeight(double x)
        {
            var half = p.Span / 2;
            return p.HeelDepth + ((p.RiseToApex() - p.HeelDepth) * (1 - (Math.Abs(x - half) / half)));
        }

        private string[] PitchedTopAndBottom(int n, Func<double, double> height)
        {
            for (var i = 0; i <= n; i++)
            {
                AddNode(L(i), p.Span * i / n, 0);
                _bottom.Add(L(i));
            }

            _leftHeel = L(0);
            _rightHeel = L(n);
            var top = new string[n + 1];
            for (var i = 0; i <= n; i++)
            {
                if (!HasHeel && (i == 0 || i == n))
                {
                    top[i] = L(i);
                    continue;
                }

                var x = p.Span * i / n;
                top[i] = U(i);
                AddNode(U(i), x, height(x));
            }

            return top;
        }

        private void Bottom(int n)
        {
            for (var i = 0; i < n; i++)
            {
                Add("BC", L(i), L(i + 1), MemberGroup.BottomChord.Name);
            }
        }

        private void AddNode(string id, double x, double y) => _nodes.Add(new Node(id, x, y));

        private void Add(string prefix, string a, string b, string group)
        {
            var number = prefix switch
            {
                "TC" => ++_tc,
                "BC" => ++_bc,
                "D" => ++_d,
                _ => ++_v,
            };
            _members.Add(new Member(prefix + number.ToString(System.Globalization.CultureInfo.InvariantCulture), a, b, group));
        }
    }
}
