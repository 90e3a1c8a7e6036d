using Microsoft.AspNetCore.Components;
using Winding.Web.Components.Layout;

namespace Winding.Web.Tests.Components;

/// <summary>The layout's colour switch (behaviour, no physics).</summary>
public sealed class MainLayoutTests : WindingComponentTestBase
{
    [Fact]
    public void DarkModeButton_SwitchesBothWays()
    {
        JSInterop.Setup<bool>("mudThemeProvider.getSystemDarkMode").SetResult(false);
        var layout = Render<MainLayout>(p => p.Add(l => l.Body, (RenderFragment)(b => b.AddContent(0, "content"))));

        layout.Find("button[data-testid=dark-mode]").Click();
        layout.WaitForAssertion(() => Assert.Equal("true", layout.Find("button[data-testid=dark-mode]").GetAttribute("aria-pressed")));

        layout.Find("button[data-testid=dark-mode]").Click();
        layout.WaitForAssertion(() => Assert.Equal("false", layout.Find("button[data-testid=dark-mode]").GetAttribute("aria-pressed")));
    }
}
