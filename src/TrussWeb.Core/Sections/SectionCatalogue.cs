using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Loads section catalogues stored as CSV files of DIMENSIONS ONLY (properties are always computed,
/// see <see cref="ISectionDimensions.Compute"/>). The family follows from the header:
/// <list type="bullet">
/// <item>angles: designation,d,b,t,r1,r2 (EN 10056-1 dimensions);</item>
/// <item>circular hollow: designation,D,t;</item>
/// <item>rectangular hollow: designation,h,b,t with an optional ro (outer corner radius; blank or
/// absent: the EN 10219 default).</item>
/// </list>
/// Column order is free and names ignore case; a blank designation gets the default one. Every bad row
/// yields a <see cref="CatalogueError"/> naming file, line and field, and the good rows still load: no
/// exception escapes for bad content. A designation already loaded (from any file) is an error on the
/// later row.
/// </summary>
public static class SectionCatalogue
{
    private const string DesignationColumn = "designation";

    /// <summary>Loads every *.csv file in <paramref name="folder"/> (ordinal file-name order).</summary>
    public static CatalogueLoadResult Load(string folder)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(folder);
        var builder = new Builder();
        if (!Directory.Exists(folder))
        {
            builder.Errors.Add(new CatalogueError(folder, 0, "file", "the catalogue folder does not exist"));
            return builder.ToResult();
        }

        foreach (var path in Directory.GetFiles(folder, "*.csv").Order(StringComparer.Ordinal))
        {
            var fileName = Path.GetFileName(path);
            string text;
            try
            {
                text = File.ReadAllText(path);
            }
            catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
            {
                builder.Errors.Add(new CatalogueError(fileName, 0, "file", $"cannot be read: {ex.Message}"));
                continue;
            }

            builder.Add(fileName, text);
        }

        return builder.ToResult();
    }

    /// <summary>Loads one catalogue held as text (tests, user imports).</summary>
    /// <param name="fileName">Name used in the errors.</param>
    /// <param name="csv">The file's content.</param>
    public static CatalogueLoadResult LoadFromText(string fileName, string csv)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(fileName);
        ArgumentNullException.ThrowIfNull(csv);
        var builder = new Builder();
        builder.Add(fileName, csv);
        return builder.ToResult();
    }

    /// <summary>Column layout of one family: required columns, optional ones, and the dimension record's property → column map.</summary>
    private sealed record Layout(SectionFamily Family, string[] Required, string[] Optional, Dictionary<string, string> ColumnOf,
        Func<Func<string, double?>, ISectionDimensions> Create, Func<ISectionDimensions, string> DefaultDesignation);

    private static readonly Layout AngleLayout = new(
        SectionFamily.Angle, ["d", "b", "t", "r1", "r2"], [],
        new()
        {
            [nameof(AngleDimensions.LongLeg)] = "d",
            [nameof(AngleDimensions.ShortLeg)] = "b",
            [nameof(AngleDimensions.Thickness)] = "t",
            [nameof(AngleDimensions.RootRadius)] = "r1",
            [nameof(AngleDimensions.ToeRadius)] = "r2",
        },
        v => new AngleDimensions(v("d")!.Value, v("b")!.Value, v("t")!.Value, v("r1")!.Value, v("r2")!.Value),
        d => ((AngleDimensions)d).DefaultDesignation());

    private static readonly Layout CircularLayout = new(
        SectionFamily.CircularHollow, ["d", "t"], [],
        new()
        {
            [nameof(CircularHollowDimensions.Diameter)] = "D",
            [nameof(CircularHollowDimensions.Thickness)] = "t",
        },
        v => new CircularHollowDimensions(v("d")!.Value, v("t")!.Value),
        d => ((CircularHollowDimensions)d).DefaultDesignation());

    private static readonly Layout RectangularLayout = new(
        SectionFamily.RectangularHollow, ["h", "b", "t"], ["ro"],
        new()
        {
            [nameof(RectangularHollowDimensions.Depth)] = "h",
            [nameof(RectangularHollowDimensions.Width)] = "b",
            [nameof(RectangularHollowDimensions.Thickness)] = "t",
            [nameof(RectangularHollowDimensions.OuterRadius)] = "ro",
        },
        v => new RectangularHollowDimensions(v("h")!.Value, v("b")!.Value, v("t")!.Value, v("ro")),
        d => ((RectangularHollowDimensions)d).DefaultDesignation());

    private static Layout? LayoutFor(HashSet<string> columns) =>
        columns.Contains("r1") ? AngleLayout
        : columns.Contains("h") ? RectangularLayout
        : columns.Contains("d") && !columns.Contains("b") ? CircularLayout
        : null;

    /// <summary>Collects entries and errors over one or more files.</summary>
    private sealed class Builder
    {
        private readonly Dictionary<string, SectionCatalogueEntry> _seen = new(StringComparer.OrdinalIgnoreCase);

        public List<SectionCatalogueEntry> Entries { get; } = [];

        public List<CatalogueError> Errors { get; } = [];

        public CatalogueLoadResult ToResult() => new(Entries, Errors);

        public void Add(string file, string text)
        {
            var (header, rows) = CsvText.Read(text);
            if (header is not { } head)
            {
                Errors.Add(new CatalogueError(file, 0, "header", "the file has no header row"));
                return;
            }

            var names = head.Values.Select(v => v.ToLowerInvariant()).ToArray();
            var layout = LayoutFor([.. names]);
            if (layout is null)
            {
                Errors.Add(new CatalogueError(file, head.Line, "header",
                    $"unknown columns '{string.Join(",", head.Values)}': expected designation,d,b,t,r1,r2 (angles), designation,D,t (CHS) or designation,h,b,t[,ro] (RHS)"));
                return;
            }

            var missing = layout.Required.Where(c => !names.Contains(c)).ToArray();
            if (missing.Length > 0)
            {
                Errors.Add(new CatalogueError(file, head.Line, "header", $"missing column(s) {string.Join(", ", missing)}"));
                return;
            }

            foreach (var row in rows)
            {
                AddRow(file, names, layout, row);
            }
        }

        private void AddRow(string file, string[] names, Layout layout, CsvText.Row row)
        {
            if (row.Values.Length > names.Length)
            {
                Errors.Add(new CatalogueError(file, row.Line, "row", $"{row.Values.Length} values but the header has {names.Length} columns"));
                return;
            }

            string Cell(string column)
            {
                var i = Array.IndexOf(names, column);
                return i >= 0 && i < row.Values.Length ? row.Values[i] : "";
            }

            var numbers = new Dictionary<string, double?>();
            var bad = false;
            foreach (var column in layout.Required.Concat(layout.Optional))
            {
                var text = Cell(column);
                var shown = ShownName(layout, column);
                if (text.Length == 0)
                {
                    if (layout.Required.Contains(column))
                    {
                        Errors.Add(new CatalogueError(file, row.Line, shown, "missing value"));
                        bad = true;
                    }

                    numbers[column] = null;
                }
                else if (CsvText.TryNumber(text, out var value))
                {
                    numbers[column] = value;
                }
                else
                {
                    Errors.Add(new CatalogueError(file, row.Line, shown, $"'{text}' is not a number (use a point as the decimal separator)"));
                    bad = true;
                }
            }

            if (bad)
            {
                return;
            }

            var dims = layout.Create(c => numbers[c]);
            var issues = dims.Validate();
            if (issues.Count > 0)
            {
                Errors.AddRange(issues.Select(i => ToError(file, row.Line, layout, i)));
                return;
            }

            var designation = Cell(DesignationColumn);
            if (designation.Length == 0)
            {
                designation = layout.DefaultDesignation(dims);
            }

            if (_seen.TryGetValue(designation, out var earlier))
            {
                Errors.Add(new CatalogueError(file, row.Line, DesignationColumn,
                    $"'{designation}' is already defined ({earlier.File} line {earlier.Line})"));
                return;
            }

            var entry = new SectionCatalogueEntry(designation, dims, file, row.Line);
            _seen.Add(designation, entry);
            Entries.Add(entry);
        }

        private static CatalogueError ToError(string file, int line, Layout layout, ValidationIssue issue) =>
            new(file, line, layout.ColumnOf.GetValueOrDefault(issue.Field, issue.Field), issue.Message);

        /// <summary>The column as the file's convention spells it ("D" for a CHS diameter, else lower case).</summary>
        private static string ShownName(Layout layout, string column) =>
            layout.ColumnOf.Values.FirstOrDefault(c => string.Equals(c, column, StringComparison.OrdinalIgnoreCase)) ?? column;
    }
}
