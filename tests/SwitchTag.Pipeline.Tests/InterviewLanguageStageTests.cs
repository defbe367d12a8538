using System.Globalization;
using System.Text;
using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.LanguageId.Interview;
using SwitchTag.LanguageId.Training;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Pipeline.Tests;

/// <summary>The language stage as <c>switchtag index</c> runs it: the interview segmented as a whole,
/// its main language chosen from the narrators' talk, the worklist cut at cues and split into claimed
/// stretches and stretches to check.</summary>
[Collection(nameof(ModelCollection))]
public sealed class InterviewLanguageStageTests(ModelFixture fixture)
{
    private sealed record Utterance(string Conversation, string Speaker, string Text, string[] Labels);

    /// <summary>Real Spanish-English conversations with per-word gold, ../shared/data/codeswitch/miami-dev
    /// (Bangor Miami corpus, development half).</summary>
    private static List<IGrouping<string, Utterance>> Miami() =>
        File.ReadLines(TestPaths.RequireData("codeswitch/miami-dev/gold.jsonl")).Select(line =>
        {
            using var doc = JsonDocument.Parse(line);
            var r = doc.RootElement;
            string id = r.GetProperty("id").GetString()!;
            return new Utterance(id[..id.IndexOf(':')], r.GetProperty("speaker").GetString()!, r.GetProperty("text").GetString()!,
                r.GetProperty("labels").GetString()!.Split(' '));
        }).GroupBy(u => u.Conversation).ToList();

    [Fact]
    public void The_index_segments_the_interview_as_a_whole_and_records_its_profile()
    {
        // The first Miami dev stretch of 150 utterances whose gold words are 20-80% Spanish.
        var conversation = Miami().Select(c => c.Take(150).ToList()).First(c => SpanishShare(c) is >= 0.2 and <= 0.8);
        var index = Index(conversation, main: null);

        // Same spans as the interview-level decoder over the turns, not turn by turn.
        var whole = fixture.Segmenter.SegmentInterview(index.Turns.Select(t => t.Text).ToList());
        Assert.Equal(whole.Spans.SelectMany(s => s), index.Spans.SelectMany(s => s.Select(t => t.Value)));
        // Both gold languages are in the profile, together holding most of it, Spanish's share near the gold's.
        Assert.Equal(["en", "es"], index.LanguageProfile.Select(p => p.Language.Code).Where(l => l is "en" or "es").Order());
        Assert.InRange(index.LanguageProfile.Where(p => p.Language.Code is "en" or "es").Sum(p => p.Share), 0.9, 1.0001);
        Assert.InRange(index.LanguageProfile.Single(p => p.Language == "es").Share, SpanishShare(conversation) - 0.15, SpanishShare(conversation) + 0.15);
    }

    [Fact]
    public void The_main_language_is_the_narrators_and_the_choice_is_recorded()
    {
        // Miami dev: the speaker with the most words narrates (no interviewer label there); their gold
        // words' leading language must be the main language, chosen by narrator talk or the tie-break.
        foreach (var conversation in Miami().Take(3))
        {
            var utterances = conversation.Take(120).ToList();
            var index = Index(utterances, main: null);
            var decision = index.MainLanguageDecision!;
            Assert.Contains(decision.Basis, new[] { "narrator-talk", "interviewer-tie-break" });
            string narrator = Assert.Single(decision.Narrators);
            var narratorWords = utterances.Where(u => u.Speaker == narrator).SelectMany(u => u.Labels).Where(l => l is "en" or "es").ToList();
            var counts = narratorWords.GroupBy(l => l).OrderByDescending(g => g.Count()).ToList();
            bool clear = counts.Count == 1 || counts[0].Count() - counts[1].Count() > 0.2 * narratorWords.Count;
            if (clear) Assert.Equal(counts[0].Key, index.MainLanguage);
            var given = Index(utterances, main: "es");
            Assert.Equal("es", given.MainLanguage);
            Assert.Equal("given", given.MainLanguageDecision!.Basis);
        }
    }

    [Fact]
    public void An_unsupported_main_language_is_a_usage_error_naming_the_code()
    {
        // "eu" is the ISO 639-1 code of Basque (from memory); models/langid.md lists it as unsupported.
        Assert.DoesNotContain(new LanguageCode("eu"), fixture.Segmenter.Languages);
        string dir = Path.Combine(Path.GetTempPath(), "switchtag-main-" + Guid.NewGuid().ToString("N"));
        try
        {
            string demo = Path.Combine(TestPaths.RepoRoot, "transcripts-demo", "kowalczyk-1998.vtt");
            var request = IndexRequest.From([demo], dir, null, "eu", "rules-only", null, null, out var usage)!;
            Assert.Null(usage);
            var log = new StringWriter();
            Assert.Equal(IndexRunResult.NotStarted, IndexRun.Execute(request, log));
            Assert.Contains("\"eu\"", log.ToString());
            Assert.Contains("switchtag langid --languages", log.ToString());
        }
        finally
        {
            if (Directory.Exists(dir)) Directory.Delete(dir, recursive: true);
        }
    }

