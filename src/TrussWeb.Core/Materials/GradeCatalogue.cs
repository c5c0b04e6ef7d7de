using System.Diagnostics.CodeAnalysis;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Materials;

/// <summary>
/// Steel grades loaded from a CSV file (seed-data/grades.csv): columns name, standard, fu, E, G, bands,
/// where bands holds "tmax:fy" pairs separated by ';' (e.g. "16:275;40:265"). Lines starting with '#'
/// are comments. Bad rows are reported as <see cref="CatalogueError"/>s naming file, line and field;
/// good rows still load. Names are matched ignoring case.
/// </summary>
public sealed class GradeCatalogue
{
    private static readonly string[] Columns = ["name", "standard", "fu", "E", "G", "bands"];

    private readonly Dictionary<string, SteelGrade> _byName;

    private GradeCatalogue(List<SteelGrade> grades, List<CatalogueError> errors)
    {
        Grades = grades;
        Errors = errors;
        _byName = new Dictionary<string, SteelGrade>(StringComparer.OrdinalIgnoreCase);
        foreach (var grade in grades)
        {
            _byName.TryAdd(grade.Name, grade);
        }
    }

    /// <summary>Loaded grades, in file order.</summary>
    public IReadOnlyList<SteelGrade> Grades { get; }

    /// <summary>Rows that could not be loaded.</summary>
    public IReadOnlyList<CatalogueError> Errors { get; }

    /// <summary>Loads the grades file at <paramref name="path"/>; a missing or unreadable file is an error entry.</summary>
    public static GradeCatalogue Load(string path)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        var fileName = Path.GetFileName(path);
        try
        {
            return LoadFromText(fileName, File.ReadAllText(path));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            return new GradeCatalogue([], [new CatalogueError(fileName, 0, "file", $"cannot be read: {ex.Message}")]);
        }
    }

    /// <summary>Loads grades held as text (tests, imports).</summary>
    public static GradeCatalogue LoadFromText(string fileName, string csv)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(fileName);
        ArgumentNullException.ThrowIfNull(csv);
        var grades = new List<SteelGrade>();
        var errors = new List<CatalogueError>();
        var (header, rows) = CsvText.Read(csv);
        if (header is not { } head)
        {
            errors.Add(new CatalogueError(fileName, 0, "header", "the file has no header row"));
            return new GradeCatalogue(grades, errors);
        }

        var index = Columns.ToDictionary(c => c, c => Array.FindIndex(head.Values, v => string.Equals(v, c, StringComparison.OrdinalIgnoreCase)));
        var missing = index.Where(kv => kv.Value < 0).Select(kv => kv.Key).ToArray();
        if (missing.Length > 0)
        {
            errors.Add(new CatalogueError(fileName, head.Line, "header", $"missing column(s) {string.Join(", ", missing)}"));
            return new GradeCatalogue(grades, errors);
        }

        foreach (var row in rows)
        {
            var grade = ParseRow(fileName, row, index, head.Values.Length, errors);
            if (grade is null)
            {
                continue;
            }

            if (grades.Any(g => string.Equals(g.Name, grade.Name, StringComparison.OrdinalIgnoreCase)))
            {
                errors.Add(new CatalogueError(fileName, row.Line, "name", $"grade '{grade.Name}' is already defined"));
                continue;
            }

            grades.Add(grade);
        }

        return new GradeCatalogue(grades, errors);
    }

    /// <summary>Looks a grade up by name (case-insensitive).</summary>
    public bool TryFind(string name, [NotNullWhen(true)] out SteelGrade? grade, [NotNullWhen(false)] out string? error)
    {
        if (!string.IsNullOrWhiteSpace(name) && _byName.TryGetValue(name.Trim(), out grade))
        {
            error = null;
            return true;
        }

        grade = null;
        error = $"steel grade '{name?.Trim()}' is not in the catalogue (known: {string.Join(", ", Grades.Select(g => g.Name))})";
        return false;
    }

    /// <summary>Looks a grade up by name (case-insensitive).</summary>
    /// <exception cref="KeyNotFoundException">Unknown grade; the message lists the known ones.</exception>
    public SteelGrade Find(string name) => TryFind(name, out var grade, out var error) ? grade : throw new KeyNotFoundException(error);

    private static SteelGrade? ParseRow(string file, CsvText.Row row, Dictionary<string, int> index, int headerCount, List<CatalogueError> errors)
    {
        var before = errors.Count;
        string Cell(string column) => index[column] < row.Values.Length ? row.Values[index[column]] : "";

        if (row.Values.Length > headerCount)
        {
            errors.Add(new CatalogueError(file, row.Line, "row", $"{row.Values.Length} values but the header has {headerCount} columns"));
            return null;
        }

        var name = Cell("name");
        if (name.Length == 0)
        {
            errors.Add(new CatalogueError(file, row.Line, "name", "missing value"));
        }

        double Number(string column)
        {
            var text = Cell(column);
            if (text.Length == 0)
            {
                errors.Add(new CatalogueError(file, row.Line, column, "missing value"));
            }
            else if (CsvText.TryNumber(text, out var value))
            {
                return value;
            }
            else
            {
                errors.Add(new CatalogueError(file, row.Line, column, $"'{text}' is not a number (use a point as the decimal separator)"));
            }

            return double.NaN;
        }

        var fu = Number("fu");
        var e = Number("E");
        var g = Number("G");
        var bands = ParseBands(file, row.Line, Cell("bands"), errors);
        if (errors.Count > before)
        {
            return null;
        }

        var grade = new SteelGrade(name, Cell("standard"), bands, fu, e, g);
        var issues = grade.Validate();
        foreach (var issue in issues)
        {
            errors.Add(new CatalogueError(file, row.Line, FieldOf(issue), issue.Message));
        }

        return issues.Count == 0 ? grade : null;
    }

    private static List<ThicknessBand> ParseBands(string file, int line, string text, List<CatalogueError> errors)
    {
        var bands = new List<ThicknessBand>();
        if (text.Length == 0)
        {
            errors.Add(new CatalogueError(file, line, "bands", "missing value"));
            return bands;
        }

        foreach (var part in text.Split(';', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            var pair = part.Split(':', StringSplitOptions.TrimEntries);
            if (pair.Length != 2 || !CsvText.TryNumber(pair[0], out var tmax) || !CsvText.TryNumber(pair[1], out var fy))
            {
                errors.Add(new CatalogueError(file, line, "bands", $"'{part}' is not a 'tmax:fy' pair of numbers (mm:MPa)"));
                continue;
            }

            bands.Add(new ThicknessBand(tmax, fy));
        }

        return bands;
    }

    private static string FieldOf(ValidationIssue issue) => issue.Field switch
    {
        nameof(SteelGrade.Name) => "name",
        nameof(SteelGrade.Bands) or "Fy" => "bands",
        nameof(SteelGrade.Fu) => "fu",
        _ => issue.Field,
    };
}
