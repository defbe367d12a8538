using SwitchTag.Core.Time;
using SwitchTag.Formats.Reading;

namespace SwitchTag.Formats.Timestamped;

/// <summary>The timestamp that opens an entry of a typed transcript: <c>[00:12:31]</c>, <c>(12:31)</c>,
/// <c>[1:02:03.5]</c>, <c>00:12:31</c>, optionally a range (<c>[00:01 - 00:05]</c>, also with en/em
/// dash or "-->"), optionally followed by a separator (<c>-</c>, <c>–</c>, <c>—</c>, <c>|</c>). A bare
/// (unbracketed) <c>mm:ss</c> opens an entry only when a <c>NAME:</c> prefix or the line's end follows,
/// so a sentence starting "10:30 in the morning" stays text; a bare <c>h:mm:ss</c> always does.</summary>
internal static class EntryStamp
{
    /// <param name="Valid">False for a stamp of the right shape with minutes or seconds past 59
    /// ("[99:99:99]"): it opens an entry that is reported, not read.</param>
    /// <param name="Resumes">The text after the stamp opens with a continuation mark ("- -", "--", "…",
    /// "..."): the line may take up an utterance that another speaker interrupted.</param>
    public readonly record struct Stamp(Timecode Start, Timecode? End, int TextStart, bool Valid = true, bool Resumes = false);

    public static bool TryMatch(ReadOnlySpan<char> line, out Stamp stamp)
    {
        stamp = default;
        int p = Skip(line, 0);
        char close = p < line.Length ? line[p] switch { '[' => ']', '(' => ')', _ => '\0' } : '\0';
        if (close != '\0') p = Skip(line, p + 1);
        int stampStart = p;
        if (!Timestamps.TryLooseShape(line, ref p, out var start, out bool valid)) return false;
        bool hasHours = line[stampStart..p].Count(':') == 2;
        if (!valid && close == '\0' && !hasHours) return false;

        Timecode? end = null;
        int q = Skip(line, p);
        int dash = Dash(line, q);
        if (dash > 0)
        {
            int r = Skip(line, q + dash);
            if (Timestamps.TryLoose(line, ref r, out var e)) { end = e; p = r; }
        }
        if (close != '\0')
        {
            p = Skip(line, p);
            if (p >= line.Length || line[p] != close) return false;
            p++;
        }
        else if (p < line.Length && !char.IsWhiteSpace(line[p]))
            return false;

        p = Skip(line, p);
        var after = line[p..];
        if (valid && (close != '\0' || hasHours) && (after.StartsWith("- -") || after.StartsWith("--") || after.StartsWith("…") || after.StartsWith("...")))
        {
            stamp = new Stamp(start, end, p, Resumes: true);
            return true;
        }
        int sep = Dash(line, p);
        if (sep == 0 && p < line.Length && line[p] == '|') sep = 1;
        if (sep > 0 && (p + sep == line.Length || char.IsWhiteSpace(line[p + sep]))) p = Skip(line, p + sep);

        if (close == '\0' && !hasHours && end is null && p < line.Length && !SpeakerPrefix.TryMatch(line[p..], out _, out _, out _))
            return false;
        stamp = new Stamp(start, end, p, valid);
        return true;
    }

    /// <summary>Length of a range dash at <paramref name="p"/> ("-->", "-", "–", "—"), or 0.</summary>
    private static int Dash(ReadOnlySpan<char> s, int p)
    {
        if (p >= s.Length) return 0;
        if (s[p..].StartsWith("-->")) return 3;
        return s[p] is '-' or '–' or '—' ? 1 : 0;
    }

    private static int Skip(ReadOnlySpan<char> s, int p)
    {
        while (p < s.Length && char.IsWhiteSpace(s[p])) p++;
        return p;
    }
}
