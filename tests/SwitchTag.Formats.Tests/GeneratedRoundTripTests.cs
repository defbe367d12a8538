using SwitchTag.Core.Text;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Seeded random transcripts written as WebVTT, SRT and timestamped text by writers here (from
/// the formats' published layouts: W3C WebVTT, SubRip), read back and compared cue by cue.</summary>
public class GeneratedRoundTripTests
{
    private sealed record Generated(TimeRange Time, string? Speaker, string[] Lines);

    /// <summary>Letters from many scripts, non-BMP ones included (U+20000 CJK Ext. B, U+1D400 maths bold,
    /// U+10330 Gothic), so surrogate pairs go through every reader.</summary>
    private static readonly string[] Alphabets =
    [
        "abcdefghijklmnopqrstuvwxyzáéíóúñçøåäöüß",
        "абвгдежзийклмнопрстуфхцчшщыэюя",
        "αβγδεζηθικλμνξοπρστυφχψω",
        "אבגדהוזחטיכלמנסעפצקרשת",
        "ابتثجحخدذرزسشصضطظعغفقكلمنهوي",
        "कखगघचछजझटठडढणतथदधनपफबभमयरलवशषसह",
        "日本語中文字漢語韓國한국어",
        "\U00020000\U00020001\U0002000B\U0001D400\U0001D401\U00010330\U00010331",
    ];

    private static readonly string[] SpeakerPool = ["Ana María", "DR. ØYVIND", "Speaker 2", "Łucja", "Jean-Paul", "Zhang Wei"];

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void WebVtt_round_trip(int seed)
    {
        var rng = new Random(seed);
        var cues = Generate(rng, withMarkupChars: true);
        var file = new StringBuilder("WEBVTT\n\n");
        for (int i = 0; i < cues.Count; i++)
        {
            var c = cues[i];
            if (rng.Next(3) == 0) file.Append("cue-").Append(i).Append('\n');
            file.Append(Vtt(c.Time.Start)).Append(" --> ").Append(Vtt(c.Time.End)).Append('\n');
            string voice = c.Speaker is null ? "" : $"<v {c.Speaker}>";
            file.Append(voice).Append(string.Join('\n', c.Lines.Select(WebVttText.Escape))).Append("\n\n");
        }
        // Some cues carry no voice: in a file that uses voices, such a cue has no speaker.
        Compare(cues, Reads.AcceptedRead($"gen-{seed}.vtt", file.ToString()), speakerContinues: false);
    }

    [Theory]
    [InlineData(11)]
    [InlineData(12)]
    [InlineData(13)]
    [InlineData(14)]
    [InlineData(15)]
    public void Srt_round_trip(int seed)
    {
        var rng = new Random(seed);
        var cues = Generate(rng, withMarkupChars: false);
        var file = new StringBuilder();
        string? previous = null;
        for (int i = 0; i < cues.Count; i++)
        {
            var c = cues[i];
            file.Append(i + 1).Append('\n').Append(Srt(c.Time.Start)).Append(" --> ").Append(Srt(c.Time.End)).Append('\n');
            // SubRip files name a speaker when it changes.
            string prefix = c.Speaker is not null && c.Speaker != previous ? c.Speaker + ": " : "";
            previous = c.Speaker ?? previous;
            file.Append(prefix).Append(string.Join('\n', c.Lines)).Append("\n\n");
        }
        Compare(AsLabelsRead(cues), Reads.AcceptedRead($"gen-{seed}.srt", file.ToString()), speakerContinues: true);
    }

    [Theory]
    [InlineData(21)]
    [InlineData(22)]
    [InlineData(23)]
    [InlineData(24)]
    [InlineData(25)]
    public void Timestamped_text_round_trip(int seed)
    {
        var rng = new Random(seed);
        var cues = Generate(rng, withMarkupChars: false, contiguous: true);
        var file = new StringBuilder();
        string? previous = null;
        foreach (var c in cues)
        {
            string stamp = rng.Next(2) == 0 ? $"[{Loose(c.Time.Start)}]" : $"({Loose(c.Time.Start)})";
            string prefix = c.Speaker is not null && c.Speaker != previous ? c.Speaker + ": " : "";
            previous = c.Speaker ?? previous;
            file.Append(stamp).Append(' ').Append(prefix).Append(string.Join('\n', c.Lines)).Append('\n');
        }
        file.Append('[').Append(Loose(cues[^1].Time.End)).Append("]\n");
        Compare(cues, Reads.AcceptedRead($"gen-{seed}.txt", file.ToString(), TranscriptFormat.Text), speakerContinues: true);
    }

    /// <summary>FORMATS.md, "Speakers": in a caption file, prefixes name speakers only where one label is
    /// written twice or in capitals; otherwise each written prefix stays in its cue's text.</summary>
    private static List<Generated> AsLabelsRead(List<Generated> cues)
    {
        var written = new List<string>();
        string? previous = null;
        foreach (var c in cues)
        {
            if (c.Speaker is not null && c.Speaker != previous) written.Add(c.Speaker);
            previous = c.Speaker ?? previous;
        }
        if (written.GroupBy(w => w).Any(g => g.Count() >= 2) || written.Any(w => w.Where(char.IsLetter).All(char.IsUpper))) return cues;
        var plain = new List<Generated>();
        previous = null;
        foreach (var c in cues)
        {
            bool prefixed = c.Speaker is not null && c.Speaker != previous;
            previous = c.Speaker ?? previous;
            plain.Add(prefixed ? new Generated(c.Time, null, [c.Speaker + ": " + c.Lines[0], .. c.Lines[1..]]) : c with { Speaker = null });
        }
        return plain;
    }

    private static void Compare(List<Generated> expected, ReadResult read, bool speakerContinues)
    {
        var actual = read.Transcript!;
        Assert.Empty(actual.Diagnostics);
        Assert.Equal(expected.Count, actual.Cues.Length);
        string? current = null;
        for (int i = 0; i < expected.Count; i++)
        {
            var e = expected[i];
            var a = actual.Cues[i];
            Assert.Equal(e.Time, a.Time);
            Assert.Equal(string.Join('\n', e.Lines), a.Text);
            current = speakerContinues ? e.Speaker ?? current : e.Speaker;
            Assert.Equal(current, a.SpeakerLabel);
            Assert.Equal(SpeakerLabels.Normalise(current), a.Speaker);
        }
        InvariantTests.CheckCues(read);
        InvariantTests.CheckTurns(actual);
    }

    private static List<Generated> Generate(Random rng, bool withMarkupChars, bool contiguous = false)
    {
        int count = rng.Next(1, 120);
        var cues = new List<Generated>(count);
        long t = rng.Next(0, 5000);
        for (int i = 0; i < count; i++)
        {
            long length = rng.Next(1, 8000);
            var time = new TimeRange(new Timecode(t), new Timecode(t + length));
            t += length + (contiguous ? 0 : rng.Next(0, 3000));
            string? speaker = rng.Next(4) == 0 ? null : SpeakerPool[rng.Next(SpeakerPool.Length)];
            var lines = Enumerable.Range(0, rng.Next(1, 4)).Select(_ => Line(rng, withMarkupChars)).ToArray();
            cues.Add(new Generated(time, speaker, lines));
        }
        return cues;
    }

    /// <summary>A line of 1-12 words; never starting with a digit, never holding a colon, so it cannot
    /// read as a timestamp or a speaker prefix.</summary>
    private static string Line(Random rng, bool withMarkupChars)
    {
        var words = new List<string>();
        int n = rng.Next(1, 13);
        for (int w = 0; w < n; w++)
        {
            var alphabet = Alphabets[rng.Next(Alphabets.Length)];
            var elements = System.Globalization.StringInfo.GetTextElementEnumerator(alphabet);
            var letters = new List<string>();
            while (elements.MoveNext()) letters.Add((string)elements.Current);
            var word = new StringBuilder();
            for (int k = rng.Next(1, 9); k > 0; k--) word.Append(letters[rng.Next(letters.Count)]);
            if (w > 0 && rng.Next(6) == 0) word.Append(rng.Next(2) == 0 ? "," : "!");
            if (w > 0 && rng.Next(10) == 0) word.Insert(0, rng.Next(1000));
            if (withMarkupChars && rng.Next(8) == 0) word.Append(" & <b> -->"[rng.Next(0, 3)..]);
            words.Add(word.ToString());
        }
        return string.Join(' ', words);
    }

    private static string Vtt(Timecode t) => t.ToString();

    private static string Srt(Timecode t) => t.ToString().Replace('.', ',');

    /// <summary>h:mm:ss.mmm with the hour unpadded (the loose form typed transcripts use).</summary>
    private static string Loose(Timecode t)
    {
        long ms = t.Milliseconds;
        return $"{ms / 3_600_000}:{ms / 60_000 % 60:00}:{ms / 1000 % 60:00}.{ms % 1000:000}";
    }
}
