using SwitchTag.Core.Documents;

namespace SwitchTag.Tagging;

/// <summary>Tags pre-tokenised sentences with a <see cref="NerModel"/>. Long sentences are cut into
/// windows of <see cref="Window"/> words overlapping by <see cref="Overlap"/> on each side; every
/// word takes its logits from the one window whose core holds it, and the whole sentence is then
/// decoded at once. The network sees 16 words either side (kernel 3, dilations 1, 2, 4, 8, 1) and the
/// features use the full sentence, so with an overlap of at least 16 the stitched logits equal the
/// unchunked ones and no mention is lost or doubled at a seam. Windows of many sentences are
/// batched together, longest first, each batch holding windows of similar length.</summary>
public sealed class SequenceTagger(NerModel model, int window = 256, int overlap = 16, int batchWords = 2048)
{
    private readonly BioDecoder _decoder = new(model.Labels);

    public int Window => window;
    public int Overlap => overlap;

    private readonly record struct Chunk(int Sentence, int Start, int Length, int CoreStart, int CoreEnd);

    /// <summary>Per-sentence logits (words x labels), chunked and stitched as described above.</summary>
    public float[][] Logits(IReadOnlyList<IReadOnlyList<string>> sentences)
    {
        int labels = model.Labels.Count;
        var result = new float[sentences.Count][];
        var chunks = new List<Chunk>();
        for (int s = 0; s < sentences.Count; s++)
        {
            result[s] = new float[sentences[s].Count * labels];
            chunks.AddRange(Windows(s, sentences[s].Count));
        }
        chunks.Sort((a, b) => b.Length.CompareTo(a.Length));
        var inputs = new BatchInputs();
        for (int i = 0; i < chunks.Count;)
        {
            int count = BatchSize(chunks, i);
            var logits = RunBatch(sentences, chunks, i, count, inputs);
            for (int b = 0; b < count; b++)
            {
                var c = chunks[i + b];
                Core(logits, chunks[i].Length, b, c).CopyTo(result[c.Sentence].AsSpan(c.CoreStart * labels));
            }
            i += count;
        }
        return result;
    }

    /// <summary>Decoded IOB2 tags per word of each sentence.</summary>
    public string[][] Tags(IReadOnlyList<IReadOnlyList<string>> sentences)
    {
        var logits = Logits(sentences);
        return [.. logits.Select((l, s) => _decoder.Decode(l, sentences[s].Count).Tags.Select(t => model.Labels[t]).ToArray())];
    }

    /// <summary>Name spans of each sentence.</summary>
    public WordSpan[][] Spans(IReadOnlyList<IReadOnlyList<string>> sentences)
    {
        var logits = Logits(sentences);
        var output = new WordSpan[sentences.Count][];
        for (int s = 0; s < sentences.Count; s++)
        {
            var (tags, probs) = _decoder.Decode(logits[s], sentences[s].Count);
            var spans = new SpanCollector(model.Labels);
            for (int t = 0; t < tags.Length; t++) spans.Add(tags[t], probs[t]);
            spans.End();
            output[s] = [.. spans.Found];
        }
        return output;
    }

    /// <summary>Name spans of one sentence of any length, in order, the same as <see cref="Spans"/>
    /// gives it alone. Its windows run in text order, a batch at a time (the widths those of
    /// <see cref="Logits"/>, whose sort leaves only a sentence's last window shorter; a window's logits
    /// do not depend on the other rows of its batch), and their logits are decoded as they come
    /// (<see cref="BioPath"/>): one speaker turn of millions of words holds one batch of logits and its
    /// undecided words, and a word's text only while its batch is featurised.</summary>
    public IEnumerable<WordSpan> SpansOf(IReadOnlyList<string> words)
    {
        var chunks = Windows(0, words.Count).ToList();
        var path = _decoder.Start();
        var spans = new SpanCollector(model.Labels);
        Action<int, float> decided = spans.Add;
        var inputs = new BatchInputs();
        for (int i = 0; i < chunks.Count;)
        {
            int count = BatchSize(chunks, i);
            var logits = RunBatch([words], chunks, i, count, inputs, releaseArena: i + count == chunks.Count);
            for (int b = 0; b < count; b++)
            {
                var core = Core(logits, chunks[i].Length, b, chunks[i + b]);
                for (int w = 0; w < core.Length; w += model.Labels.Count)
                    path.Push(core.Slice(w, model.Labels.Count), decided);
            }
            i += count;
            if (i == chunks.Count)
            {
                path.Finish(decided);
                spans.End();
            }
            foreach (var span in spans.Found) yield return span;
            spans.Found.Clear();
        }
    }

