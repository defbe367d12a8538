using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Formats;
using SwitchTag.Lexicon;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;
using Xunit;
using Xunit.Abstractions;

namespace SwitchTag.Pipeline.Tests;

/// <summary>The whole pipeline with the shipped models on every demo interview, against the hand-made
/// gold in Gold/*.gold.json. A gold heading is found when one produced heading of its label has a
/// variant equal (folded) to one of its surfaces; a produced heading matching no gold heading of its
/// label is wrong. The floors asserted are ones the current models reach.</summary>
public class GoldTests(ITestOutputHelper output)
{
    private static readonly Lazy<IndexPipeline> Pipeline = new(() =>
        new IndexPipelineBuilder().UseShippedModels(TaggingMode.RulesThenModel).Build() is { Pipeline: { } p } ? p
            : throw new InvalidOperationException("the shipped models could not be loaded"));

    public static TheoryData<string> Interviews() =>
        new(Directory.GetFiles(Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Pipeline.Tests", "Gold"), "*.gold.json")
            .Select(Path.GetFileName).Order(StringComparer.Ordinal)!);

    private sealed record GoldHeading(string Label, string Name, string[] Surfaces, string? Country);

    [Theory]
    [MemberData(nameof(Interviews))]
    public void Demo_interview_against_its_gold(string goldFile)
    {
        using var gold = JsonDocument.Parse(File.ReadAllText(Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Pipeline.Tests", "Gold", goldFile)));
        string name = gold.RootElement.GetProperty("interview").GetString()!;
        string main = gold.RootElement.GetProperty("mainLanguage").GetString()!;
        string input = Directory.GetFiles(Path.Combine(TestPaths.RepoRoot, "transcripts-demo"), name + ".*").Single();
        var read = TranscriptFile.Read(input);
        Assert.NotNull(read.Transcript);
        var index = Pipeline.Value.Run(read.Transcript!);
        Assert.Equal(main, index.MainLanguage);

        var headings = gold.RootElement.GetProperty("headings").EnumerateArray().Select(h => new GoldHeading(
            h.GetProperty("label").GetString()!, h.GetProperty("name").GetString()!,
            h.GetProperty("surfaces").EnumerateArray().Select(s => s.GetString()!).ToArray(),
            h.TryGetProperty("country", out var c) ? c.GetString() : null)).ToList();

        int found = 0, countryRight = 0, withCountry = 0;
        var matched = new HashSet<HeadingId>();
        foreach (var g in headings)
        {
            var surfaces = g.Surfaces.Append(g.Name).Select(NameFolding.Fold).ToHashSet(StringComparer.Ordinal);
            var hit = index.Headings.FirstOrDefault(h => h.Label.ToString() == g.Label && h.Variants.Any(v => surfaces.Contains(NameFolding.Fold(v))));
            if (hit is null) { output.WriteLine($"missed  {g.Label} {g.Name}"); continue; }
            found++;
            matched.Add(hit.Id);
            if (g.Country is not null)
            {
                withCountry++;
                if (hit.Place?.Country == g.Country) countryRight++;
            }
            output.WriteLine($"found   {g.Label} {g.Name} as \"{hit.Name}\" [{string.Join(", ", hit.Variants)}] {hit.Place?.Country ?? "-"}");
        }
        var wrong = index.Headings.Where(h => !matched.Contains(h.Id) && !headings.Any(g => g.Label == h.Label.ToString() &&
            g.Surfaces.Append(g.Name).Any(s => h.Variants.Any(v => NameFolding.Fold(v) == NameFolding.Fold(s))))).ToList();
        foreach (var h in wrong) output.WriteLine($"wrong   {h.Label} \"{h.Name}\" [{string.Join(", ", h.Variants)}]");

        var goldWork = gold.RootElement.GetProperty("worklist").EnumerateArray()
            .Select(w => (Language: w.GetProperty("language").GetString()!, Text: w.GetProperty("text").GetString()!)).ToList();
        int workFound = goldWork.Count(w => index.Worklist.Any(item => item.Language == w.Language && Overlaps(item.Text, w.Text)));
        int workRight = index.Worklist.Count(item => goldWork.Any(w => item.Language == w.Language && Overlaps(item.Text, w.Text)));

        output.WriteLine($"{name}: headings found {found}/{headings.Count}, wrong {wrong.Count} of {index.Headings.Length}, " +
                         $"countries right {countryRight}/{withCountry}; worklist found {workFound}/{goldWork.Count}, right {workRight}/{index.Worklist.Length}");

        // Floors reached by the shipped models (printed numbers above); a drop below them is a regression.
        Assert.True(found >= headings.Count * 0.5, $"found {found} of {headings.Count} gold headings");
        Assert.True(workFound >= goldWork.Count * 0.8, $"found {workFound} of {goldWork.Count} worklist stretches");
        Assert.True(countryRight >= withCountry * 0.5, $"{countryRight} of {withCountry} countries right");
    }

    // The gold stretch and the produced one share most of their words.
    private static bool Overlaps(string produced, string gold)
    {
        var a = Words(produced);
        var b = Words(gold);
        if (a.Count == 0 || b.Count == 0) return false;
        return a.Intersect(b).Count() >= 0.5 * Math.Min(a.Count, b.Count);
    }

    private static HashSet<string> Words(string text) =>
        text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries).Select(w => NameFolding.Fold(w.Trim(',', '.', '!', '?', ':', ';', '¡', '¿', '"'))).Where(w => w.Length > 0).ToHashSet();

    // A mention may end exactly where its cue ends: the closed range, not TimeRange.Contains.
    private static bool Within(TimeRange range, Timecode t) => t >= range.Start && t <= range.End;

    [Fact]
    public void Every_demo_mention_lies_inside_its_cue()
    {
        foreach (var file in Directory.GetFiles(Path.Combine(TestPaths.RepoRoot, "transcripts-demo")).Where(f => !f.EndsWith("README.md", StringComparison.Ordinal)))
        {
            var read = TranscriptFile.Read(file);
            Assert.True(read.Transcript is not null, $"{file}: the demo transcript was rejected: {string.Join("; ", read.Diagnostics)}");
            var index = Pipeline.Value.Run(read.Transcript);
            foreach (var m in index.Mentions)
            {
                var turn = index.TurnAt(m.Mention.Turn);
                var first = turn.Cues.First(c => m.Mention.CharStart < c.CharEnd);
                var last = turn.Cues.Last(c => m.Mention.CharEnd > c.CharStart);
                Assert.True(Within(index.Transcript.Cues[first.CueIndex].Time, m.Time.Start), $"{file}: {m.Mention.Text} at {m.Time}");
                Assert.True(Within(index.Transcript.Cues[last.CueIndex].Time, m.Time.End), $"{file}: {m.Mention.Text} at {m.Time}");
            }
            foreach (var w in index.Worklist)
                Assert.True(Within(index.TurnAt(w.Turn).Time, w.Time.Start) && Within(index.TurnAt(w.Turn).Time, w.Time.End), $"{file}: {w.Text}");
        }
    }
}
