namespace Seepage.Browser.Tests;

/// <summary>The page's own CSV keeps a structure name that looks like a formula from becoming a live cell (OWASP, "CSV
/// Injection"), while numbers, negative ones included, stay numbers; the page runs under the service's content security
/// policy without a console error.</summary>
[Collection(BrowserCollection.Name)]
public sealed class FormulaInjectionTests(BrowserFixture fixture)
{
    [Fact]
    public async Task UpliftCsv_StructureNamedLikeAFormula_WrittenAsText()
    {
        await using var session = await PageSession.OpenAsync(fixture);
        await session.LoadDemoAsync();
        await session.RunEditedAsync(section => section["structures"]![0]!["name"] = "=HYPERLINK(\"http://example.invalid\",\"x\")");
        var page = session.Page;
        var download = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("#export-uplift"));
        var lines = (await File.ReadAllLinesAsync((await download.PathAsync())!)).Where(l => l.Length > 0).Skip(1).ToList();
        Assert.NotEmpty(lines);
        Assert.All(lines, l => Assert.StartsWith("\"'=HYPERLINK(", l));
        Assert.Contains(lines, l => l.Split(',').Skip(2).Any(cell => cell.StartsWith('-') && double.TryParse(cell,
            System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out _)));
        session.AssertNoConsoleErrors();
    }
}
