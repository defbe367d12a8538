namespace SwitchTag.Tagging;

/// <summary>Constrained Viterbi over IOB2 tags: a path never starts with I-X and I-X only follows
/// B-X or I-X, so every decoded sequence is a valid one. Scores are per-word log-softmax; the
/// probability reported for a word is the softmax probability of its chosen tag.</summary>
public sealed class BioDecoder
{
    private readonly bool[,] _allowed;
    private readonly bool[] _start;

    public IReadOnlyList<string> Labels { get; }

    public BioDecoder(IReadOnlyList<string> labels)
    {
        Labels = labels;
        int n = labels.Count;
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
        var logp = new float[words * n];
        for (int t = 0; t < words; t++)
        {
            var row = logits.Slice(t * n, n);
            float max = float.NegativeInfinity;
            foreach (var v in row) max = Math.Max(max, v);
            double sum = 0;
            foreach (var v in row) sum += Math.Exp(v - max);
            float lse = max + (float)Math.Log(sum);
            for (int j = 0; j < n; j++) logp[t * n + j] = row[j] - lse;
        }
        var score = new float[n];
        var next = new float[n];
        var back = new int[words * n];
        for (int j = 0; j < n; j++) score[j] = _start[j] ? logp[j] : float.NegativeInfinity;
        for (int t = 1; t < words; t++)
        {
            for (int j = 0; j < n; j++)
            {
                float best = float.NegativeInfinity;
                int arg = 0;
                for (int i = 0; i < n; i++)
                    if (_allowed[i, j] && score[i] > best) { best = score[i]; arg = i; }
                next[j] = best + logp[t * n + j];
                back[t * n + j] = arg;
            }
            (score, next) = (next, score);
        }
        int last = 0;
        for (int j = 1; j < n; j++) if (score[j] > score[last]) last = j;
        for (int t = words - 1; t >= 0; t--)
        {
            tags[t] = last;
            probs[t] = MathF.Exp(logp[t * n + last]);
            if (t > 0) last = back[t * n + last];
        }
        return (tags, probs);
    }
}
