using Microsoft.Playwright;
using Xunit;

namespace SwitchTag.Browser.Tests;

/// <summary>Debian's chromium driven by Playwright (no browser download: the package's own driver
/// launches /usr/bin/chromium). Fails with a plain message when chromium is not installed.</summary>
public sealed class Browser : IAsyncLifetime
{
    public const string Chromium = "/usr/bin/chromium";

    private IPlaywright? _playwright;
    private IBrowser? _browser;

    /// <summary>Screenshots go under the test's output folder, never into the checkout's sources.</summary>
    public static string ScreenshotDir { get; } = Directory.CreateDirectory(Path.Combine(AppContext.BaseDirectory, "screenshots")).FullName;

    public async Task InitializeAsync()
    {
        if (!File.Exists(Chromium))
            throw new InvalidOperationException($"{Chromium} is missing; these tests drive Debian's chromium: apt-get install -y chromium (.ci/run does).");
        _playwright = await Playwright.CreateAsync();
        _browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions { ExecutablePath = Chromium, Headless = true });
    }

    /// <summary>A fresh page of 1280×900 that accepts downloads and records every dialog a script opens.</summary>
    public async Task<(IPage Page, List<string> Dialogs)> OpenAsync(string file)
    {
        var context = await _browser!.NewContextAsync(new BrowserNewContextOptions { ViewportSize = new ViewportSize { Width = 1280, Height = 900 }, AcceptDownloads = true });
        var page = await context.NewPageAsync();
        var dialogs = new List<string>();
        page.Dialog += async (_, dialog) => { dialogs.Add($"{dialog.Type}: {dialog.Message}"); await dialog.DismissAsync(); };
        await page.GotoAsync(new Uri(file).AbsoluteUri);
        return (page, dialogs);
    }

    public async Task DisposeAsync()
    {
        if (_browser is not null) await _browser.CloseAsync();
        _playwright?.Dispose();
    }
}
