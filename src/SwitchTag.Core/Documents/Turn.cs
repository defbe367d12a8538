using System.Collections.Immutable;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;

namespace SwitchTag.Core.Documents;

/// <summary>Where one cue's plain text sits inside its turn's text. A value, not an object: a long
/// turn holds one per cue (200k of them for a 200k-cue turn), all alive to the last output.</summary>
public readonly record struct TurnCue(int CueIndex, CharSpan Chars)
{
    public int CharStart => Chars.Start;
    public int CharEnd => Chars.End;
}

/// <summary>Consecutive cues of one speaker. <see cref="Text"/> is the cues' plain texts joined by
/// one space; every char offset of later stages is into this text. <see cref="Id"/> is its place in
/// the interview's list of turns.</summary>
public sealed record Turn(
    TurnId Id,
    string? Speaker,
    string? SpeakerLabel,
    TimeRange Time,
    string Text,
    ImmutableArray<TurnCue> Cues);
