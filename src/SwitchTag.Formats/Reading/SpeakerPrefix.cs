using System.Collections.Frozen;
using System.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Formats.Reading;

/// <summary>Finds a <c>NAME:</c> speaker prefix at the start of a line: one to four words, the first and
/// last starting with an upper-case letter (so <c>MARIA</c>, <c>Dr. Nowak</c>, <c>Speaker 2</c>,
/// <c>Maria de la Cruz</c>), at most 40 characters, then a colon followed by whitespace or the end of the
/// line. Middle words may be numbers or lower-case name particles (de, la, van, ...).</summary>
internal static class SpeakerPrefix
{
    private const int MaxWords = 4;
    private const int MaxLength = 40;

    /// <summary>Name particles of every language profile (SwitchTag.Core/Languages/*/particles.txt).</summary>
    private static readonly FrozenSet<string>.AlternateLookup<ReadOnlySpan<char>> Particles =
        LanguageProfiles.Default.NameParticles.GetAlternateLookup<ReadOnlySpan<char>>();

    /// <param name="line">The line, leading whitespace allowed.</param>
    /// <param name="labelStart">Where the label starts in <paramref name="line"/>.</param>
    /// <param name="labelEnd">Just past the label (the colon's position).</param>
    /// <param name="textStart">Where the spoken text starts (after the colon and following spaces).</param>
    public static bool TryMatch(ReadOnlySpan<char> line, out int labelStart, out int labelEnd, out int textStart)
    {
        labelStart = labelEnd = textStart = 0;
        int p = 0;
        while (p < line.Length && char.IsWhiteSpace(line[p])) p++;
        labelStart = p;
        int limit = Math.Min(line.Length, p + MaxLength + 1);
        int colon = line[p..limit].IndexOf(':');
        if (colon <= 0) return false;
        colon += p;
        if (colon + 1 < line.Length && !char.IsWhiteSpace(line[colon + 1])) return false;

        var label = line[p..colon];
        if (label.Length != label.TrimEnd().Length || label.IsEmpty) return false;
        int words = 0;
        bool lastCapital = false;
        foreach (var range in label.Split(' '))
        {
            var word = label[range];
            if (word.IsEmpty || ++words > MaxWords) return false;
            bool capital = StartsUpper(word) && IsNameWord(word);
            bool middleOk = char.IsAsciiDigit(word[0]) ? IsDigits(word) : Particles.Contains(word);
            if (!capital && (words == 1 || !middleOk)) return false;
            lastCapital = capital || (char.IsAsciiDigit(word[0]) && IsDigits(word));
        }
        if (!lastCapital) return false;

        labelEnd = colon;
        textStart = colon + 1;
        while (textStart < line.Length && char.IsWhiteSpace(line[textStart])) textStart++;
        return true;
    }

    private static bool StartsUpper(ReadOnlySpan<char> word) =>
        Rune.DecodeFromUtf16(word, out var first, out _) == System.Buffers.OperationStatus.Done && Rune.IsUpper(first);

    /// <summary>Letters, with the marks, apostrophes, hyphens and full stops names carry.</summary>
    private static bool IsNameWord(ReadOnlySpan<char> word)
    {
        foreach (var rune in word.EnumerateRunes())
        {
            if (Rune.IsLetter(rune) || Rune.IsDigit(rune)) continue;
            var category = Rune.GetUnicodeCategory(rune);
            if (category is System.Globalization.UnicodeCategory.NonSpacingMark or System.Globalization.UnicodeCategory.SpacingCombiningMark) continue;
            if (rune.Value is '\'' or '’' or '-' or '.') continue;
            return false;
        }
        return true;
    }

    private static bool IsDigits(ReadOnlySpan<char> word)
    {
        foreach (char c in word) if (!char.IsAsciiDigit(c)) return false;
        return true;
    }
}
