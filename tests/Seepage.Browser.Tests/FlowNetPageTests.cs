using System.Globalization;
using System.Text.RegularExpressions;

namespace Seepage.Browser.Tests;

/// <summary>The flow net reads like one: the caption gives Nf with its fraction and Nd, "Fit" frames the structure
/// and "Whole" the section; long analyses show their size first and can be cancelled.</summary>
[Collection(BrowserCollection.Name)]
public sealed class FlowNetPageTests(BrowserFixture fixture)
{
    [Fact]
    public async Task SheetPileExample_Caption_NfOverNdIsOneHalfWithinHalfAChannel()
    {
        // The cofferdam example is a single sheet pile 5 m into a 10 m layer, s/T = 1/2, for which the flow net has
        // Nf/Nd = K(m′)/(2K(m)) = 1/2 exactly (Harr, "Groundwater and Seepage", 1962, ch. 5).
        await using var session = await PageSession.OpenAsync(fixture);
        var page = session.Page;
        await page.GotoAsync("/?example=cofferdam-sheet-pile");
        await page.Locator("body[data-run-state=done]").WaitForAsync(new() { Timeout = 90_000 });
        var caption = await page.Locator("#flow-net-counts").InnerTextAsync();
        double nf = double.Parse(Regex.Match(caption, @"Nf = ([\d.]+) ").Groups[1].Value, CultureInfo.InvariantCulture);
        int nd = int.Parse(Regex.Match(caption, @"Nd = (\d+) ").Groups[1].Value, CultureInfo.InvariantCulture);
        Assert.True(Math.Abs(nf / nd - 0.5) <= 0.5 / nd, $"Nf/Nd = {nf}/{nd} = {nf / nd:F4}; Harr 1962: 0.5 ± {0.5 / nd:F4}");
        Assert.True(nf >= 4, $"only {nf} flow channels");
        Assert.Contains("shape factor q/(k·H)", caption);
        Assert.Contains("√(kx·ky)", caption);
        Assert.Equal(nd - 1, await page.Locator("#picture path.equipotential").CountAsync());
        Assert.True(await page.Locator("#picture path.equipotential-casing").CountAsync() > 0, "equipotentials have no halo");

        // Fit frames the pile: the 120 m wide soil zone reaches beyond the frame; Whole shows all of it.
        var frame = await page.Locator("#picture rect.frame").BoundingBoxAsync();
        var zone = await page.Locator("#picture path.zone-outline").First.BoundingBoxAsync();
        Assert.True(zone!.Width > frame!.Width * 1.3, $"Fit shows {zone.Width:F0} px of zone in a {frame.Width:F0} px frame");
        await session.ScreenshotViewportAsync("flow-net-sheet-pile-fit");
        await page.ClickAsync("#zoom-all");
        zone = await page.Locator("#picture path.zone-outline").First.BoundingBoxAsync();
        Assert.True(zone!.Width <= frame.Width + 1, $"Whole shows a {zone.Width:F0} px zone in a {frame.Width:F0} px frame");
        await session.ScreenshotViewportAsync("flow-net-sheet-pile-whole");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task SizeEstimate_OrderTwoWithConvergenceCheck_WarnsOfTheMultiplier()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        var page = session.Page;
        await page.GotoAsync("/?run=0");
        await page.WaitForFunctionAsync("() => /triangles/.test(document.querySelector('#size-estimate').textContent)");
        Assert.DoesNotContain("×", await page.Locator("#size-estimate").InnerTextAsync());
        await page.SelectOptionAsync("#form-editor select[data-path='/mesh/order']", "2");
        await page.SelectOptionAsync("#form-editor select[data-path='/mesh/convergenceCheck']", "true");
        await page.WaitForFunctionAsync("() => /×/.test(document.querySelector('#size-estimate').textContent)", null, new() { Timeout = 10_000 });
        var text = await page.Locator("#size-estimate").InnerTextAsync();
        Assert.Contains("order 2 and the convergence check", text);
        Assert.Contains("large", await page.Locator("#size-estimate").GetAttributeAsync("class") ?? "");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task Cancel_LongAnalysis_StopsAndKeepsTheShownAnalysis()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var id = await page.GetAttributeAsync("#figures", "data-analysis-id");
        // A fine mesh (about 10^6 triangles) takes seconds: long enough to press Cancel.
        await page.Locator("#form-editor input[data-path='/mesh/size']").FillAsync("0.1");
        await page.WaitForTimeoutAsync(300);
        await page.ClickAsync("#run");
        await page.Locator("#cancel").WaitForAsync(new() { Timeout = 5_000 });
        await page.WaitForTimeoutAsync(300);
        await page.ClickAsync("#cancel");
        await page.Locator("body[data-run-state=cancelled]").WaitForAsync(new() { Timeout = 5_000 });
        Assert.Contains("cancelled", await page.Locator("#alert").InnerTextAsync());
        Assert.Equal(id, await page.GetAttributeAsync("#figures", "data-analysis-id"));
        Assert.False(await page.Locator("#cancel").IsVisibleAsync());
        session.AssertNoConsoleErrors(e => e.Contains("abort", StringComparison.OrdinalIgnoreCase));
    }
}
