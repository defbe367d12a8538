namespace SwitchTag.Tagging;

/// <summary>Constrained Viterbi over IOB2 tags: a path never starts with I-X and I-X only follows
/// B-X or I-X, so every decoded sequence is a valid one. Scores are per-word log-softmax; the
/// probability reported for a word is the softmax probability of its chosen tag. A sequence is
/// decoded word by word (<see cref="Start"/>, <see cref="BioPath"/>), so one speaker turn of 200k
/// cues, one sentence of millions of words, never holds all its logits at once.</summary>
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

    /// <summary>Whether tag <paramref name="to"/> may follow tag <paramref name="from"/>.</summary>
    internal bool Allowed(int from, int to) => _allowed[from, to];

    /// <summary>Whether a sequence may start with tag <paramref name="tag"/>.</summary>
    internal bool Starts(int tag) => _start[tag];

    /// <summary>A new sequence, fed one row of logits per word.</summary>
    public BioPath Start() => new(this);

    /// <summary>Decodes <paramref name="words"/> rows of <c>Labels.Count</c> logits.</summary>
    public (int[] Tags, float[] Probabilities) Decode(ReadOnlySpan<float> logits, int words)
    {
        int n = Labels.Count;
        var tags = new int[words];
        var probs = new float[words];
        int t = 0;
        Action<int, float> take = (tag, prob) => { tags[t] = tag; probs[t] = prob; t++; };
        var path = Start();
        for (int w = 0; w < words; w++) path.Push(logits.Slice(w * n, n), take);
        path.Finish(take);
        return (tags, probs);
    }
}
