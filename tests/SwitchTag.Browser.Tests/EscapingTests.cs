using Xunit;

namespace SwitchTag.Browser.Tests;

/// <summary>Markup typed into a transcript stays text on every page: Chromium runs no script from it
/// (no dialog opens) and shows the characters as written.</summary>
public sealed class EscapingTests(Browser browser) : IClassFixture<Browser>
{
    // Invented transcript; each payload would open a dialog if the page let it run (HTML Living
    // Standard: a <script> element runs, an <img> with a bad src fires onerror).
    private const string Transcript =
        "[00:00:01] ANNA: We lived in Warsaw <script>alert(1)</script> and <img src=x onerror=alert(2)> near the river.\n" +
        "[00:00:09] ANNA: Mieszkaliśmy w Warszawie <img src=x onerror=alert(3)> przy ulicy Długiej, a potem w Krakowie.\n" +
        "[00:00:18] INTERVIEWER: And then <svg onload=alert(4)> you left Poland?\n" +
        "[00:00:24] ANNA: Yes, in 1946, to Chicago.\n";

    [Fact]
    public async Task Markup_in_a_transcript_runs_nowhere()
    {
        string input = Path.Combine(Path.GetTempPath(), $"switchtag-escape-{Guid.NewGuid():N}");
        Directory.CreateDirectory(input);
        File.WriteAllText(Path.Combine(input, "nasty-2020.txt"), Transcript);
        string outDir = DemoRun.Run(input, "escape", null, out _);
        try
        {
            foreach (string page in new[] { "nasty-2020/index.html", "collection.html", "review.html" })
            {
                var (p, dialogs) = await browser.OpenAsync(Path.Combine(outDir, page));
                await p.WaitForLoadStateAsync(Microsoft.Playwright.LoadState.Load);
                Assert.Empty(dialogs);
                Assert.Equal(0, await p.Locator("img, [onerror], [onload]").CountAsync());
                Assert.InRange(await p.Locator("script:not([type])").CountAsync(), 0, 1); // the page's own, if it has one
                if (page.EndsWith("index.html"))
                {
                    string text = (await p.Locator("body").InnerTextAsync())!;
                    Assert.Contains("<script>alert(1)</script>", text);
                    Assert.Contains("<img src=x onerror=alert(3)>", text);
                }
                await p.Context.CloseAsync();
            }
        }
        finally
        {
            Directory.Delete(input, recursive: true);
            Directory.Delete(outDir, recursive: true);
        }
    }
}
