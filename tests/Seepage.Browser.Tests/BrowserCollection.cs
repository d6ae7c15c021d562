namespace Seepage.Browser.Tests;

/// <summary>Shares one <see cref="BrowserFixture"/> across the browser test classes (they run one after another).</summary>
[CollectionDefinition(Name)]
public sealed class BrowserCollection : ICollectionFixture<BrowserFixture>
{
    public const string Name = "browser";
}