    /// <summary>The windows of one sentence of <paramref name="words"/> words, in text order.</summary>
    private IEnumerable<Chunk> Windows(int sentence, int words)
    {
        if (words <= window) { if (words > 0) yield return new Chunk(sentence, 0, words, 0, words); yield break; }
        int stride = window - 2 * overlap;
        for (int start = 0; ; start += stride)
        {
            int end = Math.Min(words, start + window);
            yield return new Chunk(sentence, start, end - start, start == 0 ? 0 : start + overlap, end == words ? words : end - overlap);
            if (end == words) yield break;
        }
    }

    /// <summary>How many windows from <paramref name="i"/> on share one batch. Rows of a batch are
    /// padded to its first (longest): take only windows at least 3/4 as long.</summary>
    private int BatchSize(List<Chunk> chunks, int i)
    {
        int width = chunks[i].Length;
        int limit = Math.Max(1, Math.Min(chunks.Count - i, batchWords / Math.Max(1, width)));
        int count = 1;
        while (count < limit && chunks[i + count].Length * 4 >= width * 3) count++;
        return count;
    }

    /// <summary>Logits of windows <paramref name="i"/> to <paramref name="i"/> + <paramref name="count"/> - 1, padded to the first one's length.</summary>
    private float[] RunBatch(IReadOnlyList<IReadOnlyList<string>> sentences, List<Chunk> chunks, int i, int count, BatchInputs inputs, bool releaseArena = false)
    {
        int width = chunks[i].Length;
        var (features, pieces) = inputs.Take(count * width * model.FeatureSlots, count * width * PieceEncoder.Slots);
        for (int b = 0; b < count; b++)
        {
            var c = chunks[i + b];
            model.Featurize(sentences[c.Sentence], c.Start, c.Length,
                features.AsSpan(b * width * model.FeatureSlots), pieces.AsSpan(b * width * PieceEncoder.Slots));
        }
        return model.Run(features, pieces, count, width, releaseArena);
    }

    /// <summary>The feature and piece ids of one call's batches, reused from batch to batch: a full
    /// batch's features take 344 KB, a large object, and one speaker turn of two million words runs
    /// a thousand batches, whose fresh arrays grew the large object heap by some 200 MB before a
    /// full collection took them back.</summary>
    private sealed class BatchInputs
    {
        private long[] _features = [], _pieces = [];

        /// <summary>Buffers of at least the given lengths, zero up to them (padding rows stay zero).</summary>
        public (long[] Features, long[] Pieces) Take(int features, int pieces)
        {
            if (_features.Length < features) _features = new long[features]; else Array.Clear(_features, 0, features);
            if (_pieces.Length < pieces) _pieces = new long[pieces]; else Array.Clear(_pieces, 0, pieces);
            return (_features, _pieces);
        }
    }

    /// <summary>The logits of the core words of row <paramref name="row"/> of a batch <paramref name="width"/> words wide.</summary>
    private ReadOnlySpan<float> Core(float[] logits, int width, int row, Chunk c)
    {
        int labels = model.Labels.Count;
        return logits.AsSpan((row * width + (c.CoreStart - c.Start)) * labels, (c.CoreEnd - c.CoreStart) * labels);
    }

    /// <summary>Turns decoded tags, word by word, into spans: a B-X and the I-X after it, with the mean
    /// probability of their tags.</summary>
    private sealed class SpanCollector(IReadOnlyList<string> labels)
    {
        private int _word, _start = -1;
        private string _type = "";
        private double _sum;

        public List<WordSpan> Found { get; } = [];

        public void Add(int tag, float prob)
        {
            string label = labels[tag];
            int t = _word++;
            if (label.StartsWith("I-", StringComparison.Ordinal) && _start >= 0 && label[2..] == _type) { _sum += prob; return; }
            Close(t);
            if (label == "O") return;
            _start = t; _type = label[2..]; _sum = prob;
        }

        public void End() => Close(_word);

        private void Close(int t)
        {
            if (_start >= 0) Found.Add(new WordSpan(_start, t, Enum.Parse<NameLabel>(_type), _sum / (t - _start)));
            _start = -1;
        }
    }
}
