using System.Collections.Frozen;

using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Text;

/// <summary>Hesitations, backchannels, unbracketed transcriber notes and loanwords in common use,
/// from the language profiles' <c>hesitations.txt</c>, <c>tags.txt</c> and <c>loanwords.txt</c>
/// (SwitchTag.Core's Languages/&lt;code&gt;/). Words of the <c>mul</c> profile are
/// neutral in every language; a word listed for some languages is neutral only towards those (it
/// carries no evidence against them, but ordinary evidence for or against every other one).</summary>
public sealed class NeutralWords
{
    private static readonly string AllLanguages = LanguageProfiles.Multiple.Code;

    private readonly FrozenSet<string>.AlternateLookup<ReadOnlySpan<char>> _everywhere;
    private readonly FrozenDictionary<string, string[]>.AlternateLookup<ReadOnlySpan<char>> _byWord;

    public NeutralWords(IEnumerable<(string Code, string Word)> entries)
    {
        var list = entries.Select(e => (e.Code, Word: e.Word.ToLowerInvariant())).ToList();
        _everywhere = list.Where(e => e.Code == AllLanguages).Select(e => e.Word)
            .ToFrozenSet(StringComparer.OrdinalIgnoreCase).GetAlternateLookup<ReadOnlySpan<char>>();
        _byWord = list.Where(e => e.Code != AllLanguages).GroupBy(e => e.Word)
            .ToFrozenDictionary(g => g.Key, g => g.Select(e => e.Code).Distinct().Order(StringComparer.Ordinal).ToArray(), StringComparer.OrdinalIgnoreCase)
            .GetAlternateLookup<ReadOnlySpan<char>>();
    }

    /// <summary>The lists of the shipped language profiles.</summary>
    public static NeutralWords Default { get; } = new(LanguageProfiles.Default.All.SelectMany(p =>
        p.Hesitations.Concat(p.TranscriberTags).Concat(p.Loanwords).Select(w => (p.Code.Code, w))));

    /// <summary>A filler in every language: never language evidence.</summary>
    public bool IsNeutralEverywhere(ReadOnlySpan<char> word) => _everywhere.Contains(word);

    /// <summary>Languages in which <paramref name="word"/> is a filler, a transcriber note or a loanword in common use (empty for most words).</summary>
    public ReadOnlySpan<string> NeutralIn(ReadOnlySpan<char> word) =>
        _byWord.TryGetValue(word, out var codes) ? codes : [];
}
