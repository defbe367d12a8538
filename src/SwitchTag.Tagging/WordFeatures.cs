using System.Globalization;
using System.Text;

namespace SwitchTag.Tagging;

/// <summary>The hashed features of one word, exactly as scripts/ner/features.py defines them (the
/// model was trained on these ids): id(s) = 1 + FNV-1a-32(UTF-8(s)) mod (rows - 1), with slot 0
/// "w:"+lower, 1 "W:"+word, 2-4 "p2:".."p4:" prefixes, 5-7 "s2:".."s4:" suffixes of lower, 8
/// "sh:"+shape, 9 "c:"+case class (+"^" sentence-initial), 10-19 "3:"+trigrams of "&lt;"+lower+"&gt;"
/// (first 5 and last 5 when more than 10), and, for a model trained with a name lexicon, slot 20
/// "lex:"+the word's <see cref="NameLexicon"/> flags. Lengths count code points, not UTF-16 units.</summary>
public sealed class WordFeatures(int hashRows, NameLexicon? lexicon = null)
{
    private const int BaseSlots = 20;

    /// <summary>Ids per word: 20, or 21 with a name lexicon.</summary>
    public int Slots { get; } = BaseSlots + (lexicon is null ? 0 : 1);

    /// <summary>Words after which the next word starts a sentence for the case feature.</summary>
    private static readonly HashSet<string> SentenceOpeners =
        [".", "!", "?", "\u2026", ":", ";", "\"", "\u201C", "\u201D", "\u201E", "\u00AB", "\u00BB", "(", "-", "\u2013", "\u2014"];

    /// <summary>Whether a word after <paramref name="previous"/> (null: none) starts a sentence.</summary>
    public static bool IsSentenceInitial(string? previous) => previous is null || SentenceOpeners.Contains(previous);

    /// <summary>Per-code-point lowercase: BMP code points map to their single lowercase code
    /// point; U+0130 (whose lowercase is two code points) and non-BMP code points stay.</summary>
    public static string Lower(string word)
    {
        var sb = new StringBuilder(word.Length);
        foreach (var rune in word.EnumerateRunes())
        {
            if (rune.IsBmp && rune.Value != 0x130) sb.Append(char.ToLowerInvariant((char)rune.Value));
            else sb.Append(rune.ToString());
        }
        return sb.ToString();
    }

    public void Compute(string word, bool sentenceInitial, Span<long> ids)
    {
        ids.Clear();
        var orig = ToRunes(word);
        var lowerText = Lower(word);
        var lower = ToRunes(lowerText);
        int n = lower.Length;
        ids[0] = Id("w:", lower);
        ids[1] = Id("W:", orig);
        for (int k = 2; k <= 4; k++)
        {
            ids[k] = Id($"p{k}:", lower.AsSpan(0, Math.Min(k, n)));
            ids[k + 3] = Id($"s{k}:", lower.AsSpan(Math.Max(0, n - k)));
        }
        ids[8] = Id("sh:", Shape(orig));
        ids[9] = Id("c:" + CaseClass(orig) + (sentenceInitial ? "^" : ""), []);
        var padded = new int[n + 2];
        padded[0] = '<';
        lower.CopyTo(padded, 1);
        padded[n + 1] = '>';
        int count = padded.Length - 2;
        int slot = 10;
        for (int t = 0; t < count; t++)
        {
            if (count > 10 && t >= 5 && t < count - 5) continue;
            ids[slot++] = Id("3:", padded.AsSpan(t, 3));
        }
        if (lexicon is not null)
            ids[BaseSlots] = Id("lex:" + lexicon.Flags(lowerText), []);
    }

    private long Id(string prefix, ReadOnlySpan<int> runes) => 1 + Hash(prefix, runes) % (uint)(hashRows - 1);

    /// <summary>FNV-1a 32-bit over the UTF-8 bytes of <paramref name="asciiPrefix"/> followed by
    /// <paramref name="codePoints"/>.</summary>
    public static uint Hash(string asciiPrefix, ReadOnlySpan<int> codePoints)
    {
        uint h = 0x811C9DC5;
        foreach (char c in asciiPrefix) h = (h ^ (byte)c) * 0x01000193;
        Span<byte> buf = stackalloc byte[4];
        foreach (int cp in codePoints)
        {
            int len = new Rune(cp).EncodeToUtf8(buf);
            for (int b = 0; b < len; b++) h = (h ^ buf[b]) * 0x01000193;
        }
        return h;
    }

    private static int[] ToRunes(string s)
    {
        var list = new List<int>(s.Length);
        foreach (var r in s.EnumerateRunes()) list.Add(r.Value);
        return [.. list];
    }

    private static int[] Shape(int[] word)
    {
        var outp = new List<int>(10);
        foreach (int cp in word)
        {
            var cat = Rune.GetUnicodeCategory(new Rune(cp));
            int k = cat switch
            {
                UnicodeCategory.UppercaseLetter => 'X',
                UnicodeCategory.LowercaseLetter => 'x',
                UnicodeCategory.DecimalDigitNumber => 'd',
                UnicodeCategory.TitlecaseLetter or UnicodeCategory.ModifierLetter or UnicodeCategory.OtherLetter => 'L',
                _ => cp,
            };
            if (outp.Count >= 2 && outp[^1] == k && outp[^2] == k) continue;
            outp.Add(k);
            if (outp.Count == 10) break;
        }
        return [.. outp];
    }

    private static string CaseClass(int[] word)
    {
        int letters = 0, up = 0, lo = 0;
        bool digit = false, firstUpper = false;
        foreach (int cp in word)
        {
            var cat = Rune.GetUnicodeCategory(new Rune(cp));
            if (cat == UnicodeCategory.DecimalDigitNumber) digit = true;
            if (cat is not (UnicodeCategory.UppercaseLetter or UnicodeCategory.LowercaseLetter or UnicodeCategory.TitlecaseLetter
                or UnicodeCategory.ModifierLetter or UnicodeCategory.OtherLetter)) continue;
            if (letters == 0) firstUpper = cat == UnicodeCategory.UppercaseLetter;
            letters++;
            if (cat == UnicodeCategory.UppercaseLetter) up++;
            else if (cat == UnicodeCategory.LowercaseLetter) lo++;
        }
        if (letters == 0) return digit ? "num" : "none";
        if (up == 0) return lo > 0 ? "lower" : "uncased";
        if (lo == 0) return up == 1 ? "upper1" : "upper";
        return firstUpper && up == 1 ? "title" : "mixed";
    }
}
