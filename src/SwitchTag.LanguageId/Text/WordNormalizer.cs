using System.Globalization;
using System.Text;

namespace SwitchTag.LanguageId.Text;

/// <summary>Turns a word into the form the n-gram model sees: NFC, lower case, one apostrophe.
/// NFC makes precomposed and decomposed spellings of the same word identical.</summary>
public static class WordNormalizer
{
    /// <summary>Writes the normalised word into <paramref name="buffer"/> and returns its length
    /// (truncated to the buffer). The word must come from <see cref="Tokenizer"/> (no surrogates).</summary>
    public static int Normalize(ReadOnlySpan<char> word, Span<char> buffer)
    {
        ReadOnlySpan<char> source = word;
        if (NeedsComposition(word))
        {
            // Tokenizer words hold no surrogates, so Normalize has nothing to reject; should ICU still
            // refuse a sequence, the word is scored as written rather than failing the call.
            try { source = word.ToString().Normalize(NormalizationForm.FormC); }
            catch (ArgumentException) { }
        }
        int n = Math.Min(source.Length, buffer.Length);
        for (int i = 0; i < n; i++)
        {
            char c = source[i];
            buffer[i] = c == '\u2019' ? '\'' : c < 0x80 ? (char)(c is >= 'A' and <= 'Z' ? c | 0x20 : c) : char.ToLowerInvariant(c);
        }
        return n;
    }

    /// <summary>Only marks, conjoining Hangul jamo and compatibility singletons can make a word
    /// differ from its NFC form; checking for them avoids normalising every word.</summary>
    private static bool NeedsComposition(ReadOnlySpan<char> word)
    {
        foreach (char c in word)
        {
            if (c < 0x300) continue;
            if (c is >= '\u1100' and <= '\u11FF' or >= '\u2100' and <= '\u218F' or >= '\uF900' and <= '\uFAFF') return true;
            var cat = char.GetUnicodeCategory(c);
            if (cat is UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark or UnicodeCategory.EnclosingMark) return true;
        }
        return false;
    }
}
