namespace PackDesigner.Web.Tests.Data.Infrastructure;

internal static class RepositoryRoot
{
    /// <summary>The folder holding PackDesigner.sln, found upwards from the test assembly.</summary>
    public static string Path { get; } = Find();

    private static string Find()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(System.IO.Path.Combine(dir.FullName, "PackDesigner.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("PackDesigner.sln not found above " + AppContext.BaseDirectory);
    }
}
