using SwitchTag.Core.Documents;

namespace SwitchTag.Lexicon;

/// <summary>A name found in a searched text: <c>[CharStart, CharEnd)</c> into that text, and the
/// list entry's or most populous place's own name.</summary>
public sealed record NameMatch(int CharStart, int CharEnd, NameLabel Label, string Canonical, MentionSource Source)
{
    public int Length => CharEnd - CharStart;

    public bool Overlaps(NameMatch other) => CharStart < other.CharEnd && other.CharStart < CharEnd;
}
