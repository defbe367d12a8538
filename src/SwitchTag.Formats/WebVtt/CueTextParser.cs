using System.Collections.Immutable;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Formats.Reading;
using SwitchTag.Formats.Text;
using SwitchTag.Core.Text;

namespace SwitchTag.Formats.WebVtt;

/// <summary>The cue text of one WebVTT cue, reduced to plain text with what its markup said.</summary>
internal sealed record CueText(
    string Plain,
    string? Voice,
    ImmutableArray<WordTime> WordTimes);

/// <summary>Parses WebVTT cue text (W3C WebVTT, "cue text parsing rules"): <c>&lt;c&gt; &lt;i&gt; &lt;b&gt;
/// &lt;u&gt; &lt;ruby&gt; &lt;rt&gt; &lt;v&gt; &lt;lang&gt;</c> spans with classes, inline timestamps and
/// character references. Tags are dropped from the plain text; ruby text is kept in parentheses after
/// its base (closed by <c>&lt;/rt&gt;</c>, <c>&lt;/ruby&gt;</c> or the cue's end); a '&lt;' with no '&gt;' before
/// the next '&lt;' is kept as text, with one warning per cue counting them.</summary>
internal static class CueTextParser
{
    /// <param name="raw">The cue's text lines joined by '\n'.</param>
    /// <param name="firstLine">The file line of the first text line, for diagnostics.</param>
    public static CueText Parse(string raw, TimeRange cueTime, int firstLine, Diagnostics diagnostics)
    {
        var plain = new StringBuilder(raw.Length);
        var words = ImmutableArray.CreateBuilder<WordTime>();
        // Open <lang> tags: their language is not kept (the segmenter decides), only their nesting.
        int openLangs = 0;
        string? voice = null;
        int voices = 0;
        bool noCloseAhead = false, rubyText = false;
        int unclosed = 0, unclosedLine = 0;
        var s = raw.AsSpan();
        int countedTo = 0, line = firstLine;

        int i = 0;
        while (i < s.Length)
        {
            char c = s[i];
            if (c == '&')
            {
                int used = CharacterReferences.TryDecode(s, i, plain);
                if (used == 0) plain.Append('&');
                i += Math.Max(used, 1);
                continue;
            }
            if (c != '<')
            {
                plain.Append(c);
                i++;
                continue;
            }
            // A '<' whose next '<' comes before any '>' has no '>' of its own: the spec's tokenizer would
            // swallow the text up to the later '>' into the tag (so "<c.first That's awesome!</c>" shows
            // nothing); it is kept as text instead. Looking for either character keeps this linear.
            int close = noCloseAhead ? -1 : s[(i + 1)..].IndexOfAny('<', '>');
            if (close < 0 || s[i + 1 + close] == '<')
            {
                noCloseAhead = close < 0;
                line += s[countedTo..i].Count('\n');
                countedTo = i;
                if (unclosed++ == 0) unclosedLine = line;
                plain.Append('<');
                i++;
                continue;
            }
            var tag = s.Slice(i + 1, close);
            line += s[countedTo..i].Count('\n');
            countedTo = i;
            int tagLine = line;
            i += close + 2;

            if (tag.Length > 0 && tag[0] == '/')
            {
                var name = tag[1..].Trim();
                if (name.SequenceEqual("lang") && openLangs > 0)
                    openLangs--;
                else if ((name.SequenceEqual("rt") || name.SequenceEqual("ruby")) && rubyText)
                {
                    // "</ruby>" also ends an open ruby text (W3C WebVTT, cue text parsing rules).
                    plain.Append(')');
                    rubyText = false;
                }
                continue;
            }
            if (tag.Length > 0 && char.IsAsciiDigit(tag[0]))
            {
                int p = 0;
                if (Timestamps.TryWebVtt(tag, ref p, out Timecode at) && p == tag.Length)
                {
                    if (at < cueTime.Start || at > cueTime.End)
                        diagnostics.Warn(tagLine, $"inline timestamp <{tag}> lies outside the cue ({cueTime}); kept");
                    words.Add(new WordTime(plain.Length, at));
                }
                else
                    diagnostics.Warn(tagLine, $"malformed inline timestamp <{tag}>; ignored");
                continue;
            }

            int nameEnd = 0;
            while (nameEnd < tag.Length && tag[nameEnd] != '.' && !char.IsWhiteSpace(tag[nameEnd])) nameEnd++;
            var tagName = tag[..nameEnd];
            int ws = nameEnd;
            while (ws < tag.Length && !char.IsWhiteSpace(tag[ws])) ws++;
            var annotation = ws < tag.Length ? Decode(tag[ws..]).Trim() : "";

            switch (tagName)
            {
                case "v":
                    if (annotation.Length == 0) break;
                    voices++;
                    if (voice is null) voice = SharedStrings.Of(annotation);
                    else if (voices == 2 && annotation != voice)
                        diagnostics.Warn(tagLine, $"cue has more than one voice (\"{voice}\", \"{annotation}\"); its speaker is the first");
                    break;
                case "lang":
                    openLangs++;
                    break;
                case "rt":
                    if (!rubyText) plain.Append('(');
                    rubyText = true;
                    break;
                case "c" or "i" or "b" or "u" or "ruby":
                    break;
                default:
                    // The spec drops unknown tags; what they held is quoted so that it is not lost silently.
                    diagnostics.Warn(tagLine, $"unknown tag <{tag}> in cue text; dropped");
                    break;
            }
        }
        if (rubyText) plain.Append(')');
        if (unclosed > 0)
            diagnostics.Warn(unclosedLine, unclosed == 1
                ? "'<' with no closing '>' in cue text; kept as text"
                : $"{unclosed} '<' with no closing '>' of their own in cue text; kept as text");
        return new CueText(plain.ToString(), voice, words.ToImmutable());
    }

    private static string Decode(ReadOnlySpan<char> s)
    {
        var sb = new StringBuilder(s.Length);
        for (int i = 0; i < s.Length;)
        {
            int used = s[i] == '&' ? CharacterReferences.TryDecode(s, i, sb) : 0;
            if (used == 0) sb.Append(s[i++]);
            else i += used;
        }
        return sb.ToString();
    }
}
