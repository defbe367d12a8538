using System.Globalization;
using System.Text;
using SwitchTag.Core.Text;

namespace SwitchTag.Tagging;

/// <summary>Splits text into words roughly as Universal Dependencies treebanks do: runs of letters,
/// marks and digits; an apostrophe, hyphen or dot between two word characters stays inside the word
/// ("O'Brien", "Bielsko-Biała", "3.5"); Han/Kana runs break away from other letters; every other
/// visible character is a word of its own, except that a run of one repeated punctuation mark
/// ("...", "!!") stays whole. Whitespace and control characters separate words and are never part
/// of one; offsets always point into the original text.</summary>
public static class WordTokenizer
{
    public static List<WordToken> Tokenize(string text) => [.. new TokenizedText(text)];

    /// <summary>Where the words of <see cref="Tokenize"/> are, without cutting their text out.</summary>
    public static List<(int Start, int End)> Bounds(string text)
    {
        var words = new BlockList<(int, int)>();
        if (string.IsNullOrEmpty(text)) return [];
        int i = 0;
        while (i < text.Length)
        {
            var kind = KindAt(text, i, out int width);
            if (kind == Kind.Space) { i += width; continue; }
            int start = i;
            i += width;
            if (kind is Kind.Word or Kind.Han)
            {
                while (i < text.Length)
                {
                    var next = KindAt(text, i, out int w);
                    if (next == kind) { i += w; continue; }
                    if (kind == Kind.Word && IsJoiner(text[i]) && i + 1 < text.Length && KindAt(text, i + 1, out int w2) == Kind.Word)
                    {
                        i += 1 + w2;
                        continue;
                    }
                    break;
                }
            }
            else if (kind == Kind.Punct)
            {
                while (i + width <= text.Length && i < text.Length && text.AsSpan(i, width).SequenceEqual(text.AsSpan(start, width)))
                    i += width;
            }
            words.Add((start, i));
        }
        return words.ToList();
    }

    private enum Kind { Space, Word, Han, Punct, Symbol }

    private static bool IsJoiner(char c) => c is '\'' or '\u2019' or '-' or '\u2010' or '\u2011' or '.' or '\u00B7';

    private static Kind KindAt(string text, int i, out int width)
    {
        width = char.IsSurrogatePair(text, i) ? 2 : 1;
        if (!Rune.TryGetRuneAt(text, i, out var rune)) return Kind.Symbol;
        var category = Rune.GetUnicodeCategory(rune);
        switch (category)
        {
            case UnicodeCategory.SpaceSeparator or UnicodeCategory.LineSeparator or UnicodeCategory.ParagraphSeparator
                or UnicodeCategory.Control or UnicodeCategory.Format:
                return Kind.Space;
            case UnicodeCategory.UppercaseLetter or UnicodeCategory.LowercaseLetter or UnicodeCategory.TitlecaseLetter
                or UnicodeCategory.ModifierLetter or UnicodeCategory.OtherLetter
                or UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark or UnicodeCategory.EnclosingMark
                or UnicodeCategory.DecimalDigitNumber or UnicodeCategory.LetterNumber or UnicodeCategory.OtherNumber:
                return IsHan(rune.Value) ? Kind.Han : Kind.Word;
            case UnicodeCategory.OtherPunctuation or UnicodeCategory.DashPunctuation or UnicodeCategory.OpenPunctuation
                or UnicodeCategory.ClosePunctuation or UnicodeCategory.InitialQuotePunctuation
                or UnicodeCategory.FinalQuotePunctuation or UnicodeCategory.ConnectorPunctuation:
                return Kind.Punct;
            default:
                return Kind.Symbol;
        }
    }

    private static bool IsHan(int cp) =>
        cp is >= 0x3040 and <= 0x30FF or >= 0x3400 and <= 0x4DBF or >= 0x4E00 and <= 0x9FFF
            or >= 0xF900 and <= 0xFAFF or >= 0x20000 and <= 0x3FFFF;
}
