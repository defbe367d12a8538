using System.Collections.Immutable;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;

namespace SwitchTag.Core.Documents;

/// <summary>A stretch of a turn's text in one language. Language is an ISO 639-1 code where one
/// exists, else ISO 639-3, or <c>und</c> when nothing is confident.</summary>
public sealed record LanguageSpan(CharSpan Chars, LanguageCode Language, double Confidence)
{
    public int CharStart => Chars.Start;
    public int CharEnd => Chars.End;
}

public enum NameLabel { PER, LOC, ORG }

/// <summary>The name source that found a mention. <see cref="Name"/> is what the outputs show; a new
/// source brings its own value, so this is no closed list.</summary>
public readonly record struct MentionSource(string Name)
{
    public static readonly MentionSource Model = new("model");
    public static readonly MentionSource Authority = new("authority");
    public static readonly MentionSource Gazetteer = new("gazetteer");

    /// <summary>A person cue: a title or kinship word before the name, or a listed first name in it.</summary>
    public static readonly MentionSource Cue = new("cue");

    /// <summary>A gazetteer place with context that supports a place (a locative preposition, a
    /// case ending on a town, a multi-word name matched whole).</summary>
    public static readonly MentionSource PlaceEvidence = new("place-evidence");

    /// <summary>A capitalised word that the name lists know as a given name or short form ("Staś",
    /// "Beto") and no ordinary word of its language, said alone: a person the model missed.</summary>
    public static readonly MentionSource GivenName = new("given-name");

    public override string ToString() => Name;
}

/// <summary>A name found in a turn: offsets into <see cref="Turn.Text"/>.</summary>
public sealed record Mention(
    TurnId Turn,
    CharSpan Chars,
    string Text,
    NameLabel Label,
    LanguageCode Language,
    double Confidence,
    MentionSource Source)
{
    public int CharStart => Chars.Start;
    public int CharEnd => Chars.End;
}

/// <summary>Anything with char offsets into a turn, placed in the recording.</summary>
public sealed record Timed<T>(T Value, TimeRange Time);
