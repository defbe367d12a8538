namespace SwitchTag.Tagging;

/// <summary>One sequence decoded by <see cref="BioDecoder"/> as its words arrive (online Viterbi). A
/// word's tag is handed out as soon as every tag the last word could take traces back through the
/// same tag there: no later word can change it. Only the undecided stretch keeps its back pointers
/// and log-probabilities, usually a few words; the arithmetic is the whole-sequence Viterbi's, so
/// tags and probabilities are the same as decoding all words at once.</summary>
public sealed class BioPath
{
    /// <summary>Undecided words between two looks for decided ones, at least; then as many as are undecided, so the looks cost linear time.</summary>
    private const int LookEvery = 256;

    private readonly BioDecoder _decoder;
    private readonly int _n;
    private float[] _score, _next;
    private readonly int[] _trace;
    // Per undecided word: back pointer and log-probability of each tag.
    private byte[] _back;
    private float[] _logProb;
    private int _count;
    private int _lookAt = LookEvery;
    private bool _started;

    internal BioPath(BioDecoder decoder)
    {
        _decoder = decoder;
        _n = decoder.Labels.Count;
        _score = new float[_n];
        _next = new float[_n];
        _trace = new int[_n];
        _back = new byte[LookEvery * _n];
        _logProb = new float[LookEvery * _n];
    }

    /// <summary>Adds the next word's logits; <paramref name="decided"/> gets (tag, probability) of every
    /// word now decided, in order.</summary>
    public void Push(ReadOnlySpan<float> logits, Action<int, float> decided)
    {
        if (logits.Length != _n) throw new ArgumentException($"expected {_n} logits", nameof(logits));
        if ((_count + 1) * _n > _back.Length)
        {
            Array.Resize(ref _back, _back.Length * 2);
            Array.Resize(ref _logProb, _logProb.Length * 2);
        }
        float max = float.NegativeInfinity;
        foreach (var v in logits) max = Math.Max(max, v);
        double sum = 0;
        foreach (var v in logits) sum += Math.Exp(v - max);
        float lse = max + (float)Math.Log(sum);
        var logProb = _logProb.AsSpan(_count * _n, _n);
        for (int j = 0; j < _n; j++) logProb[j] = logits[j] - lse;

        if (!_started)
        {
            for (int j = 0; j < _n; j++) _score[j] = _decoder.Starts(j) ? logProb[j] : float.NegativeInfinity;
            _started = true;
        }
        else
        {
            for (int j = 0; j < _n; j++)
            {
                float best = float.NegativeInfinity;
                int arg = 0;
                for (int i = 0; i < _n; i++)
                    if (_decoder.Allowed(i, j) && _score[i] > best) { best = _score[i]; arg = i; }
                _next[j] = best + logProb[j];
                _back[_count * _n + j] = (byte)arg;
            }
            (_score, _next) = (_next, _score);
        }
        _count++;
        if (_count >= _lookAt)
        {
            HandOutDecided(decided);
            _lookAt = _count + Math.Max(LookEvery, _count);
        }
    }

    /// <summary>Ends the sequence: the remaining words follow the best-scoring last tag.</summary>
    public void Finish(Action<int, float> decided)
    {
        if (_count == 0) return;
        int last = 0;
        for (int j = 1; j < _n; j++) if (_score[j] > _score[last]) last = j;
        HandOut(_count, last, decided);
    }

    /// <summary>Finds the latest word every tag of the last word traces back through one tag at,
    /// and hands out that word and those before it.</summary>
    private void HandOutDecided(Action<int, float> decided)
    {
        for (int j = 0; j < _n; j++) _trace[j] = j;
        for (int w = _count - 1; w >= 1; w--)
        {
            bool same = true;
            for (int j = 0; j < _n; j++)
            {
                _trace[j] = _back[w * _n + _trace[j]];
                same &= _trace[j] == _trace[0];
            }
            if (same) { HandOut(w, _trace[0], decided); return; }
        }
    }

    /// <summary>Hands out the first <paramref name="words"/> undecided words, the last of them tagged
    /// <paramref name="lastTag"/>, and keeps the rest.</summary>
    private void HandOut(int words, int lastTag, Action<int, float> decided)
    {
        var tags = new int[words];
        tags[words - 1] = lastTag;
        for (int w = words - 1; w >= 1; w--) tags[w - 1] = _back[w * _n + tags[w]];
        for (int w = 0; w < words; w++) decided(tags[w], MathF.Exp(_logProb[w * _n + tags[w]]));
        int rest = (_count - words) * _n;
        Array.Copy(_back, words * _n, _back, 0, rest);
        Array.Copy(_logProb, words * _n, _logProb, 0, rest);
        _count -= words;
    }
}
