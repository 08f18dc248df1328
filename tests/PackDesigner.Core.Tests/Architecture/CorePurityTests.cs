using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Tests.Architecture;

/// <summary>
/// Core is a pure calculation library: it may reference only the base class library, plus the libraries a
/// decision record approves (MathNet.Numerics). Anything else (ASP.NET Core, EF Core, logging, I/O packages)
/// fails the build.
/// </summary>
public sealed class CorePurityTests
{
    /// <summary>Assembly names Core may reference; names ending in '.' are prefixes.</summary>
    private static readonly string[] Allowed = ["System", "System.", "Microsoft.Win32.Primitives", "netstandard", "mscorlib", "MathNet.Numerics"];

    public static bool IsAllowed(string assemblyName) =>
        Allowed.Any(a => a.EndsWith('.') ? assemblyName.StartsWith(a, StringComparison.Ordinal) : assemblyName == a);

    [Fact]
    public void CoreAssembly_References_OnlyBaseClassLibrary()
    {
        var core = typeof(DesignEvaluator).Assembly;

        var references = core.GetReferencedAssemblies().Select(r => r.Name!).ToList();

        Assert.NotEmpty(references);
        Assert.Contains("System.Runtime", references);
        var outside = references.Where(n => !IsAllowed(n)).ToList();
        Assert.True(outside.Count == 0, "PackDesigner.Core references assemblies outside the allow-list: " + string.Join(", ", outside));
    }

    [Theory]
    [InlineData("Microsoft.AspNetCore.Http", false)]
    [InlineData("Microsoft.EntityFrameworkCore", false)]
    [InlineData("Microsoft.Extensions.Logging.Abstractions", false)]
    [InlineData("Newtonsoft.Json", false)]
    [InlineData("SystemX.Tools", false)]
    [InlineData("MathNet.Numerics.Data.Text", false)]
    [InlineData("System.Runtime", true)]
    [InlineData("System.Linq", true)]
    [InlineData("System", true)]
    [InlineData("netstandard", true)]
    [InlineData("Microsoft.Win32.Primitives", true)]
    [InlineData("MathNet.Numerics", true)]
    public void IsAllowed_AssemblyName_FollowsAllowList(string name, bool allowed)
    {
        Assert.Equal(allowed, IsAllowed(name));
    }

    [Fact]
    public void CoreAssembly_PublicTypes_LiveInCoreNamespaces()
    {
        var core = typeof(DesignEvaluator).Assembly;

        Assert.All(core.GetExportedTypes(), t => Assert.StartsWith("PackDesigner.Core", t.Namespace, StringComparison.Ordinal));
        Assert.Equal("PackDesigner.Core", core.GetName().Name);
        Assert.DoesNotContain(core.GetReferencedAssemblies(), r => r.Name!.StartsWith("PackDesigner.", StringComparison.Ordinal));
    }
}
