using System.Collections.Frozen;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon;

/// <summary>The per-language case-ending rules, built from the language profiles' <c>stemming.txt</c>
/// (SwitchTag.Core/Languages/&lt;code&gt;/). Endings are written folded, as <see cref="NameFolding.Fold"/>
/// leaves them (Polish "-ą" is "-a", Lithuanian "-ų" is "-u"). They are the endings of nouns and
/// adjectives in the standard grammars of each language, written down from memory, restricted to
/// those that place and person names take; "-ów"/"-ов" (genitive plural) are left out on purpose,
/// because many town names end that way in the nominative (Kraków, Rostov).</summary>
public static class StemRules
{
    private static readonly (LanguageProfile Profile, StemRule Rule)[] Rules = LanguageProfiles.Default.All
        .Where(p => p.Stemming is not null)
        .OrderBy(p => p.Stemming!.FallbackRank)
        .Select(p => (p, Build(p.Code, p.Stemming!)))
        .ToArray();

    private static readonly FrozenDictionary<string, StemRule> ByCode = Rules
        .SelectMany(r => r.Profile.Aliases.Prepend(r.Profile.Code).Select(code => (code, r.Rule)))
        .ToFrozenDictionary(x => x.code.Code, x => x.Rule, StringComparer.Ordinal);

    /// <summary>Every distinct rule, for the fallback used when a text's language is unknown.</summary>
    public static IReadOnlyList<StemRule> All { get; } = [.. Rules.Select(r => r.Rule)];

    /// <summary>The rule for a code or alias, or null.</summary>
    public static StemRule? For(LanguageCode language) => ByCode.GetValueOrDefault(language.Code);

    /// <summary>The rule for an ISO 639-1 or 639-3 code as people write it (region suffix ignored: "pl-PL"), or null.</summary>
    public static StemRule? For(string? language)
    {
        if (string.IsNullOrWhiteSpace(language)) return null;
        var code = language.Trim();
        int dash = code.IndexOfAny(['-', '_']);
        if (dash > 0) code = code[..dash];
        return ByCode.GetValueOrDefault(code.ToLowerInvariant());
    }

    private static StemRule Build(LanguageCode code, StemmingData data)
    {
        var named = data.Alternations.Select(n => StemOperations.Alternations.TryGetValue(n, out var f) ? f
            : throw new InvalidDataException($"Languages/{code}/stemming.txt: no stem alternation named {n}")).ToArray();
        var replacements = data.Replacements;
        Func<string, IEnumerable<string>>? alternations = replacements.IsEmpty && named.Length == 0 ? null
            : stem => StemOperations.Replacements(stem, replacements).Concat(named.SelectMany(f => f(stem)));
        Func<string, string>? normalise = data.Normalise is null ? null
            : StemOperations.Normalisers.TryGetValue(data.Normalise, out var n) ? n
            : throw new InvalidDataException($"Languages/{code}/stemming.txt: no normaliser named {data.Normalise}");
        Func<string, string, bool>? allows = data.Allows is null ? null
            : StemOperations.Tests.TryGetValue(data.Allows, out var t) ? t
            : throw new InvalidDataException($"Languages/{code}/stemming.txt: no test named {data.Allows}");
        return new StemRule(code, data.Endings, data.Nominative, alternations, normalise, allows);
    }
}
