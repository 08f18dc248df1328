using System.Diagnostics;

namespace PackDesigner.Browser.Tests.Infrastructure;

/// <summary>
/// Finds Debian's Chromium, installing it with apt-get when running as root and it is missing. Where it cannot
/// be had, tests skip with the reason, except under CI (CI=true) where that is a failure.
/// </summary>
public static class ChromiumLocator
{
    private static readonly Lazy<(string? Path, string Reason)> Found = new(Locate);

    public static string? ExecutablePath => Found.Value.Path;

    public static string MissingReason => Found.Value.Reason;

    public static bool IsCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    private static (string?, string) Locate()
    {
        string[] candidates = ["/usr/bin/chromium", "/usr/bin/chromium-browser", "/usr/bin/google-chrome"];
        var path = candidates.FirstOrDefault(File.Exists);
        if (path is not null)
        {
            return (path, string.Empty);
        }

        if (Environment.UserName == "root" && File.Exists("/usr/bin/apt-get"))
        {
            Run("apt-get", "update -qq");
            Run("apt-get", "install -y -qq chromium");
            path = candidates.FirstOrDefault(File.Exists);
            if (path is not null)
            {
                return (path, string.Empty);
            }
        }

        return (null, "Chromium is not installed and could not be installed (apt-get install chromium).");
    }

    private static void Run(string file, string args)
    {
        try
        {
            using var p = Process.Start(new ProcessStartInfo(file, args) { RedirectStandardOutput = true, RedirectStandardError = true });
            p?.WaitForExit(TimeSpan.FromMinutes(5));
        }
        catch (System.ComponentModel.Win32Exception)
        {
            // apt-get not runnable here: reported as missing.
        }
    }
}
