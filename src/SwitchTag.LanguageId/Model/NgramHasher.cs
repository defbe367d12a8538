namespace SwitchTag.LanguageId.Model;

/// <summary>Hashes the character n-grams (orders 1..5) of a space-padded word, plus the whole word,
/// into 32-bit keys. Training and scoring share this code, so the keys always agree.</summary>
public static class NgramHasher
{
    public const int MaxOrder = 5;

    /// <summary>Feature kind index for the whole-word feature (after the n-gram orders 1..5).</summary>
    public const int WordFeature = MaxOrder + 1;

    public const int FeatureKinds = WordFeature + 1;

    /// <summary>Whole-word features only for words up to this length (longer runs, e.g. unspaced
    /// Chinese, never repeat as a whole).</summary>
    public const int MaxWholeWord = 24;

    public const int MaxWordChars = 256;

    /// <summary>Calls <paramref name="sink"/> with (key, kind) for every feature of the normalised
    /// word. Kind is the n-gram order 1..5 or <see cref="WordFeature"/>.</summary>
    public static void ForEachFeature<TSink>(ReadOnlySpan<char> word, ref TSink sink) where TSink : IFeatureSink, allows ref struct
    {
        int m = word.Length;
        if (m == 0) return;
        // Padded position p: 0 is the leading space, 1..m the word, m+1 the trailing space.
        for (int end = 0; end <= m + 1; end++)
        {
            ulong h = 14695981039346656037UL;
            for (int order = 1; order <= MaxOrder; order++)
            {
                int p = end - order + 1;
                if (p < 0) break;
                char c = p == 0 || p == m + 1 ? ' ' : word[p - 1];
                h = (h ^ c) * 1099511628211UL;
                if (order == 1 && (p == 0 || p == m + 1)) continue;
                sink.Add(Finish(h, order), order);
            }
        }
        if (m <= MaxWholeWord)
        {
            ulong h = 0x9E3779B97F4A7C15UL;
            foreach (char c in word) h = (h ^ c) * 1099511628211UL;
            sink.Add(Finish(h, WordFeature), WordFeature);
        }
    }

    private static uint Finish(ulong h, int kind)
    {
        h ^= (ulong)kind * 0xD6E8FEB86659FD93UL;
        h ^= h >> 32;
        h *= 0xD6E8FEB86659FD93UL;
        h ^= h >> 32;
        uint key = (uint)h;
        return key == 0 ? 1u : key;
    }
}

/// <summary>Receives the features of a word (a struct so the calls inline).</summary>
public interface IFeatureSink
{
    void Add(uint key, int kind);
}
