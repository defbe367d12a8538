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
            int n = sentences[s].Count;
            result[s] = new float[n * labels];
            if (n <= window) { if (n > 0) chunks.Add(new Chunk(s, 0, n, 0, n)); continue; }
            int stride = window - 2 * overlap;
            for (int start = 0; ; start += stride)
            {
                int end = Math.Min(n, start + window);
                int coreStart = start == 0 ? 0 : start + overlap;
                int coreEnd = end == n ? n : end - overlap;
                chunks.Add(new Chunk(s, start, end - start, coreStart, coreEnd));
                if (end == n) break;
            }
        }
        chunks.Sort((a, b) => b.Length.CompareTo(a.Length));
        for (int i = 0; i < chunks.Count;)
        {
            int width = chunks[i].Length;
            // Rows of one batch are padded to its longest: take only windows at least 3/4 as long.
            int limit = Math.Max(1, Math.Min(chunks.Count - i, batchWords / Math.Max(1, width)));
            int count = 1;
            while (count < limit && chunks[i + count].Length * 4 >= width * 3) count++;
            var features = new long[count * width * model.FeatureSlots];
            var pieces = new long[count * width * PieceEncoder.Slots];
            for (int b = 0; b < count; b++)
            {
                var c = chunks[i + b];
                model.Featurize(sentences[c.Sentence], c.Start, c.Length,
                    features.AsSpan(b * width * model.FeatureSlots), pieces.AsSpan(b * width * PieceEncoder.Slots));
            }
            var logits = model.Run(features, pieces, count, width);
            for (int b = 0; b < count; b++)
            {
                var c = chunks[i + b];
                int from = (b * width + (c.CoreStart - c.Start)) * labels;
                logits.AsSpan(from, (c.CoreEnd - c.CoreStart) * labels).CopyTo(result[c.Sentence].AsSpan(c.CoreStart * labels));
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
            output[s] = [.. ToSpans(tags, probs)];
        }
        return output;
    }

    private IEnumerable<WordSpan> ToSpans(int[] tags, float[] probs)
    {
        int start = -1;
        string type = "";
        double sum = 0;
        for (int t = 0; t <= tags.Length; t++)
        {
            string label = t < tags.Length ? model.Labels[tags[t]] : "O";
            bool inside = label.StartsWith("I-", StringComparison.Ordinal) && start >= 0 && label[2..] == type;
            if (inside) { sum += probs[t]; continue; }
            if (start >= 0) yield return new WordSpan(start, t, Enum.Parse<NameLabel>(type), sum / (t - start));
            start = -1;
            if (label == "O") continue;
            start = t; type = label[2..]; sum = probs[t];
        }
    }
}
