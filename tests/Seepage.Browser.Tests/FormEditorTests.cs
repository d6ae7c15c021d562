using System.Text.Json.Nodes;

namespace Seepage.Browser.Tests;

/// <summary>The structured editor and the JSON text are one document: every example goes through the form unchanged,
/// an edit on either side shows on the other, and clicking a member in the picture selects its row.</summary>
[Collection(BrowserCollection.Name)]
public sealed class FormEditorTests(BrowserFixture fixture)
{
    [Fact]
    public async Task Form_EveryExample_RoundTripsToIdenticalJson()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.Page.GotoAsync("/?run=0");
        var page = session.Page;
        await page.Locator("#form-editor [data-path]").First.WaitForAsync();
        var names = await page.Locator("#example-pick option").EvaluateAllAsync<string[]>("os => os.map(o => o.value)");
        Assert.NotEmpty(names);
        using var client = new HttpClient { BaseAddress = fixture.Api.BaseAddress };
        foreach (var name in names)
        {
            var expected = JsonNode.Parse(await client.GetStringAsync($"api/v1/examples/{name}"));
            await page.SelectOptionAsync("#example-pick", name);
            await page.WaitForFunctionAsync("t => { try { return JSON.parse(document.querySelector('#editor').value).title === t; } catch { return false; } }",
                expected!["title"]!.GetValue<string>());
            await page.WaitForTimeoutAsync(400); // the form is redrawn with the preview (250 ms after an edit)
            var before = await page.InputValueAsync("#editor");
            int inputs = await page.EvaluateAsync<int>(@"() => {
                const all = [...document.querySelectorAll('#form-editor [data-path]')];
                for (const el of all) el.dispatchEvent(new Event(el.tagName === 'SELECT' ? 'change' : 'input', { bubbles: true }));
                return all.length; }");
            Assert.True(inputs > 20, $"{name}: only {inputs} form inputs");
            var after = await page.InputValueAsync("#editor");
            Assert.Equal(before, after);
            Assert.True(JsonNode.DeepEquals(expected, JsonNode.Parse(after)), $"{name}: the form changed the section:\n{after}");
        }
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task Form_EditBothWays_JsonAndFormAgree()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.Page.GotoAsync("/?run=0");
        var page = session.Page;
        var tip = page.Locator("#form-editor input[data-path='/cutoffs/1/tip']");
        await tip.FillAsync("14, -9.5");
        var section = JsonNode.Parse(await page.InputValueAsync("#editor"))!;
        Assert.Equal(-9.5, section["cutoffs"]![1]!["tip"]![1]!.GetValue<double>());
        await page.SelectOptionAsync("#form-editor select[data-path='/soils/0/creepClass']", "coarse-sand");
        section = JsonNode.Parse(await page.InputValueAsync("#editor"))!;
        Assert.Equal("coarse-sand", section["soils"]![0]!["creepClass"]!.GetValue<string>());

        section["heads"]![0]!["total"] = 8.25;
        await session.FillEditorAsync(section.ToJsonString());
        await page.ClickAsync("#tab-form");
        await page.WaitForFunctionAsync("() => document.querySelector(\"#form-editor input[data-path='/heads/0/total']\")?.value === '8.25'");
        await session.ScreenshotAsync("form-editor");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task Picture_ClickCutoffAndHeadLine_SelectsTheirRows()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        await page.ClickAsync("#tab-json");
        await page.Locator("#picture path.wall[data-pointer='/cutoffs/1']").ClickAsync(new() { Force = true });
        Assert.True(await page.Locator("#panel-form").IsVisibleAsync(), "clicking a cutoff should show the form");
        Assert.True(await page.Locator("#form-editor tr.selected[data-pointer='/cutoffs/1']").IsVisibleAsync(), "the cutoff row is not selected");
        await page.Locator("#picture path.head-boundary[data-pointer='/heads/1']").ClickAsync(new() { Force = true });
        Assert.Equal(1, await page.Locator("#form-editor tr.selected").CountAsync());
        Assert.True(await page.Locator("#form-editor tr.selected[data-pointer='/heads/1']").IsVisibleAsync(), "the head row is not selected");
        session.AssertNoConsoleErrors();
    }
}
