using SwitchTag.Core.Documents;

namespace SwitchTag.Lexicon;

/// <summary>A name found in a searched text: <c>[CharStart, CharEnd)</c> into that text.
/// <paramref name="Entry"/> is the <see cref="AuthorityEntry"/> or the most populous
/// <see cref="GazetteerPlace"/> the span names (use <see cref="Authority"/> / <see cref="Place"/>).</summary>
public sealed record NameMatch(int CharStart, int CharEnd, NameLabel Label, string Canonical, MentionSource Source, object? Entry)
{
    public AuthorityEntry? Authority => Entry as AuthorityEntry;

    public GazetteerPlace? Place => Entry as GazetteerPlace;

    public int Length => CharEnd - CharStart;

    public bool Overlaps(NameMatch other) => CharStart < other.CharEnd && other.CharStart < CharEnd;
}
