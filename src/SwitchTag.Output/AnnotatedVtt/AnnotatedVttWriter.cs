using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Output.Text;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.AnnotatedVtt;

/// <summary><c>annotated.vtt</c>: every cue with its original times, identifier, settings, speaker
/// (as a <c>&lt;v&gt;</c> voice) and word timestamps, and each stretch outside the main language wrapped
/// in <c>&lt;lang xx&gt;…&lt;/lang&gt;</c> (W3C WebVTT cue language span). Text is escaped as cue text.</summary>
public sealed class AnnotatedVttWriter : IInterviewWriter
{
    public string FileName => "annotated.vtt";

    public void Write(InterviewIndex index, Stream stream)
    {
        using var text = Utf8Text.Writer(stream);
        Render(index, text);
    }

    public static string Render(InterviewIndex index)
    {
        var text = new StringWriter();
        Render(index, text);
        return text.ToString();
    }

    /// <summary>The file, written to <paramref name="sb"/> cue by cue.</summary>
    public static void Render(InterviewIndex index, TextWriter sb)
    {
        // Each cue's place in its turn, by cue index; a cue's text is read from there (an index's
        // transcript holds no cue texts, see Transcript.WithoutCueTexts).
        var cues = index.Transcript.Cues;
        var cueTurn = new (TurnId Turn, TurnCue Part)?[cues.Length];
        for (int t = 0; t < index.Turns.Length; t++)
            foreach (var part in index.Turns[t].Cues)
                if (part.CueIndex >= 0 && part.CueIndex < cues.Length) cueTurn[part.CueIndex] = (new TurnId(t), part);
        var foreign = index.ForeignSpans.GroupBy(f => f.Turn).ToDictionary(g => g.Key, g => g.OrderBy(f => f.CharStart).ToArray());

        sb.Append("WEBVTT\n\nNOTE\nMachine annotation of ").Append(Escape(Path.GetFileName(index.Transcript.Source.Path)))
          .Append(": <lang> marks stretches outside the main language (")
          .Append(index.MainLanguage.Code).Append(").\n\n");
        for (int c = 0; c < cues.Length; c++)
        {
            var cue = cues[c];
            if (cue.Identifier is { Length: > 0 } id) sb.Append(id.Replace('\n', ' ')).Append('\n');
            sb.Append(cue.Time.Start).Append(" --> ").Append(cue.Time.End);
            if (cue.Settings is { Length: > 0 } settings) sb.Append(' ').Append(settings);
            sb.Append('\n');
            if (cue.SpeakerLabel is { Length: > 0 } label)
                sb.Append("<v ").Append(Escape(label.TrimEnd(':').Trim())).Append('>');
            if (cueTurn[c] is var (turn, part))
                AppendText(sb, index.TurnAt(turn).Text.Substring(part.CharStart, part.CharEnd - part.CharStart), cue.WordTimes,
                    CueSpans(foreign.GetValueOrDefault(turn, []), part));
            else
                AppendText(sb, cue.Text, cue.WordTimes, []);
            sb.Append("\n\n");
        }
    }

    /// <summary>The foreign stretches inside one cue of a turn. A turn's stretches are in text order and
    /// do not overlap, so the first one that can reach the cue is found by binary search: a turn of one
    /// speaker may hold hundreds of thousands of cues and as many stretches.</summary>
    private static List<(int Start, int End, LanguageCode Language)> CueSpans(ForeignSpan[] spans, TurnCue part)
    {
        var result = new List<(int, int, LanguageCode)>();
        int lo = 0, hi = spans.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (spans[mid].CharEnd <= part.CharStart) lo = mid + 1; else hi = mid;
        }
        for (int i = lo; i < spans.Length && spans[i].CharStart < part.CharEnd; i++)
        {
            var s = spans[i];
            int start = Math.Max(s.CharStart, part.CharStart) - part.CharStart;
            int end = Math.Min(s.CharEnd, part.CharEnd) - part.CharStart;
            if (end > start) result.Add((start, end, s.Language));
        }
        return result;
    }

    // Tags go in at char positions of the cue text: at one position, closing tags, then the word
    // timestamp, then opening tags, so tags nest properly. Spans come in text order and do not
    // overlap, so one pass over the cut points places them (a 10 MB cue may hold 100k spans).
    private static void AppendText(TextWriter sb, string text, ImmutableArray<WordTime> wordTimes, List<(int Start, int End, LanguageCode Language)> spans)
    {
        var breaks = LineBreaks(text);
        var times = new Dictionary<int, Timecode>();
        if (!wordTimes.IsDefault)
            foreach (var w in wordTimes)
                if (w.CharOffset >= 0 && w.CharOffset < text.Length) times.TryAdd(w.CharOffset, w.Time);
        var ends = spans.Select(s => s.End).ToHashSet();
        var cuts = spans.SelectMany(s => new[] { s.Start, s.End }).Concat(times.Keys).Append(0).Append(text.Length)
            .Distinct().Order().ToList();
        int next = 0;
        for (int k = 0; k < cuts.Count; k++)
        {
            int at = cuts[k];
            if (ends.Contains(at)) sb.Append("</lang>");
            if (times.TryGetValue(at, out var time)) sb.Append('<').Append(time).Append('>');
            for (; next < spans.Count && spans[next].Start == at; next++) sb.Append("<lang ").Append(spans[next].Language.Code).Append('>');
            if (k + 1 < cuts.Count) AppendEscaped(sb, text, at, cuts[k + 1], breaks);
        }
    }

    /// <summary>Which '\n' of the text may be written as a line break. A WebVTT parser ends a cue at an
    /// empty line, and some readers also end it at a whitespace-only line, so a break next to
    /// either is written as the character reference <c>&amp;#10;</c> instead, and the cue reads back with
    /// the same text in both.</summary>
    private static bool[] LineBreaks(string text)
    {
        var raw = new bool[text.Length];
        int lineStart = 0;
        bool previousBlank = true;
        for (int i = 0; i <= text.Length; i++)
        {
            if (i < text.Length && text[i] != '\n') continue;
            bool blank = text.AsSpan(lineStart, i - lineStart).IsWhiteSpace();
            if (lineStart > 0) raw[lineStart - 1] = !previousBlank && !blank;
            previousBlank = blank;
            lineStart = i + 1;
        }
        return raw;
    }

    /// <summary>Cue text escaped (WebVttText.Escape), with CR kept as <c>&amp;#13;</c> (a raw one would end
    /// the line) and each line break written as <see cref="LineBreaks"/> says.</summary>
    private static void AppendEscaped(TextWriter sb, string text, int from, int to, bool[] breaks)
    {
        int run = from;
        for (int i = from; i < to; i++)
        {
            char c = text[i];
            if (c != '\r' && (c != '\n' || breaks[i])) continue;
            sb.Append(WebVttText.Escape(text[run..i])).Append(c == '\r' ? "&#13;" : "&#10;");
            run = i + 1;
        }
        sb.Append(WebVttText.Escape(text[run..to]));
    }

    private static string Escape(string text) => WebVttText.Escape(text.ReplaceLineEndings(" "));
}
