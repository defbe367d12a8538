using System.Collections.Immutable;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;

namespace SwitchTag.Core.Documents;

/// <summary>A transcript format by the name index.json (<c>source.format</c>) and <c>--format</c> use.
/// The readers of SwitchTag.Formats bring their own values, so this is no closed list.</summary>
public readonly record struct TranscriptFormat(string Name)
{
    public static readonly TranscriptFormat WebVtt = new("webvtt");
    public static readonly TranscriptFormat Srt = new("srt");
    public static readonly TranscriptFormat Text = new("text");
    public static readonly TranscriptFormat Markdown = new("markdown");

    public override string ToString() => Name;
}

/// <summary>Where a piece of input came from: file and 1-based line.</summary>
public readonly record struct SourceLine(string Path, int Line)
{
    public override string ToString() => $"{Path}:{Line}";
}

public enum Severity { Warning, Error }

/// <summary>A problem found in the input, always tied to a file and line so a person can fix it.</summary>
public sealed record Diagnostic(SourceLine At, Severity Severity, string Message)
{
    public override string ToString() => $"{At}: {(Severity == Severity.Error ? "error" : "warning")}: {Message}";
}

public sealed record SourceInfo(string Path, TranscriptFormat Format, string Sha256);

/// <summary>A word whose start time the file states (WebVTT inline timestamps).
/// <paramref name="CharOffset"/> points into the cue's plain <see cref="Cue.Text"/>.</summary>
public sealed record WordTime(int CharOffset, Timecode Time);

/// <summary>One timed unit of the transcript.</summary>
/// <param name="Speaker">Normalised speaker label (case, spacing and trailing colon folded), or null.</param>
/// <param name="SpeakerLabel">The label exactly as written in the file, or null.</param>
/// <param name="Text">Plain text: markup removed, character references decoded, lines joined by '\n'.
/// Empty in an index's transcript, whose turns hold it (<see cref="Transcript.WithoutCueTexts"/>).</param>
/// <param name="Raw">Its lines in the file's decoded text (SwitchTag.Formats <c>ReadResult.Text</c>): from the first line's start to just past the last line.</param>
public sealed record Cue(
    TimeRange Time,
    string? Speaker,
    string? SpeakerLabel,
    string Text,
    ImmutableArray<WordTime> WordTimes,
    SourceLine At,
    CharSpan Raw,
    string? Identifier = null,
    string? Settings = null)
{
    public int RawStart => Raw.Start;
    public int RawEnd => Raw.End;
}

/// <summary>A whole transcript file as read: every cue found in it. The file's text stays with the
/// read (SwitchTag.Formats <c>ReadResult.Text</c>): nothing after reading needs it, and an interview
/// is carried to its last output, where the text of a 20 MB file would take 40 MB.</summary>
public sealed record Transcript(
    SourceInfo Source,
    ImmutableArray<Cue> Cues,
    ImmutableArray<Diagnostic> Diagnostics)
{
    /// <summary>The interview's name: the file name without its extension.</summary>
    public string Name => System.IO.Path.GetFileNameWithoutExtension(Source.Path);

    private readonly string? _id;

    /// <summary>The interview's id, unique in its collection and the same on every run over the same
    /// inputs: a run sets it to the path relative to the input folder (SwitchTag.Formats
    /// <c>InterviewIds</c>); a transcript read alone has its <see cref="Name"/>. Every output names the
    /// interview by it, and decisions find their interview by it.</summary>
    public string Id { get => _id ?? Name; init => _id = value; }

    /// <summary>This transcript with every cue's text empty. Once the turns are built each cue's text
    /// is in its turn (<see cref="Turn.Text"/> at <see cref="TurnCue.Chars"/>), and an interview carried
    /// to its last output would otherwise hold every word twice (27 MB for a 200k-cue turn).</summary>
    public Transcript WithoutCueTexts() => this with { Cues = [.. Cues.Select(c => c with { Text = "" })] };
}
