using System.Collections.Immutable;
using SwitchTag.Core.Time;

namespace SwitchTag.Core.Documents;

/// <summary>A stretch of a turn's text in one language. Language is an ISO 639-1 code where one
/// exists, else ISO 639-3, or <c>und</c> when nothing is confident.</summary>
public sealed record LanguageSpan(int CharStart, int CharEnd, string Language, double Confidence);

public enum NameLabel { PER, LOC, ORG }

public enum MentionSource { Model, Authority, Gazetteer }

/// <summary>A name found in a turn: offsets into <see cref="Turn.Text"/>.</summary>
public sealed record Mention(
    int Turn,
    int CharStart,
    int CharEnd,
    string Text,
    NameLabel Label,
    string Language,
    double Confidence,
    MentionSource Source);

/// <summary>Anything with char offsets into a turn, placed in the recording.</summary>
public sealed record Timed<T>(T Value, TimeRange Time);

public static class MentionSourceNames
{
    public static string ToName(this MentionSource source) => source switch
    {
        MentionSource.Model => "model",
        MentionSource.Authority => "authority",
        MentionSource.Gazetteer => "gazetteer",
        _ => throw new ArgumentOutOfRangeException(nameof(source)),
    };
}
