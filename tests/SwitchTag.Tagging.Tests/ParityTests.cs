using System.Text.Json;
using SwitchTag.Tagging;

namespace SwitchTag.Tagging.Tests;

/// <summary>models/ner.parity.json is written by scripts/ner/train.py from PyTorch (the reference
/// implementation of the features and of the network): C# must reproduce its ids exactly and its
/// logits within 1e-4.</summary>
public class ParityTests
{
    private static IEnumerable<(string[] Words, long[][] Features, long[][] Pieces, float[][] Logits)> Fixture()
    {
        using var doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(Models.Directory, "ner.parity.json")));
        foreach (var s in doc.RootElement.GetProperty("sentences").EnumerateArray())
        {
            yield return (
                [.. s.GetProperty("words").EnumerateArray().Select(w => w.GetString()!)],
                [.. s.GetProperty("features").EnumerateArray().Select(r => r.EnumerateArray().Select(v => v.GetInt64()).ToArray())],
                [.. s.GetProperty("pieces").EnumerateArray().Select(r => r.EnumerateArray().Select(v => v.GetInt64()).ToArray())],
                [.. s.GetProperty("logits").EnumerateArray().Select(r => r.EnumerateArray().Select(v => v.GetSingle()).ToArray())]);
        }
    }

    [Fact]
    public void FeatureAndPieceIdsMatchPython()
    {
        foreach (var (words, features, pieces, _) in Fixture())
        {
            var f = new long[words.Length * Models.Ner.FeatureSlots];
            var p = new long[words.Length * PieceEncoder.Slots];
            Models.Ner.Featurize(words, 0, words.Length, f, p);
            for (int i = 0; i < words.Length; i++)
            {
                Assert.Equal(features[i], f.AsSpan(i * Models.Ner.FeatureSlots, Models.Ner.FeatureSlots).ToArray());
                Assert.Equal(pieces[i], p.AsSpan(i * PieceEncoder.Slots, PieceEncoder.Slots).ToArray());
            }
        }
    }

    [Fact]
    public void OnnxLogitsMatchPyTorchWithin1e4()
    {
        var tagger = new SequenceTagger(Models.Ner);
        var fixture = Fixture().ToList();
        // All sentences in one padded batch: padding must not change any real word's logits.
        var logits = tagger.Logits([.. fixture.Select(s => (IReadOnlyList<string>)s.Words)]);
        int labels = Models.Ner.Labels.Count;
        for (int s = 0; s < fixture.Count; s++)
            for (int i = 0; i < fixture[s].Words.Length; i++)
                for (int j = 0; j < labels; j++)
                    Assert.True(Math.Abs(fixture[s].Logits[i][j] - logits[s][i * labels + j]) <= 1e-4,
                        $"sentence {s} word {i} label {j}: {fixture[s].Logits[i][j]} vs {logits[s][i * labels + j]}");
    }

    [Fact]
    public void FnvMatchesPublishedTestVectors()
    {
        // FNV-1a 32-bit test vectors (Fowler/Noll/Vo reference, draft-eastlake-fnv; from memory):
        // "" -> 0x811c9dc5, "a" -> 0xe40c292c, "foobar" -> 0xbf9cf968.
        Assert.Equal(0x811c9dc5u, WordFeatures.Hash("", []));
        Assert.Equal(0xe40c292cu, WordFeatures.Hash("a", []));
        Assert.Equal(0xbf9cf968u, WordFeatures.Hash("foo", "bar".Select(c => (int)c).ToArray()));
    }
}
