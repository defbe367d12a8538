using System.Collections.Immutable;
using System.Text.Encodings.Web;
using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.IndexJson;

/// <summary>Writes <c>index.json</c>, schema <c>switchtag.index/1</c> (fields in SCHEMA.md).
/// Times are seconds as JSON numbers; numbers are written in invariant form by Utf8JsonWriter.
/// The writer is flushed to the stream as it goes (<see cref="Spill"/>) and a turn's text is written
/// in pieces, so one speaker turn of 200k cues never holds the whole file, or its text escaped, in memory.</summary>
public sealed class IndexJsonWriter : IInterviewWriter
{
    public string FileName => "index.json";

    void IInterviewWriter.Write(InterviewIndex index, Stream stream) => Write(index, stream);

    public const string Schema = "switchtag.index/1";

    public static readonly JsonWriterOptions Options = new()
    {
        Indented = true,
        // Names and transcript text stay readable; the file is never embedded in HTML.
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    /// <summary>Bytes a writer holds before <see cref="Spill"/> hands them to the stream.</summary>
    private const int SpillAt = 1 << 16;

    /// <summary>Chars of a long string written per piece.</summary>
    private const int PieceChars = 1 << 14;

    public static void Write(InterviewIndex index, Stream stream)
    {
        using var w = new Utf8JsonWriter(stream, Options);
        w.WriteStartObject();
        w.WriteString("schema", Schema);
        w.WriteString("interview", index.Transcript.Id);
        w.WriteStartObject("source");
        w.WriteString("path", index.Transcript.Source.Path);
        w.WriteString("format", index.Transcript.Source.Format.Name);
        w.WriteString("sha256", index.Transcript.Source.Sha256);
        w.WriteEndObject();
        w.WriteString("mainLanguage", index.MainLanguage.Code);
        w.WriteString("mainLanguageBasis", index.MainLanguageDecision?.Basis);
        Seconds(w, "duration", index.Duration);
        if (index.Media is not null) w.WriteString("media", index.Media);

        w.WriteStartArray("languages");
        foreach (var share in index.Languages)
        {
            w.WriteStartObject();
            w.WriteString("language", share.Language.Code);
            w.WriteNumber("seconds", share.Seconds);
            w.WriteNumber("words", share.Words);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        WriteLanguageChoice(w, index);
        WriteTurns(w, index);
        WriteMentions(w, index);
        WriteHeadings(w, index);
        WriteWorklist(w, index);

        w.WriteStartArray("review");
        foreach (var r in index.Review)
        {
            w.WriteStartObject();
            w.WriteNumber("mention", r.Mention.Index);
            w.WriteString("reason", r.Reason);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("diagnostics");
        foreach (var d in index.Diagnostics)
        {
            w.WriteStartObject();
            w.WriteString("file", d.At.Path);
            w.WriteNumber("line", d.At.Line);
            w.WriteString("severity", d.Severity == Severity.Error ? "error" : "warning");
            w.WriteString("message", d.Message);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void WriteLanguageChoice(Utf8JsonWriter w, InterviewIndex index)
    {
        Fractions(w, "languageProfile", index.LanguageProfile);
        if (index.MainLanguageDecision is not { } d) { w.WriteNull("mainLanguageChoice"); return; }
        w.WriteStartObject("mainLanguageChoice");
        w.WriteString("basis", d.Basis);
        w.WriteString("unit", d.Unit);
        w.WriteStartArray("narrators");
        foreach (var n in d.Narrators) w.WriteStringValue(n);
        w.WriteEndArray();
        Fractions(w, "narratorShares", d.NarratorShares);
        Fractions(w, "interviewerShares", d.InterviewerShares);
        w.WriteEndObject();
    }

    private static void Fractions(Utf8JsonWriter w, string name, ImmutableArray<LanguageFraction> fractions)
    {
        w.WriteStartArray(name);
        foreach (var f in fractions.IsDefault ? [] : fractions)
        {
            w.WriteStartObject();
            w.WriteString("language", f.Language.Code);
            w.WriteNumber("share", f.Share);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    private static void WriteTurns(Utf8JsonWriter w, InterviewIndex index)
    {
        w.WriteStartArray("turns");
        for (int t = 0; t < index.Turns.Length; t++)
        {
            var turn = index.Turns[t];
            w.WriteStartObject();
            w.WriteString("speaker", turn.Speaker);
            w.WriteString("speakerLabel", turn.SpeakerLabel);
            Seconds(w, "start", turn.Time.Start);
            Seconds(w, "end", turn.Time.End);
            LongString(w, "text", turn.Text);
            w.WriteStartArray("spans");
            foreach (var timed in index.Spans[t])
            {
                w.WriteStartObject();
                w.WriteNumber("charStart", timed.Value.CharStart);
                w.WriteNumber("charEnd", timed.Value.CharEnd);
                Seconds(w, "start", timed.Time.Start);
                Seconds(w, "end", timed.Time.End);
                w.WriteString("language", timed.Value.Language.Code);
                w.WriteNumber("confidence", Math.Round(timed.Value.Confidence, 4));
                w.WriteEndObject();
                Spill(w);
            }
            w.WriteEndArray();
            // The cues the turn was made of, so a user sees exactly what was read and from which line.
            w.WriteStartArray("cues");
            foreach (var part in turn.Cues)
            {
                var cue = index.Transcript.Cues[part.CueIndex];
                w.WriteStartObject();
                Seconds(w, "start", cue.Time.Start);
                Seconds(w, "end", cue.Time.End);
                w.WriteNumber("charStart", part.CharStart);
                w.WriteNumber("charEnd", part.CharEnd);
                w.WriteNumber("line", cue.At.Line);
                w.WriteEndObject();
                Spill(w);
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    private static void WriteMentions(Utf8JsonWriter w, InterviewIndex index)
    {
        var reasons = index.Review.ToDictionary(r => r.Mention, r => r.Reason);
        w.WriteStartArray("mentions");
        for (int i = 0; i < index.Mentions.Length; i++)
        {
            var (m, time, heading) = index.Mentions[i];
            w.WriteStartObject();
            w.WriteString("text", m.Text);
            w.WriteString("label", m.Label.ToString());
            w.WriteNumber("turn", m.Turn.Index);
            w.WriteNumber("charStart", m.CharStart);
            w.WriteNumber("charEnd", m.CharEnd);
            Seconds(w, "start", time.Start);
            Seconds(w, "end", time.End);
            w.WriteString("language", m.Language.Code);
            w.WriteNumber("confidence", Math.Round(m.Confidence, 4));
            w.WriteString("source", m.Source.Name);
            w.WriteString("heading", heading?.Value);
            w.WriteString("speaker", index.TurnAt(m.Turn).Speaker);
            w.WriteString("review", reasons.GetValueOrDefault(new MentionId(i)));
            w.WriteEndObject();
            Spill(w);
        }
        w.WriteEndArray();
    }

    private static void WriteHeadings(Utf8JsonWriter w, InterviewIndex index)
    {
        w.WriteStartArray("headings");
        foreach (var h in index.Headings)
        {
            w.WriteStartObject();
            w.WriteString("id", h.Id.Value);
            w.WriteString("label", h.Label.ToString());
            w.WriteString("name", h.Name);
            w.WriteStartArray("variants");
            foreach (var v in h.Variants) w.WriteStringValue(v);
            w.WriteEndArray();
            if (h.Place is null) w.WriteNull("place");
            else { w.WritePropertyName("place"); WritePlace(w, h.Place); }
            w.WriteBoolean("placeFromContext", h.PlaceFromContext);
            w.WriteStartArray("alternatives");
            foreach (var a in h.Alternatives) WritePlace(w, a);
            w.WriteEndArray();
            w.WriteNumber("count", h.Mentions.Length);
            if (h.Mentions.IsEmpty) w.WriteNull("firstMention");
            else Seconds(w, "firstMention", index.MentionAt(h.Mentions[0]).Time.Start);
            w.WriteStartArray("mentions");
            foreach (var m in h.Mentions) { w.WriteNumberValue(m.Index); Spill(w); }
            w.WriteEndArray();
            w.WriteStartArray("times");
            foreach (var m in h.Mentions)
            {
                var time = index.MentionAt(m).Time;
                w.WriteStartObject();
                Seconds(w, "start", time.Start);
                Seconds(w, "end", time.End);
                w.WriteEndObject();
                Spill(w);
            }
            w.WriteEndArray();
            w.WriteStartArray("speakers");
            foreach (var s in h.Speakers) w.WriteStringValue(s);
            w.WriteEndArray();
            w.WriteNumber("confidence", h.Confidence);
            w.WriteStartArray("possiblySame");
            foreach (var id in h.PossiblySame) w.WriteStringValue(id.Value);
            w.WriteEndArray();
            w.WriteString("source", h.Source.Name);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    private static void WritePlace(Utf8JsonWriter w, PlaceLink p)
    {
        w.WriteStartObject();
        if (p.HasGeonameId) w.WriteNumber("geonameId", p.GeonameId); else w.WriteNull("geonameId");
        JsonNumbers.WriteOrNull(w, "lat", p.Latitude);
        JsonNumbers.WriteOrNull(w, "lon", p.Longitude);
        w.WriteString("country", p.Country);
        w.WriteString("name", p.Name);
        w.WriteNumber("population", p.Population);
        if (p.Region is not null) w.WriteString("region", p.Region);
        w.WriteEndObject();
    }

    private static void WriteWorklist(Utf8JsonWriter w, InterviewIndex index)
    {
        w.WriteStartArray("worklist");
        foreach (var item in index.Worklist)
        {
            w.WriteStartObject();
            Seconds(w, "start", item.Time.Start);
            Seconds(w, "end", item.Time.End);
            w.WriteString("speaker", item.Speaker);
            w.WriteString("language", item.Language.Code);
            w.WriteNumber("confidence", item.Confidence);
            w.WriteString("text", item.Text);
            w.WriteNumber("turn", item.Turn.Index);
            w.WriteNumber("charStart", item.CharStart);
            w.WriteNumber("charEnd", item.CharEnd);
            w.WriteNumber("words", item.Words);
            w.WriteBoolean("check", item.Check);
            w.WriteEndObject();
            Spill(w);
        }
        w.WriteEndArray();
    }

    /// <summary>Hands what the writer holds to the stream once it passes <see cref="SpillAt"/> bytes:
    /// a writer over a stream otherwise keeps the whole document until it is disposed.</summary>
    private static void Spill(Utf8JsonWriter w)
    {
        if (w.BytesPending >= SpillAt) w.Flush();
    }

    /// <summary>A string property written in pieces (the writer escapes a whole value at once otherwise,
    /// with room for six bytes a char); the bytes are those of one <c>WriteString</c>.</summary>
    private static void LongString(Utf8JsonWriter w, string name, string value)
    {
        if (value.Length <= PieceChars) { w.WriteString(name, value); return; }
        w.WritePropertyName(name);
        for (int at = 0; at < value.Length; at += PieceChars)
        {
            int length = Math.Min(PieceChars, value.Length - at);
            w.WriteStringValueSegment(value.AsSpan(at, length), isFinalSegment: at + length == value.Length);
            Spill(w);
        }
    }

    public static void Seconds(Utf8JsonWriter w, string name, Timecode t) => w.WriteNumber(name, t.Milliseconds / 1000m);

    public static void Seconds(Utf8JsonWriter w, string name, Duration d) => w.WriteNumber(name, d.Milliseconds / 1000m);
}
