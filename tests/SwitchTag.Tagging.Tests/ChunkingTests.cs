using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Tagging.Tests;

/// <summary>Long inputs are cut into overlapping windows and stitched: the result must equal the
/// unchunked one, so no mention is lost or doubled at a seam. Text: Universal NER v1 English-EWT
/// test sentences (CC BY-SA 4.0) joined into one long "sentence".</summary>
public class ChunkingTests
{
    private static List<string> LongInput(int words)
    {
        var gold = GoldReader.Read(TestPaths.RequireData("ner/uner/English-EWT/en_ewt-ud-test.iob2"), []);
        return [.. gold.SelectMany(s => s.Words).Take(words)];
    }

    [Fact]
    public void ChunkedLogitsEqualUnchunked()
    {
        var words = LongInput(700);
        var whole = new SequenceTagger(Models.Ner, window: 1000).Logits([words])[0];
        var chunked = new SequenceTagger(Models.Ner, window: 64, overlap: 16).Logits([words])[0];
        Assert.Equal(whole.Length, chunked.Length);
        for (int i = 0; i < whole.Length; i++)
            Assert.True(Math.Abs(whole[i] - chunked[i]) <= 1e-4, $"logit {i}: {whole[i]} vs {chunked[i]}");
    }

    [Fact]
    public void MentionsAcrossSeamsAreFoundOnce()
    {
        // Multi-word names every few words, so several straddle a seam (invented sentence).
        var words = Enumerable.Repeat("Yesterday Anna Maria Novak flew from New York City to Rio de Janeiro .".Split(' '), 50)
            .SelectMany(w => w).ToList();
        var whole = new SequenceTagger(Models.Ner, window: 1000).Spans([words])[0];
        var chunked = new SequenceTagger(Models.Ner, window: 56, overlap: 16).Spans([words])[0];
        Assert.Equal(whole.Select(s => (s.Start, s.End, s.Label)), chunked.Select(s => (s.Start, s.End, s.Label)));
        // Window 56, overlap 16 (the network sees 16 words either side): cores end at 40, 64, 88, ...
        // (stride 24); these are the seams.
        var seams = Enumerable.Range(0, words.Count / 24).Select(k => 40 + 24 * k).ToList();
        Assert.Contains(chunked, s => seams.Any(q => s.Start < q && q < s.End));
    }

    [Fact]
    public void One_long_sentence_tagged_window_by_window_gives_the_spans_of_the_whole()
    {
        // Several batches of windows (36 windows of 56 words per batch of 2048 words), so the
        // decoder runs across batch seams as well as window seams.
        var words = LongInput(4000);
        var tagger = new SequenceTagger(Models.Ner, window: 56, overlap: 16);
        var whole = tagger.Spans([words])[0];
        Assert.NotEmpty(whole);
        Assert.Equal(whole, tagger.SpansOf(words));
    }
}