    [Fact]
    public void A_worklist_stretch_never_runs_into_the_next_cue()
    {
        // Two cues of one speaker, both Polish held-out UD sentences (../shared/data/lid/pl.txt, the
        // evaluation split), after an English turn: one turn, but each cue its own stretch.
        var polish = File.ReadLines(TestPaths.RequireData("lid/pl.txt"))
            .Where(l => HoldOut.Of(l) == Split.Evaluation && l.Split(' ').Length is >= 6 and <= 12 && l.All(c => c != '<' && c != '-')).Take(2).ToList();
        var english = File.ReadLines(TestPaths.RequireData("lid/en.txt"))
            .Where(l => HoldOut.Of(l) == Split.Evaluation && l.Split(' ').Length is >= 8 and <= 14 && l.All(c => c != '<' && c != '-')).Take(3).ToList();
        var cues = english.Select(e => ("A", e)).Concat(polish.Select(p => ("B", p))).Append(("A", english[0])).ToList();
        var index = Index(cues, main: "en");
        var items = index.Worklist.Where(w => w.Language == "pl").ToList();
        Assert.Equal(2, items.Count);
        for (int i = 0; i < 2; i++)
        {
            Assert.Equal(polish[i].Trim(), items[i].Text);
            Assert.Equal((english.Count + i) * 5000, items[i].Time.Start.Milliseconds);
            Assert.Equal((english.Count + i) * 5000 + 4000, items[i].Time.End.Milliseconds);
        }
    }

    [Fact]
    public void Uncertain_stretches_go_to_checking_with_their_calibrated_confidence()
    {
        // Miami dev conversations, main language given as English: every Spanish stretch is work.
        var items = new List<WorklistItem>();
        var spans = new List<LanguageSpan>();
        foreach (var conversation in Miami().Take(4))
        {
            var index = Index(conversation.Take(150).ToList(), main: "en");
            items.AddRange(index.Worklist);
            spans.AddRange(index.Spans.SelectMany(s => s.Select(t => t.Value)));
        }
        Assert.NotEmpty(items);
        Assert.All(items, w => Assert.Equal(w.Confidence < StretchCalibration.CheckBelow, w.Check));
        Assert.Contains(items, w => w.Check);
        Assert.Contains(items, w => !w.Check);
        // Calibrated, so not the raw posterior's near-certain 1 on every stretch.
        Assert.True(items.Count(w => w.Confidence >= 0.9999) < items.Count / 2, "worklist confidences look uncalibrated");
    }

    private static double SpanishShare(List<Utterance> utterances)
    {
        var words = utterances.SelectMany(u => u.Labels).Where(l => l is "en" or "es").ToList();
        return words.Count == 0 ? 0 : words.Count(l => l == "es") / (double)words.Count;
    }

    private InterviewIndex Index(List<Utterance> utterances, string? main) =>
        Index(utterances.Select(u => (u.Speaker, u.Text)).ToList(), main);

    /// <summary>The cues as a WebVTT file (5 s apart, 4 s long), indexed by the shipped pipeline with rule names only.</summary>
    private InterviewIndex Index(List<(string Speaker, string Text)> cues, string? main)
    {
        string path = Path.Combine(Path.GetTempPath(), "switchtag-lang-" + Guid.NewGuid().ToString("N") + ".vtt");
        var vtt = new StringBuilder("WEBVTT\n\n");
        for (int i = 0; i < cues.Count; i++)
            vtt.Append(Clock(i * 5000)).Append(" --> ").Append(Clock(i * 5000 + 4000)).Append('\n')
               .Append("<v ").Append(cues[i].Speaker).Append('>').Append(cues[i].Text.Replace("<", "").Replace(">", "")).Append("\n\n");
        File.WriteAllText(path, vtt.ToString());
        try
        {
            var build = new IndexPipelineBuilder().UseShippedModels(TaggingMode.RulesOnly).UseSegmenter(fixture.Segmenter).UseMainLanguage(main).Build();
            var pipeline = build.Pipeline ?? throw new InvalidOperationException(build.Error);
            var read = pipeline.Read(path);
            return pipeline.Run(read.Transcript ?? throw new InvalidOperationException(string.Join("; ", read.Diagnostics)));
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static string Clock(int ms) =>
        TimeSpan.FromMilliseconds(ms).ToString(@"hh\:mm\:ss\.fff", CultureInfo.InvariantCulture);
}
