using System.Collections.Concurrent;
using Microsoft.ML.Tokenizers;

namespace SwitchTag.Tagging;

/// <summary>SentencePiece unigram ids of a word's lowercase form (scripts/ner/features.py
/// piece_ids): ids + 1 (0 is padding), all of them when at most <see cref="Slots"/>, else the first
/// three and the last. Words are encoded one at a time, so the tokenizer's offsets into its
/// normalised text are never needed; results are cached per word.</summary>
public sealed class PieceEncoder
{
    public const int Slots = 4;
    // 50k words of the cache hold about 7 MB; 200k held 30 MB on one 200k-cue turn of mostly distinct numbers.
    private const int CacheLimit = 50_000;
    private readonly SentencePieceTokenizer _tokenizer;
    private readonly ConcurrentDictionary<string, long[]> _cache = new(StringComparer.Ordinal);

    public PieceEncoder(Stream model) =>
        _tokenizer = SentencePieceTokenizer.Create(model, false, false);

    public ReadOnlySpan<long> Encode(string word)
    {
        if (_cache.TryGetValue(word, out var hit)) return hit;
        var ids = _tokenizer.EncodeToIds(WordFeatures.Lower(word), addBeginningOfSentence: false, addEndOfSentence: false);
        var result = new long[Slots];
        int n = ids.Count;
        for (int k = 0; k < Math.Min(n, Slots); k++)
            result[k] = 1 + ids[n > Slots && k == Slots - 1 ? n - 1 : k];
        if (_cache.Count >= CacheLimit) _cache.Clear();
        _cache[word] = result;
        return result;
    }
}
