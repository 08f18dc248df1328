using Xunit.Abstractions;
using Xunit.Sdk;

namespace PackDesigner.Web.Tests.Data.Infrastructure;

/// <summary>Marks a test class that runs on the real PostgreSQL server.</summary>
public interface IPostgresTests;

/// <summary>
/// A fact that runs on each provider's test class. In a class marked <see cref="IPostgresTests"/> it is skipped,
/// with the reason, when no PostgreSQL server can be reached, unless env CI=true (then it runs and fails).
/// </summary>
[XunitTestCaseDiscoverer("PackDesigner.Web.Tests.Data.Infrastructure.ProviderFactDiscoverer", "PackDesigner.Web.Tests")]
[AttributeUsage(AttributeTargets.Method)]
public sealed class ProviderFactAttribute : FactAttribute;

public sealed class ProviderFactDiscoverer(IMessageSink diagnosticMessageSink) : IXunitTestCaseDiscoverer
{
    public IEnumerable<IXunitTestCase> Discover(ITestFrameworkDiscoveryOptions discoveryOptions, ITestMethod testMethod, IAttributeInfo factAttribute)
    {
        var testClass = testMethod.TestClass.Class.ToRuntimeType();
        var skip = typeof(IPostgresTests).IsAssignableFrom(testClass) ? PostgresServer.SkipReason : null;
        yield return new ProviderTestCase(diagnosticMessageSink, discoveryOptions.MethodDisplayOrDefault(),
            discoveryOptions.MethodDisplayOptionsOrDefault(), testMethod, skip);
    }
}

public sealed class ProviderTestCase : XunitTestCase
{
    private string? _skipReason;

    [Obsolete("Called by the de-serializer; should only be called by deriving classes for de-serialization purposes")]
    public ProviderTestCase()
    {
    }

    public ProviderTestCase(IMessageSink diagnosticMessageSink, TestMethodDisplay defaultMethodDisplay,
        TestMethodDisplayOptions defaultMethodDisplayOptions, ITestMethod testMethod, string? skipReason)
        : base(diagnosticMessageSink, defaultMethodDisplay, defaultMethodDisplayOptions, testMethod)
    {
        _skipReason = skipReason;
    }

    protected override string? GetSkipReason(IAttributeInfo factAttribute) => _skipReason ?? base.GetSkipReason(factAttribute);

    public override void Serialize(IXunitSerializationInfo data)
    {
        base.Serialize(data);
        data.AddValue("ProviderSkipReason", _skipReason);
    }

    public override void Deserialize(IXunitSerializationInfo data)
    {
        _skipReason = data.GetValue<string?>("ProviderSkipReason");
        base.Deserialize(data);
    }
}
