using System.Globalization;

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

    /// <summary>Where the words of <see cref="Split"/> are, without folding them (cheaper when only
    /// offsets are wanted).</summary>
    public static List<(int Start, int End)> Bounds(string text)
    {
        var words = new List<(int, int)>();
        int i = 0;
        while (i < text.Length)
        {
            if (!IsWordChar(text, i)) { i++; continue; }
            int start = i;
            while (i < text.Length && IsWordChar(text, i)) i += char.IsSurrogatePair(text, i) ? 2 : 1;
            words.Add((start, i));
        }
        return words;
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
