namespace TrussWeb.Reports.Tests.Support;

/// <summary>Writes sample files when TRUSSWEB_REPORT_SAMPLES names a folder (for scripts/render-pdf-pages.sh); otherwise does nothing.</summary>
public static class Samples
{
    public const string Variable = "TRUSSWEB_REPORT_SAMPLES";

    public static void Write(string fileName, byte[] bytes)
    {
        var folder = Environment.GetEnvironmentVariable(Variable);
        if (string.IsNullOrWhiteSpace(folder))
        {
            return;
        }

        Directory.CreateDirectory(folder);
        File.WriteAllBytes(Path.Combine(folder, fileName), bytes);
    }
}
