using System.Globalization;
using System.Text;

namespace SwitchTag.Formats.Text;

/// <summary>Unicode Normalization Form C (UAX #15) with a map back to the text it was made from, so
/// that "Kraków" written with a combining acute (NFD, as some editors and macOS file names store it)
/// is analysed as the same word as the precomposed one, while offsets still lead to the original.
/// The text is cut into segments that normalise on their own: a segment starts at every character
/// that is not a combining mark, a low surrogate or a Hangul medial or final jamo (the only non-marks
/// that compose with what precedes them).</summary>
public static class NfcText
{
    /// <summary>The NFC form of <paramref name="text"/>; <paramref name="toNfc"/> maps each original
    /// offset (0..Length) to the offset of its segment's start in the result, or is null when the text
    /// was already NFC (offsets unchanged).</summary>
    public static string Normalize(string text, out int[]? toNfc)
    {
        toNfc = null;
        if (text.Length == 0 || text.IsNormalized(NormalizationForm.FormC)) return text;
        var map = new int[text.Length + 1];
        var sb = new StringBuilder(text.Length);
        int i = 0;
        while (i < text.Length)
        {
            int j = i + 1;
            while (j < text.Length && Continues(text, j)) j++;
            for (int k = i; k < j; k++) map[k] = sb.Length;
            var segment = text.AsSpan(i, j - i);
            if (j - i == 1 && segment[0] < 0x300) sb.Append(segment);
            else sb.Append(segment.ToString().Normalize(NormalizationForm.FormC));
            i = j;
        }
        map[text.Length] = sb.Length;
        toNfc = map;
        return sb.ToString();
    }

    private static bool Continues(string text, int j)
    {
        char c = text[j];
        if (char.IsLowSurrogate(c)) return true;
        if (c is >= '\u1161' and <= '\u1175' or >= '\u11A8' and <= '\u11C2') return true;
        var category = char.IsHighSurrogate(c) && j + 1 < text.Length
            ? CharUnicodeInfo.GetUnicodeCategory(char.ConvertToUtf32(c, text[j + 1]))
            : CharUnicodeInfo.GetUnicodeCategory(c);
        return category is UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark or UnicodeCategory.EnclosingMark;
    }
}
