using SwitchTag.Tagging;

namespace SwitchTag.Tagging.Tests;

/// <summary>Word-by-word decoding (<see cref="BioPath"/>) against the textbook constrained Viterbi
/// (Viterbi 1967; Jurafsky and Martin, Speech and Language Processing, ch. 8: a full table of back
/// pointers, traced back from the best last tag; written here from memory) on seeded random logits,
/// where no two paths tie.</summary>
public class BioPathTests
{
    private static readonly string[] Labels = ["O", "B-PER", "I-PER", "B-LOC", "I-LOC", "B-ORG", "I-ORG"];

    private static float[] RandomLogits(int words, int seed)
    {
        var random = new Random(seed);
        var logits = new float[words * Labels.Length];
        for (int i = 0; i < logits.Length; i++) logits[i] = (float)(random.NextDouble() * 8 - 4);
        return logits;
    }

    /// <summary>The reference: every word's log-softmax, the whole table of scores and back pointers, one trace back.</summary>
    private static int[] TextbookViterbi(float[] logits, int words)
    {
        int n = Labels.Length;
        bool Starts(int j) => !Labels[j].StartsWith("I-");
        bool Allowed(int i, int j) => Starts(j) || (Labels[i] != "O" && Labels[i][2..] == Labels[j][2..]);
        var logProb = new double[words, n];
        for (int t = 0; t < words; t++)
        {
            double sum = Enumerable.Range(0, n).Sum(j => Math.Exp(logits[t * n + j]));
            for (int j = 0; j < n; j++) logProb[t, j] = logits[t * n + j] - Math.Log(sum);
        }
        var score = new double[words, n];
        var back = new int[words, n];
        for (int j = 0; j < n; j++) score[0, j] = Starts(j) ? logProb[0, j] : double.NegativeInfinity;
        for (int t = 1; t < words; t++)
            for (int j = 0; j < n; j++)
            {
                score[t, j] = double.NegativeInfinity;
                for (int i = 0; i < n; i++)
                    if (Allowed(i, j) && score[t - 1, i] + logProb[t, j] > score[t, j]) { score[t, j] = score[t - 1, i] + logProb[t, j]; back[t, j] = i; }
            }
        var tags = new int[words];
        tags[words - 1] = Enumerable.Range(0, n).MaxBy(j => score[words - 1, j]);
        for (int t = words - 1; t > 0; t--) tags[t - 1] = back[t, tags[t]];
        return tags;
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(300, 2)]
    [InlineData(5000, 3)]
    public void Word_by_word_decoding_equals_the_textbook_viterbi(int words, int seed)
    {
        var logits = RandomLogits(words, seed);
        var (tags, probs) = new BioDecoder(Labels).Decode(logits, words);
        Assert.Equal(TextbookViterbi(logits, words), tags);
        for (int t = 0; t < words; t++)
        {
            var row = logits.AsSpan(t * Labels.Length, Labels.Length).ToArray();
            double softmax = Math.Exp(row[tags[t]]) / row.Sum(v => Math.Exp(v));
            Assert.Equal(softmax, probs[t], 1e-5); // a float softmax against a double one
        }
    }

    [Fact]
    public void Words_are_handed_out_long_before_the_sequence_ends()
    {
        const int words = 20_000;
        var logits = RandomLogits(words, 4);
        var path = new BioDecoder(Labels).Start();
        int decided = 0;
        for (int t = 0; t < words; t++) path.Push(logits.AsSpan(t * Labels.Length, Labels.Length), (_, _) => decided++);
        // Looks for decided words come at least every 256 words, or as often as the undecided stretch is long.
        Assert.True(decided >= words - 600, $"{decided} of {words} words decided before the end");
        path.Finish((_, _) => decided++);
        Assert.Equal(words, decided);
    }
}
