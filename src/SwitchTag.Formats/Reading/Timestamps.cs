using SwitchTag.Core.Time;

namespace SwitchTag.Formats.Reading;

/// <summary>Timestamp grammars, parsed by hand over spans (no regular expressions, so a 10 MB line
/// costs one linear pass). Each parser reads from <c>pos</c> and, on success, moves it past the stamp.</summary>
internal static class Timestamps
{
    /// <summary>WebVTT timestamp (W3C WebVTT, "collect a WebVTT timestamp"): <c>[hh+:]mm:ss.ttt</c> with
    /// exactly two digits for minutes and seconds (each 00-59) and exactly three for milliseconds; hours
    /// are present when the first number is not exactly two digits or exceeds 59.</summary>
    public static bool TryWebVtt(ReadOnlySpan<char> s, ref int pos, out Timecode time)
    {
        time = default;
        int p = pos;
        if (!Number(s, ref p, 1, 9, out long first, out int firstDigits)) return false;
        long hours = 0, minutes, seconds;
        bool hoursMode = firstDigits != 2 || first > 59;
        if (!Expect(s, ref p, ':') || !Number(s, ref p, 2, 2, out long second, out _)) return false;
        if (hoursMode || (p < s.Length && s[p] == ':'))
        {
            if (!Expect(s, ref p, ':') || !Number(s, ref p, 2, 2, out long third, out _)) return false;
            hours = first; minutes = second; seconds = third;
        }
        else
        {
            minutes = first; seconds = second;
        }
        if (!Expect(s, ref p, '.') || !Number(s, ref p, 3, 3, out long ms, out _)) return false;
        if (minutes > 59 || seconds > 59) return false;
        time = new Timecode(((hours * 60 + minutes) * 60 + seconds) * 1000 + ms);
        pos = p;
        return true;
    }

    /// <summary>SubRip timestamp <c>hh:mm:ss,mmm</c>; also accepted: one to three hour digits, a '.'
    /// separator and one to three fraction digits, which files in the wild use.</summary>
    public static bool TrySrt(ReadOnlySpan<char> s, ref int pos, out Timecode time)
    {
        time = default;
        int p = pos;
        if (!Number(s, ref p, 1, 3, out long h, out _) || !Expect(s, ref p, ':')
            || !Number(s, ref p, 2, 2, out long m, out _) || !Expect(s, ref p, ':')
            || !Number(s, ref p, 2, 2, out long sec, out _))
            return false;
        long ms = 0;
        if (p < s.Length && (s[p] == ',' || s[p] == '.'))
        {
            p++;
            if (!Fraction(s, ref p, out ms)) return false;
        }
        if (m > 59 || sec > 59) return false;
        time = new Timecode(((h * 60 + m) * 60 + sec) * 1000 + ms);
        pos = p;
        return true;
    }

    /// <summary>The loose stamps of typed transcripts: <c>h:mm:ss</c>, <c>mm:ss</c> (minutes may exceed
    /// 59 when no hours are given), each with an optional <c>.f</c>/<c>,f</c> fraction of 1-3 digits.</summary>
    public static bool TryLoose(ReadOnlySpan<char> s, ref int pos, out Timecode time)
    {
        int p = pos;
        if (!TryLooseShape(s, ref p, out time, out bool inRange) || !inRange) return false;
        pos = p;
        return true;
    }

    /// <summary>The shape of a loose stamp, whatever its numbers: <paramref name="inRange"/> says whether
    /// minutes (with hours) and seconds are 00-59, so "[99:99:99]" can be told from text.</summary>
    public static bool TryLooseShape(ReadOnlySpan<char> s, ref int pos, out Timecode time, out bool inRange)
    {
        time = default;
        inRange = true;
        int p = pos;
        if (!Number(s, ref p, 1, 3, out long a, out _) || !Expect(s, ref p, ':') || !Number(s, ref p, 2, 2, out long b, out _))
            return false;
        long h = 0, m = a, sec = b;
        if (p + 2 < s.Length && s[p] == ':' && char.IsAsciiDigit(s[p + 1]))
        {
            p++;
            if (!Number(s, ref p, 2, 2, out long c, out _)) return false;
            if (b > 59) inRange = false;
            h = a; m = b; sec = c;
        }
        long ms = 0;
        if (p + 1 < s.Length && (s[p] == '.' || s[p] == ',') && char.IsAsciiDigit(s[p + 1]))
        {
            p++;
            if (!Fraction(s, ref p, out ms)) return false;
        }
        if (sec > 59) inRange = false;
        if (p < s.Length && (char.IsAsciiDigit(s[p]) || s[p] == ':')) return false;
        if (inRange) time = new Timecode(((h * 60 + m) * 60 + sec) * 1000 + ms);
        pos = p;
        return true;
    }

    private static bool Number(ReadOnlySpan<char> s, ref int p, int minDigits, int maxDigits, out long value, out int digits)
    {
        value = 0;
        digits = 0;
        while (p < s.Length && char.IsAsciiDigit(s[p]))
        {
            if (++digits > maxDigits) return false;
            value = value * 10 + (s[p] - '0');
            p++;
        }
        return digits >= minDigits;
    }

    /// <summary>1-3 digits read as a decimal fraction of a second, in milliseconds ("5" is 500).</summary>
    private static bool Fraction(ReadOnlySpan<char> s, ref int p, out long ms)
    {
        if (!Number(s, ref p, 1, 3, out long value, out int digits)) { ms = 0; return false; }
        ms = digits switch { 1 => value * 100, 2 => value * 10, _ => value };
        return true;
    }

    private static bool Expect(ReadOnlySpan<char> s, ref int p, char c)
    {
        if (p >= s.Length || s[p] != c) return false;
        p++;
        return true;
    }
}
