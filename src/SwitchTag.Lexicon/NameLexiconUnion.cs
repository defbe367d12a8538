using SwitchTag.Core.Stages;

namespace SwitchTag.Lexicon;

/// <summary>A word is a known name if any of the lexicons knows it (authority list and gazetteer together).</summary>
public sealed class NameLexiconUnion(params INameLexicon[] lexicons) : INameLexicon
{
    public bool IsKnownName(ReadOnlySpan<char> word)
    {
        foreach (var lexicon in lexicons)
            if (lexicon.IsKnownName(word)) return true;
        return false;
    }
}
