using System.Text.Json;
using Microsoft.Playwright;
using Xunit;

namespace SwitchTag.Browser.Tests;

/// <summary>The report, collection and review pages as a reader uses them, in a real browser
/// (Chromium: what it lays out, follows and runs is the check, not our own HTML strings).</summary>
public sealed class WorkbenchTests(DemoRun demo, Browser browser) : IClassFixture<DemoRun>, IClassFixture<Browser>
{
    private const string Interview = "kowalczyk-1998";

    private string Report => Path.Combine(demo.OutDir, Interview, "index.html");

    private static string Shot(string name) => Path.Combine(Browser.ScreenshotDir, name);

    [Fact]
    public async Task A_heading_link_leads_to_its_mentions()
    {
        var (page, _) = await browser.OpenAsync(Report);
        await page.ScreenshotAsync(new() { Path = Shot("report.png") });
        var link = page.Locator("#places a.heading").First;
        string href = (await link.GetAttributeAsync("href"))!;
        await link.ClickAsync();
        Assert.Equal(href, await page.EvaluateAsync<string>("location.hash"));
        // CSS :target is the element the browser scrolled to (HTML Living Standard, "indicated part of the document").
        var target = page.Locator("section.heading:target");
        Assert.Equal(1, await target.CountAsync());
        Assert.True(await target.IsVisibleAsync());
        var first = target.Locator("li.mention").First;
        Assert.True(await first.Locator("mark").CountAsync() == 1, "a mention marks the name in its sentence");
        // The time opens the recording there (W3C Media Fragments: #t=<seconds>).
        Assert.Matches(@"^\.\./media/kowalczyk-1998\.mp3#t=\d+(\.\d+)?$", await first.Locator("a.time").GetAttributeAsync("href"));
        Assert.Equal("auto", await first.Locator(".ctx").GetAttributeAsync("dir"));
        // Confidences show as a band, the number in the tooltip.
        foreach (var band in await page.Locator("span.band").AllAsync())
        {
            Assert.Contains(await band.TextContentAsync(), new[] { "high", "check" });
            Assert.Matches(@"^confidence [01]\.\d\d$", await band.GetAttributeAsync("title"));
        }
    }

    [Fact]
    public void Every_demo_report_stays_under_a_megabyte()
    {
        var reports = Directory.GetFiles(demo.OutDir, "index.html", SearchOption.AllDirectories);
        Assert.Equal(4, reports.Length);
        foreach (var report in reports) Assert.InRange(new FileInfo(report).Length, 1, 1_000_000);
    }

    [Fact]
    public async Task The_map_has_one_marker_per_linked_place()
    {
        var index = DemoRun.Index(demo.OutDir, Interview);
        var linked = index.GetProperty("headings").EnumerateArray()
            .Where(h => h.GetProperty("place").ValueKind != JsonValueKind.Null).Select(h => h.GetProperty("id").GetString()).ToList();
        Assert.NotEmpty(linked);
        var (page, _) = await browser.OpenAsync(Report);
        var markers = page.Locator("#map svg.map circle.place");
        Assert.Equal(linked.Count, await markers.CountAsync());
        Assert.Equal(linked.Order(StringComparer.Ordinal), (await markers.EvaluateAllAsync<string[]>("ms => ms.map(m => m.dataset.key)")).Order(StringComparer.Ordinal));
        // Every marker is drawn inside the map's box (the browser's own layout boxes).
        var map = (await page.Locator("#map svg.map").BoundingBoxAsync())!;
        foreach (var marker in await markers.AllAsync())
        {
            var box = (await marker.BoundingBoxAsync())!;
            Assert.InRange(box.X, map.X - 5, map.X + map.Width);
            Assert.InRange(box.Y, map.Y - 5, map.Y + map.Height);
        }
        await page.Locator("#map svg.map").ScreenshotAsync(new() { Path = Shot("map.png") });
    }

