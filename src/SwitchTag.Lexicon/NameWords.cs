using System.Globalization;
using SwitchTag.Core.Text;

namespace SwitchTag.Lexicon;

/// <summary>One word of a text: <c>[Start, End)</c> char offsets into it, and its folded spelling.</summary>
public readonly record struct NameWord(int Start, int End, string Folded);

/// <summary>Splits text into words: runs of letters, combining marks and digits. Apostrophes,
/// hyphens, dots and modifier letters (ʼ, ʻ) separate words, so "L'viv", "Bielsko-Biała" and "St. Louis" are two words
/// each and inflect word by word.</summary>
public static class NameWords
{
    public static List<NameWord> Split(string text) =>
        Bounds(text).Select(b => new NameWord(b.Start, b.End, NameFolding.Fold(text[b.Start..b.End]))).ToList();

    /// <summary>The words of <see cref="Split"/> a window at a time, for a scan that looks at most
    /// <paramref name="lookAhead"/> words past the one it starts from: each window is one list holding
    /// <c>Starts</c> words to start from and up to <paramref name="lookAhead"/> words after them (fewer at
    /// the end of the text), so the scan sees what it would see in the whole list. One speaker turn of
    /// millions of words is then never folded all at once. The list is reused: read it before the next window.</summary>
    public static IEnumerable<(List<NameWord> Words, int Starts)> Windows(string text, int lookAhead, int size = 4096)
    {
        var window = new List<NameWord>(size + lookAhead);
        int i = 0;
        bool more = true;
        while (more)
        {
            // The look-ahead words of the last window are the first words of this one.
            int kept = Math.Max(0, window.Count - size);
            window.RemoveRange(0, window.Count - kept);
            while (window.Count < size + lookAhead)
            {
                if (NextWord(text, ref i) is not { } word) { more = false; break; }
                window.Add(new NameWord(word.Start, word.End, NameFolding.Fold(text[word.Start..word.End])));
            }
            if (window.Count == 0) yield break;
            yield return (window, more ? size : window.Count);
        }
    }

    /// <summary>The next word at or after <paramref name="i"/>, moving <paramref name="i"/> past it; null at the end.</summary>
    private static (int Start, int End)? NextWord(string text, ref int i)
    {
        while (i < text.Length && !IsWordChar(text, i)) i++;
        if (i >= text.Length) return null;
        int start = i;
        while (i < text.Length && IsWordChar(text, i)) i += char.IsSurrogatePair(text, i) ? 2 : 1;
        return (start, i);
    }

    /// <summary>Where the words of <see cref="Split"/> are, without folding them (cheaper when only
    /// offsets are wanted).</summary>
    public static List<(int Start, int End)> Bounds(string text)
    {
        var words = new BlockList<(int, int)>();
        for (int i = 0; NextWord(text, ref i) is { } word;) words.Add(word);
        return words.ToList();
    }

    /// <summary>Whether the characters between two words may sit inside one multi-word name:
    /// at most three of space, line break, hyphen, dot or apostrophe ("Nowy Sącz", "St. Louis").</summary>
    public static bool IsNameGap(ReadOnlySpan<char> gap)
    {
        if (gap.Length is 0 or > 3) return false;
        foreach (char c in gap)
            if (c is not (' ' or '\u00A0' or '\n' or '-' or '\u2010' or '\u2011' or '.' or '\'' or '\u2019'))
                return false;
        return true;
    }

    public static bool StartsUpper(ReadOnlySpan<char> word) =>
        !word.IsEmpty && char.IsUpper(word[0]);

    private static bool IsWordChar(string text, int i)
    {
        var category = CharUnicodeInfo.GetUnicodeCategory(text, i);
        return category is UnicodeCategory.UppercaseLetter or UnicodeCategory.LowercaseLetter
            or UnicodeCategory.TitlecaseLetter or UnicodeCategory.OtherLetter
            or UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark
            or UnicodeCategory.DecimalDigitNumber;
    }
}
