using System.Text.Json.Nodes;

namespace Seepage.Browser.Tests;

/// <summary>Bad input is reported beside the field it concerns, and never blanks the page.</summary>
[Collection(BrowserCollection.Name)]
public sealed class SectionCheckTests(BrowserFixture fixture)
{
    private static bool IsExpectedRejection(string message) => message.Contains("status of 400");

    [Fact]
    public async Task Editor_NegativeConductivity_ShowsMessageAtTheSoilField()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var section = JsonNode.Parse(await page.InputValueAsync("#editor"))!;
        section["soils"]![0]!["kx"] = -1.0;
        var text = section.ToJsonString(new System.Text.Json.JsonSerializerOptions { WriteIndented = true });
        await session.FillEditorAsync(text);

        var problem = page.Locator("#check-list li.problem[data-pointer^='/soils/0']");
        await problem.First.WaitForAsync(new() { Timeout = 15_000 });
        var pointer = await problem.First.GetAttributeAsync("data-pointer");
        Assert.Contains("soils[0]", await problem.First.InnerTextAsync());
        var marked = await page.Locator("#editor-gutter div.bad").AllInnerTextsAsync();
        Assert.NotEmpty(marked);
        if (pointer == "/soils/0/kx")
        {
            var kxLine = text.Split('\n').ToList().FindIndex(l => l.Contains("\"kx\": -1")) + 1;
            Assert.Contains(kxLine.ToString(), marked);
        }

        await problem.First.Locator("button").ClickAsync();
        Assert.True(await page.Locator("#editor-marks div.focus").CountAsync() == 1, "the problem line is not highlighted in the editor");
        await page.ClickAsync("#run");
        await page.Locator("body[data-run-state=error]").WaitForAsync(new() { Timeout = 30_000 });
        Assert.True(await page.Locator("#alert").IsVisibleAsync(), "no error message after a rejected run");
        Assert.Contains("soils[0]", await page.Locator("#alert").InnerTextAsync());
        await session.ScreenshotAsync("invalid-section");
        session.AssertNoConsoleErrors(IsExpectedRejection);
    }

    [Fact]
    public async Task Editor_BrokenJson_ShowsSyntaxMessageWithoutCallingTheService()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        await session.FillEditorAsync("{\n  \"title\": \"broken\",\n  \"soils\": [ }\n");
        var item = page.Locator("#check-list li.problem");
        await item.First.WaitForAsync(new() { Timeout = 5_000 });
        Assert.Contains("JSON syntax", await item.First.InnerTextAsync());
        Assert.True(await page.Locator("#figures table").CountAsync() > 0, "the last figures disappeared");
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task OpenFile_SectionJson_ReplacesEditorTextAndPreview()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var section = JsonNode.Parse(await page.InputValueAsync("#editor"))!;
        section["title"] = "Opened from a file";
        var oldId = section["soils"]![0]!["id"]!.GetValue<string>();
        section["soils"]![0]!["id"] = "opened-soil";
        foreach (var zone in section["zones"]!.AsArray())
            if (zone!["soil"]!.GetValue<string>() == oldId) zone["soil"] = "opened-soil";
        var path = Path.Combine(Path.GetTempPath(), $"opened-{Guid.NewGuid():N}.section.json");
        await File.WriteAllTextAsync(path, section.ToJsonString());
        try
        {
            await page.SetInputFilesAsync("#file-pick", path);
            await page.Locator("#soil-legend td", new() { HasText = "opened-soil" }).WaitForAsync(new() { Timeout = 5_000 });
            Assert.Contains("Opened from a file", await page.InputValueAsync("#editor"));
            Assert.True(await page.Locator("#picture path.soil-fill[data-soil='opened-soil']").CountAsync() > 0, "preview does not show the opened soil");
        }
        finally
        {
            File.Delete(path);
        }
        session.AssertNoConsoleErrors();
    }

    [Fact]
    public async Task DropFile_SectionJson_ReplacesEditorText()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        var page = session.Page;
        var section = JsonNode.Parse(await page.InputValueAsync("#editor"))!;
        section["title"] = "Dropped onto the editor";
        await page.EvaluateAsync(@"text => {
            const data = new DataTransfer();
            data.items.add(new File([text], 'dropped.section.json', { type: 'application/json' }));
            document.getElementById('editor-frame').dispatchEvent(new DragEvent('drop', { dataTransfer: data, bubbles: true, cancelable: true }));
        }", section.ToJsonString());
        await page.WaitForFunctionAsync("() => document.getElementById('editor').value.includes('Dropped onto the editor')", null, new() { Timeout = 5_000 });
        session.AssertNoConsoleErrors();
    }
}
