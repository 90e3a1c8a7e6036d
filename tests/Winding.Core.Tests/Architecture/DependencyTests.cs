using Winding.Core.Plans;

namespace Winding.Core.Tests.Architecture;

/// <summary>The engine stays free of IO, UI and serialisation: it references only the base library and MathNet.</summary>
public sealed class DependencyTests
{
    [Fact]
    public void Core_ReferencesNoWebUiOrSerialisationAssembly()
    {
        var references = typeof(PlanEvaluator).Assembly.GetReferencedAssemblies().Select(a => a.Name!).ToList();

        Assert.DoesNotContain(references, n => n.StartsWith("Microsoft.AspNetCore", StringComparison.Ordinal));
        Assert.DoesNotContain(references, n => n.StartsWith("MudBlazor", StringComparison.Ordinal));
        Assert.DoesNotContain(references, n => n.StartsWith("System.Text.Json", StringComparison.Ordinal));
        Assert.DoesNotContain(references, n => n.StartsWith("Winding.", StringComparison.Ordinal));
        Assert.Contains("MathNet.Numerics", references);
    }
}
