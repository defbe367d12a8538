using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Formats;
using SwitchTag.Lexicon;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;
using Xunit;
using Xunit.Abstractions;

namespace SwitchTag.Pipeline.Tests;

/// <summary>The frozen evaluation interviews (transcripts-eval/, gold in EvalGold/*.gold.json), never
/// tuned on. Asserted: each file reads, and its gold agrees with the talk and with GeoNames. Printed, not
/// asserted: how the pipeline scores against the gold (the targets are measured by scripts/eval-index).</summary>
public class EvalSetTests(ITestOutputHelper output)
{
    private static readonly string GoldDir = Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Pipeline.Tests", "EvalGold");

    private static readonly Lazy<IndexPipeline> Pipeline = new(() =>
        new IndexPipelineBuilder().UseShippedModels(TaggingMode.RulesThenModel).Build() is { Pipeline: { } p } ? p
            : throw new InvalidOperationException("the shipped models could not be loaded"));

    public static TheoryData<string> Interviews() =>
        new(Directory.GetFiles(GoldDir, "*.gold.json").Select(Path.GetFileName).Order(StringComparer.Ordinal)!);

    [Fact]
    public void The_set_has_at_least_four_interviews_each_with_its_gold()
    {
        var transcripts = Directory.GetFiles(Path.Combine(TestPaths.RepoRoot, "transcripts-eval"))
            .Where(f => TranscriptFile.KnownExtensions.Contains(Path.GetExtension(f)) && !f.EndsWith("README.md", StringComparison.Ordinal))
            .Select(f => Path.GetFileNameWithoutExtension(f)).Order(StringComparer.Ordinal).ToList();
        var golds = Directory.GetFiles(GoldDir, "*.gold.json").Select(f => Path.GetFileName(f)[..^".gold.json".Length]).Order(StringComparer.Ordinal).ToList();
        Assert.True(transcripts.Count >= 4, $"{transcripts.Count} evaluation interviews");
        Assert.Equal(transcripts, golds);
    }

    [Theory]
    [MemberData(nameof(Interviews))]
    public void Gold_agrees_with_the_talk_and_with_GeoNames(string goldFile)
    {
        using var gold = JsonDocument.Parse(File.ReadAllText(Path.Combine(GoldDir, goldFile)));
        var transcript = Read(gold.RootElement);
        string talk = string.Join("\n", TurnBuilder.Build(transcript).Select(t => t.Text));
        var entries = GoldEntry.ReadAll(gold.RootElement);

        // Every surface and every worklist stretch is quoted exactly as the readers give the talk.
        var quotes = entries.SelectMany(e => e.Surfaces)
            .Concat(gold.RootElement.GetProperty("worklist").EnumerateArray().Select(w => w.GetProperty("text").GetString()!));
        var missing = quotes.Where(q => !talk.Contains(q, StringComparison.Ordinal)).ToList();
        Assert.True(missing.Count == 0, $"not in the talk: {string.Join(" | ", missing)}");

        // One surface names one heading of a label, or the scoring could not tell them apart.
        var clashes = entries.GroupBy(e => e.Label).SelectMany(g => g.SelectMany(e => e.Surfaces.Select(s => (Form: NameFolding.Fold(s), e.Name)))
            .GroupBy(x => x.Form).Where(x => x.Select(y => y.Name).Distinct().Count() > 1).Select(x => x.Key)).ToList();
        Assert.True(clashes.Count == 0, $"surfaces under two headings: {string.Join(", ", clashes)}");

        // Every gold place id is a GeoNames cities15000 row in the gold country (../shared/data/gazetteer).
        var cities = GeoNamesCountries();
        foreach (var e in entries.Where(e => e.GeonameId is not null))
        {
            Assert.True(cities.TryGetValue(e.GeonameId!.Value, out var country), $"{e.Name}: {e.GeonameId} is not in cities15000");
            Assert.Equal(e.Country, country);
        }
        Assert.All(entries.Where(e => e.Label != "LOC"), e => Assert.False(e.HasGeonameId, $"{e.Name} is no place but has a geonameId"));
    }

    [Theory]
    [MemberData(nameof(Interviews))]
    public void Pipeline_scored_against_the_gold(string goldFile)
    {
        using var gold = JsonDocument.Parse(File.ReadAllText(Path.Combine(GoldDir, goldFile)));
        var transcript = Read(gold.RootElement);
        var index = Pipeline.Value.Run(transcript);
        var score = GoldScore.Of(GoldEntry.ReadAll(gold.RootElement), index);
        foreach (var line in score.Lines) output.WriteLine(line);
        output.WriteLine(score.Summary(gold.RootElement.GetProperty("interview").GetString()!));
        Assert.NotEmpty(index.Turns);
    }

    private static Transcript Read(JsonElement gold)
    {
        string name = gold.GetProperty("interview").GetString()!;
        string input = Directory.GetFiles(Path.Combine(TestPaths.RepoRoot, "transcripts-eval"), name + ".*").Single();
        var read = TranscriptFile.Read(input);
        Assert.True(read.Transcript is not null, $"{input} did not read");
        Assert.True(read.Diagnostics.IsEmpty, $"{input}: {string.Join("; ", read.Diagnostics.Select(d => d.Message))}");
        return read.Transcript!;
    }

    private static Dictionary<long, string> GeoNamesCountries() =>
        File.ReadLines(TestPaths.RequireData(Path.Combine("gazetteer", "geonames-cities15000.txt")))
            .Select(l => l.Split('\t')).Where(f => f.Length > 8)
            .ToDictionary(f => long.Parse(f[0], System.Globalization.CultureInfo.InvariantCulture), f => f[8]);
}
