using System.Globalization;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing.Decisions;

/// <summary>Which tagged mention a mention decision means, besides its text.</summary>
public abstract record MentionTarget
{
    public abstract bool Matches(Mention mention, TimeRange time);

    /// <summary>The <c>time</c>, <c>turn</c> and <c>char</c> cells that name this target again.</summary>
    public abstract (string? Time, string? Turn, string? Char) Cells { get; }
}

/// <summary>The mention said at this time (the exported form): a rerun that re-splits turns or moves a
/// span's edge by a few characters still finds it, since its time moves by well under
/// <see cref="Tolerance"/>.</summary>
public sealed record MentionAtTime(Timecode Time) : MentionTarget
{
    /// <summary>How far a mention's start may drift between runs and still match: two seconds, about 30
    /// characters at the 15 characters/second the time alignment assumes without word timings.</summary>
    public const long ToleranceMilliseconds = 2000;

    public override bool Matches(Mention mention, TimeRange time) => Math.Abs((time.Start - Time).Milliseconds) <= ToleranceMilliseconds;

    public override (string? Time, string? Turn, string? Char) Cells => (Time.ToSecondsString(), null, null);

    public override string ToString() => $"at {Time}";
}

/// <summary>The mention at this turn and char offset (the first decisions format, from mentions.csv):
/// matches only while the turns and offsets are unchanged.</summary>
public sealed record MentionAtPosition(TurnId Turn, int Char) : MentionTarget
{
    public override bool Matches(Mention mention, TimeRange time) => mention.Turn == Turn && mention.CharStart == Char;

    public override (string? Time, string? Turn, string? Char) Cells =>
        (null, Turn.ToString(), Char.ToString(CultureInfo.InvariantCulture));

    public override string ToString() => $"turn {Turn} char {Char}";
}
