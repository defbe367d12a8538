using System.Text.Json;
using SwitchTag.Core.Pipeline;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>The demo interviews' hand-made gold (tests/SwitchTag.Pipeline.Tests/Gold, written from the
/// files by another engineer, independently of these readers) quotes names and foreign stretches "exactly
/// as in the plain cue text": each must be found in the turn texts the readers produce.</summary>
public class DemoGoldTests
{
    [Fact]
    public void Gold_surfaces_and_worklist_texts_occur_in_the_plain_text()
    {
        var goldDir = Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Pipeline.Tests", "Gold");
        foreach (var t in DemoTranscripts.ReadAll())
        {
            var goldPath = Path.Combine(goldDir, t.Name + ".gold.json");
            Assert.True(File.Exists(goldPath), $"{t.Name}: no gold file {goldPath}; every demo interview has one");
            string text = string.Join("\n", TurnBuilder.Build(t).Select(x => x.Text));
            using var gold = JsonDocument.Parse(File.ReadAllText(goldPath));
            var quotes = new List<string>();
            if (gold.RootElement.TryGetProperty("headings", out var headings))
                foreach (var h in headings.EnumerateArray())
                    if (h.TryGetProperty("surfaces", out var surfaces))
                        quotes.AddRange(surfaces.EnumerateArray().Select(s => s.GetString()!));
            if (gold.RootElement.TryGetProperty("worklist", out var worklist))
                quotes.AddRange(worklist.EnumerateArray().Select(w => w.GetProperty("text").GetString()!));
            var missing = quotes.Where(q => !text.Contains(q, StringComparison.Ordinal)).ToList();
            Assert.True(missing.Count == 0, $"{t.Name}: not in the plain text: {string.Join(" | ", missing.Take(10))}");
        }
    }
}
