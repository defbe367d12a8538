namespace SwitchTag.Tagging;

/// <summary>Constrained Viterbi over IOB2 tags: a path never starts with I-X and I-X only follows
/// B-X or I-X, so every decoded sequence is a valid one. Scores are per-word log-softmax; the
/// probability reported for a word is the softmax probability of its chosen tag. Only each word's
/// log-sum-exp and one byte per word and tag (the back pointer) are kept beside the logits: one speaker
/// turn of 200k cues is one sentence of millions of words.</summary>
public sealed class BioDecoder
{
    private readonly bool[,] _allowed;
    private readonly bool[] _start;

    public IReadOnlyList<string> Labels { get; }

    public BioDecoder(IReadOnlyList<string> labels)
    {
        Labels = labels;
        int n = labels.Count;
        if (n > 256) throw new ArgumentException("at most 256 labels: back pointers are bytes", nameof(labels));
        _allowed = new bool[n, n];
        _start = new bool[n];
        for (int j = 0; j < n; j++)
        {
            _start[j] = !labels[j].StartsWith("I-", StringComparison.Ordinal);
            for (int i = 0; i < n; i++)
                _allowed[i, j] = _start[j] || (labels[i] != "O" && labels[i][2..] == labels[j][2..]);
        }
    }

    /// <summary>Decodes <paramref name="words"/> rows of <c>Labels.Count</c> logits.</summary>
    public (int[] Tags, float[] Probabilities) Decode(ReadOnlySpan<float> logits, int words)
    {
        int n = Labels.Count;
        var tags = new int[words];
        var probs = new float[words];
        if (words == 0) return (tags, probs);
        // A word's log-probability of tag j is logits[t * n + j] - lse[t], a float as it always was.
        var lse = new float[words];
        for (int t = 0; t < words; t++)
        {
            var row = logits.Slice(t * n, n);
            float max = float.NegativeInfinity;
            foreach (var v in row) max = Math.Max(max, v);
            double sum = 0;
            foreach (var v in row) sum += Math.Exp(v - max);
            lse[t] = max + (float)Math.Log(sum);
        }
        var score = new float[n];
        var next = new float[n];
        var back = new byte[words * n];
        for (int j = 0; j < n; j++) score[j] = _start[j] ? logits[j] - lse[0] : float.NegativeInfinity;
        for (int t = 1; t < words; t++)
        {
            for (int j = 0; j < n; j++)
            {
                float best = float.NegativeInfinity;
                int arg = 0;
                for (int i = 0; i < n; i++)
                    if (_allowed[i, j] && score[i] > best) { best = score[i]; arg = i; }
                next[j] = best + (logits[t * n + j] - lse[t]);
                back[t * n + j] = (byte)arg;
            }
            (score, next) = (next, score);
        }
        int last = 0;
        for (int j = 1; j < n; j++) if (score[j] > score[last]) last = j;
        for (int t = words - 1; t >= 0; t--)
        {
            tags[t] = last;
            probs[t] = MathF.Exp(logits[t * n + last] - lse[t]);
            if (t > 0) last = back[t * n + last];
        }
        return (tags, probs);
    }
}
