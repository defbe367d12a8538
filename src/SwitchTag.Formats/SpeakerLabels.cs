using System.Text;
using SwitchTag.Core.Text;

namespace SwitchTag.Formats;

/// <summary>Folds the ways one speaker is written into one label: surrounding space and trailing colons
/// dropped, inner whitespace runs made one space, each word capitalised (first letter, and the letter
/// after a hyphen or an opening parenthesis, upper case; the rest lower case, culture-invariant), the
/// result in NFC. <c>INTERVIEWER</c>,
/// <c>Interviewer:</c> and <c> interviewer </c> all become <c>Interviewer</c>.</summary>
public static class SpeakerLabels
{
    public static string? Normalise(string? raw)
    {
        if (raw is null) return null;
        var s = raw.AsSpan().Trim();
        while (s.Length > 0 && (s[^1] == ':' || char.IsWhiteSpace(s[^1]))) s = s[..^1];
        if (s.IsEmpty) return null;

        var sb = new StringBuilder(s.Length);
        bool wordStart = true, pendingSpace = false;
        foreach (var rune in s.EnumerateRunes())
        {
            if (Rune.IsWhiteSpace(rune)) { pendingSpace = sb.Length > 0; wordStart = true; continue; }
            if (pendingSpace) { sb.Append(' '); pendingSpace = false; }
            sb.Append(wordStart ? Rune.ToUpperInvariant(rune).ToString() : Rune.ToLowerInvariant(rune).ToString());
            wordStart = rune.Value is '-' or '(';
        }
        // Every cue carries its speaker: one string per speaker, not one per cue.
        return SharedStrings.Of(sb.ToString().Normalize(NormalizationForm.FormC));
    }
}
