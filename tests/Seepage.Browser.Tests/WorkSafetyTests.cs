using System.Text.Json.Nodes;

namespace Seepage.Browser.Tests;

/// <summary>Work is not lost: the section survives a reload, an example does not replace edits without asking, the
/// section saves to a file, and downloads say when they are of an analysis older than the section.</summary>
[Collection(BrowserCollection.Name)]
public sealed class WorkSafetyTests(BrowserFixture fixture)
{
    [Fact]
    public async Task Reload_UnsavedEdit_IsKept()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        var page = session.Page;
        await page.GotoAsync("/?run=0");
        await page.Locator("#form-editor input[data-path='/title']").FillAsync("Kept across a reload");
        await page.ReloadAsync();
        await page.WaitForFunctionAsync("() => document.querySelector('#editor').value.includes('Kept across a reload')",
            null, new() { Timeout = 30_000 });
        Assert.True(await page.Locator("#work-note").IsVisibleAsync(), "the page should say it restored the section");
        Assert.Equal("Kept across a reload", await page.Locator("#form-editor input[data-path='/title']").InputValueAsync());
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task ExampleSwitch_UnsavedEdits_AsksFirst()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        var page = session.Page;
        await page.GotoAsync("/?run=0");
        await page.Locator("#form-editor input[data-path='/title']").FillAsync("My edited weir");
        var other = await page.Locator("#example-pick option").Nth(1).GetAttributeAsync("value");
        var first = await page.InputValueAsync("#example-pick");

        var asked = new List<string>();
        void Dismiss(object? _, Microsoft.Playwright.IDialog d) { asked.Add(d.Message); d.DismissAsync(); }
        page.Dialog += Dismiss;
        await page.SelectOptionAsync("#example-pick", other!);
        await page.WaitForTimeoutAsync(500);
        Assert.Single(asked);
        Assert.Contains("My edited weir", await page.InputValueAsync("#editor"));
        Assert.Equal(first, await page.InputValueAsync("#example-pick"));
        page.Dialog -= Dismiss;

        page.Dialog += (_, d) => d.AcceptAsync();
        await page.SelectOptionAsync("#example-pick", other!);
        await page.WaitForFunctionAsync("() => !document.querySelector('#editor').value.includes('My edited weir')", null, new() { Timeout = 10_000 });
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task Save_Section_DownloadsSectionJsonOfTheEditorText()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        var page = session.Page;
        await page.GotoAsync("/?run=0");
        await page.Locator("#form-editor input[data-path='/title']").FillAsync("Saved weir");
        var download = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("#file-save"));
        Assert.Equal("saved-weir.section.json", download.SuggestedFilename);
        var saved = await File.ReadAllTextAsync((await download.PathAsync())!);
        Assert.Equal(await page.InputValueAsync("#editor"), saved);
        // Saved: switching the example no longer needs to ask.
        var asked = 0;
        page.Dialog += (_, d) => { asked++; d.DismissAsync(); };
        await page.SelectOptionAsync("#example-pick", (await page.Locator("#example-pick option").Nth(1).GetAttributeAsync("value"))!);
        await page.WaitForFunctionAsync("() => !document.querySelector('#editor').value.includes('Saved weir')", null, new() { Timeout = 10_000 });
        Assert.Equal(0, asked);
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task Exports_AfterAnEdit_SayTheyAreOfThePreviousAnalysisAndOfferARerun()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var id = await page.GetAttributeAsync("#figures", "data-analysis-id");
        Assert.False(await page.Locator("#export-note").IsVisibleAsync());
        await page.Locator("#form-editor input[data-path='/heads/0/total']").FillAsync("7.5");
        var note = page.Locator("#export-note");
        await note.WaitForAsync(new() { Timeout = 5_000 });
        Assert.Contains(id!, await note.InnerTextAsync());
        Assert.Contains("previous analysis", await page.Locator("#key-figures").InnerTextAsync());
        await session.ScreenshotAsync("edited-since-analysis");
        await page.ClickAsync("#rerun");
        await page.WaitForFunctionAsync($"() => document.querySelector('#figures').dataset.analysisId !== '{id}' && document.body.dataset.runState === 'done'",
            null, new() { Timeout = 60_000 });
        Assert.False(await note.IsVisibleAsync());
        var newId = await page.GetAttributeAsync("#figures", "data-analysis-id");
        using var client = new HttpClient { BaseAddress = fixture.Api.BaseAddress };
        var section = JsonNode.Parse(await client.GetStringAsync($"api/v1/analyses/{newId}/section"))!;
        Assert.Equal(7.5, section["heads"]![0]!["total"]!.GetValue<double>());
        session.AssertNoConsoleErrors();
    }
}
