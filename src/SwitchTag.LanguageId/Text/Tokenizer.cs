using System.Globalization;
using SwitchTag.Core.Text;

namespace SwitchTag.LanguageId.Text;

/// <summary>Splits text into words, numbers, hesitations, transcriber tags and false starts, keeping
/// char offsets into the original. Punctuation and whitespace are not tokens. Never throws: lone
/// surrogates, controls and symbols simply separate tokens.</summary>
public static class Tokenizer
{
    private const int MaxTagLength = 40;

    public static List<Token> Tokenize(ReadOnlySpan<char> text)
    {
        var tokens = new BlockList<Token>();
        Scan(text, tokens.Add);
        return tokens.ToList();
    }

    /// <summary>Appends the tokens of <paramref name="text"/> to <paramref name="tokens"/>.</summary>
    public static void Tokenize(ReadOnlySpan<char> text, List<Token> tokens) => Scan(text, tokens.Add);

    private static void Scan(ReadOnlySpan<char> text, Action<Token> tokens)
    {
        int i = 0, n = text.Length;
        while (i < n)
        {
            char c = text[i];
            if (c == '[')
            {
                int close = text.Slice(i + 1, Math.Min(MaxTagLength, n - i - 1)).IndexOf(']');
                if (close >= 0)
                {
                    close += i + 1;
                    tokens(new Token(i, close + 1, TokenKind.Tag));
                    i = close + 1;
                    continue;
                }
                i++;
                continue;
            }
            if (IsWordStart(c))
            {
                int start = i;
                i = ScanWord(text, i);
                tokens(new Token(start, i, Classify(text, start, i)));
                continue;
            }
            if (char.IsDigit(c))
            {
                int start = i;
                while (i < n && (char.IsDigit(text[i]) || (i + 1 < n && text[i] is '.' or ',' or ':' && char.IsDigit(text[i + 1]))))
                    i++;
                tokens(new Token(start, i, TokenKind.Number));
                continue;
            }
            i++;
        }
    }

    /// <summary>Letters and the marks that attach to them (NFD accents, Indic vowel signs). Surrogates
    /// (lone or paired) are never word chars, so every word is safe to normalise.</summary>
    public static bool IsWordChar(char c)
    {
        if (c < 0x80) return (uint)((c | 0x20) - 'a') <= 'z' - 'a';
        if (char.IsSurrogate(c)) return false;
        var cat = char.GetUnicodeCategory(c);
        return cat <= UnicodeCategory.OtherLetter
            || cat is UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark or UnicodeCategory.EnclosingMark;
    }

    /// <summary>A word starts with a letter; marks only continue one (a stray mark is a separator).</summary>
    private static bool IsWordStart(char c) =>
        c < 0x80 ? (uint)((c | 0x20) - 'a') <= 'z' - 'a' : !char.IsSurrogate(c) && char.GetUnicodeCategory(c) <= UnicodeCategory.OtherLetter;

    private static int ScanWord(ReadOnlySpan<char> text, int i)
    {
        int n = text.Length;
        while (i < n)
        {
            if (IsWordChar(text[i])) { i++; continue; }
            // An apostrophe or hyphen between letters stays inside the word (don't, Jean-Luc, l'eau).
            if (i + 1 < n && text[i] is '\'' or '\u2019' or '-' && IsWordChar(text[i + 1])) { i += 2; continue; }
            break;
        }
        return i;
    }

    private static TokenKind Classify(ReadOnlySpan<char> text, int start, int end)
    {
        int len = end - start;
        // Fillers of every language (the mul language profile's hesitations.txt); a language's own fillers are
        // words here and are weighed by the segmenter in that language's context.
        if (len <= 6 && NeutralWords.Default.IsNeutralEverywhere(text[start..end]))
            return TokenKind.Hesitation;
        // "w-" followed by space or end: a cut-off word (a hyphen inside a word was consumed by ScanWord).
        if (len <= 4 && end < text.Length && text[end] == '-' && (end + 1 == text.Length || !IsWordChar(text[end + 1])))
            return TokenKind.FalseStart;
        return TokenKind.Word;
    }
}