    [Fact]
    public async Task The_timeline_has_one_band_per_language_stretch()
    {
        var index = DemoRun.Index(demo.OutDir, Interview);
        var spans = index.GetProperty("turns").EnumerateArray().SelectMany(t => t.GetProperty("spans").EnumerateArray())
            .Select(s => s.GetProperty("language").GetString()).ToList();
        var (page, _) = await browser.OpenAsync(Report);
        var bands = page.Locator("#timeline svg.timeline rect.band");
        Assert.Equal(spans, await bands.EvaluateAllAsync<string[]>("bs => bs.map(b => b.dataset.lang)"));
        Assert.Contains(spans, l => l != index.GetProperty("mainLanguage").GetString());
        await page.Locator("#timeline").ScreenshotAsync(new() { Path = Shot("timeline.png") });
    }

    [Fact]
    public async Task Typing_in_the_collection_filter_hides_the_rows_that_do_not_match()
    {
        var (page, _) = await browser.OpenAsync(Path.Combine(demo.OutDir, "collection.html"));
        var rows = page.Locator("tr.row");
        int all = await rows.CountAsync();
        await page.Locator("#filter").PressSequentiallyAsync("warsaw");
        var visible = page.Locator("tr.row:visible");
        int shown = await visible.CountAsync();
        Assert.InRange(shown, 1, all - 1);
        foreach (var text in await visible.EvaluateAllAsync<string[]>("rs => rs.map(r => r.dataset.text)")) Assert.Contains("warsaw", text);
        Assert.Equal(shown.ToString(), await page.Locator("#shown").TextContentAsync());
        await page.Locator("#filter").ScrollIntoViewIfNeededAsync();
        await page.ScreenshotAsync(new() { Path = Shot("collection.png") });
        // Each interview named links to its report, relatively, and the browser resolves it inside the run folder.
        var link = visible.First.Locator("a").First;
        await link.ClickAsync();
        Assert.StartsWith(new Uri(demo.OutDir + "/").AbsoluteUri, page.Url);
        Assert.Matches(@"/index\.html#h-", page.Url);

    }

    [Fact]
    public async Task Decisions_made_in_the_review_page_change_the_next_run()
    {
        var before = DemoRun.Index(demo.OutDir, Interview).GetProperty("headings").EnumerateArray()
            .Where(h => h.GetProperty("label").GetString() == "PER")
            .Select(h => (Id: h.GetProperty("id").GetString()!, Mentions: h.GetProperty("mentions").GetArrayLength())).ToList();
        Assert.True(before.Count >= 3, "the demo interview has three person headings to work on");
        var (reject, from, into) = (before[0], before[1], before[2]);

        var (page, _) = await browser.OpenAsync(Path.Combine(demo.OutDir, "review.html"));
        var section = page.Locator($"section.interview[data-interview=\"{Interview}\"]");
        await section.Locator($"tr.heading[data-original=\"{reject.Id}\"] [data-act=reject]").ClickAsync();
        await section.Locator($"tr.heading[data-original=\"{from.Id}\"] select[data-act=merge]").SelectOptionAsync(into.Id);
        Assert.Equal("2", await page.Locator("#count").TextContentAsync());
        await page.ScreenshotAsync(new() { Path = Shot("review.png") });
        var download = await page.RunAndWaitForDownloadAsync(() => page.Locator("#export").ClickAsync());
        string decisions = Path.Combine(Path.GetTempPath(), $"switchtag-decisions-{Guid.NewGuid():N}.csv");
        await download.SaveAsAsync(decisions);
        // A textarea's value normalises line breaks to LF (HTML Living Standard, "API value"); the file keeps RFC 4180's CRLF.
        Assert.Equal(await page.Locator("#csv").InputValueAsync(), File.ReadAllText(decisions).Replace("\r\n", "\n"));

        string rerun = DemoRun.Run(DemoRun.Demo, "rerun", decisions, out string log);
        try
        {
            var after = DemoRun.Index(rerun, Interview).GetProperty("headings").EnumerateArray()
                .ToDictionary(h => h.GetProperty("id").GetString()!, h => h.GetProperty("mentions").GetArrayLength());
            Assert.DoesNotContain(reject.Id, after.Keys);
            Assert.DoesNotContain(from.Id, after.Keys);
            Assert.Equal(into.Mentions + from.Mentions, after[into.Id]);
            Assert.Contains($"decision applied 1x: {decisions}:2: reject-heading", log);
            Assert.Contains($"decision applied 1x: {decisions}:3: merge-headings", log);
        }
        finally
        {
            Directory.Delete(rerun, recursive: true);
            File.Delete(decisions);
        }
    }
}
