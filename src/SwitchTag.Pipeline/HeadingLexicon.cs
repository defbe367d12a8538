using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Core.Languages;

namespace SwitchTag.Pipeline;

/// <summary>The lexicon seen by heading building: the lexicon's own grouping key (fold and per-language
/// stem), its gazetteer lookup (folded, inflected and other-language names) and the name lists'
/// first names, surname keys, diminutives and equivalents, and the camps and historical regions whose
/// spoken names a link would replace (a camp's town from the gazetteer, else the list's own centre).</summary>
public sealed class HeadingLexicon(Gazetteer gazetteer, NameListSet? lists = null) : IHeadingLexicon
{
    private readonly NameListSet _lists = lists ?? NameListSet.Empty;

    public string Key(string name, LanguageCode language) => NameFolding.Key(name, language);

    /// <summary>Gazetteer places, then the first-level regions of the name (no coordinates, no population).</summary>
    public ImmutableArray<PlaceLink> Places(string name, LanguageCode language) =>
    [
        .. gazetteer.Lookup(name, language).Select(p => new PlaceLink(p.GeonameId, p.Name, p.Latitude, p.Longitude, p.Country, p.Population)),
        .. _lists.Regions.Find(name).Select(r => new PlaceLink(0, r.Name, null, null, r.Country, 0, r.Code)),
    ];

    public ListedPlace? Listed(string name, LanguageCode language)
    {
        if (_lists.Places.Find(name, language) is not { } listed) return null;
        var at = listed.At is null ? null
            : gazetteer.Lookup(listed.At, LanguageCode.Undetermined).Where(p => p.Country == listed.Countries[0] && Key(p.Name, LanguageCode.Undetermined) == Key(listed.At, LanguageCode.Undetermined))
                .Select(p => new PlaceLink(p.GeonameId, p.Name, p.Latitude, p.Longitude, p.Country, p.Population)).FirstOrDefault()
              ?? new PlaceLink(0, listed.At, listed.Latitude, listed.Longitude, listed.Countries[0], 0);
        return new ListedPlace(listed.Name, listed.Kind, listed.IsSite, at, listed.Countries);
    }

    public bool IsWorldRegion(string name, LanguageCode language) => _lists.WorldRegions.Contains(name, language);

    public bool IsFirstName(string word) => _lists.IsFirstName(word);

    public char? TitleSex(string word) => _lists.Cues.TitleSex(word);

    public char? GivenNameSex(string word) => _lists.GivenNameSex(word);

    public bool KnowsGivenName(string word) => _lists.Variants.KnowsGivenName(word);

    public string SurnameKey(string word, LanguageCode language) => _lists.Variants.Key(NameFolding.Stem(word, language));

    public bool WomansAndMansForm(string a, string b)
    {
        var keysA = _lists.Variants.FamilyKeys(a).ToList();
        var keysB = _lists.Variants.FamilyKeys(b).ToList();
        return keysA[0] != keysB[0] && (keysA.Contains(keysB[0]) || keysB.Contains(keysA[0]));
    }

    public bool SameFamilyName(string a, LanguageCode languageA, string b, LanguageCode languageB) =>
        SurnameKey(a, languageA) == SurnameKey(b, languageB)
        || _lists.Variants.FamilyKeys(a).Intersect(_lists.Variants.FamilyKeys(b), StringComparer.Ordinal).Any();

    public bool EndsWithBirthNameMarker(string before) => _lists.Cues.EndsWithBirthNameMarker(before);

    public bool IsKinshipWord(string word) => _lists.Cues.IsKinship(word);

    public string? KinshipRole(string word) => _lists.Cues.KinshipRole(word);

    public bool? NamingPhraseAround(string before, string after) => _lists.Cues.NamingPhraseAround(before, after);

    public bool SpeakerWentBy(string before, string after) => _lists.Cues.SpeakerWentBy(before, after);

    public bool NamedBefore(string before) => _lists.Cues.NamedBefore(before);

    public (bool Pronoun, char? Sex)? BecameBefore(string before, string after) => _lists.Cues.BecameBefore(before, after);

    public bool SpeaksOfMarriage(IEnumerable<string> words) => _lists.Cues.SpeaksOfMarriage(words);

    /// <summary>Listed diminutives, stems and keys, or one a case form of the other (Slovak instrumental
    /// "Imrichom" of "Imrich", whose own stem the Slovak endings cut too short); or a productive diminutive that is not itself a listed first name (Irenka of
    /// Irena, but not Marek of Mara nor Paulina of Paula).</summary>
    public bool SameGivenName(string a, LanguageCode languageA, string b, LanguageCode languageB) =>
        _lists.Variants.SameGivenName(a, b)
        || _lists.Variants.SameGivenName(NameFolding.Stem(a, languageA), NameFolding.Stem(b, languageB))
        || Key(a, languageA) == Key(b, languageB)
        || MayInflect(a, b) && NameFolding.SameName(a, languageA, b, languageB)
        || _lists.Variants.DiminutiveOf(a, b) is { } form && !IsFirstName(form);

    public bool EquivalentGivenNames(string a, string b) => _lists.Variants.Equivalent(a, b);

    /// <summary>For the name and its stem: the first <see cref="BucketLetters"/> letters of the spelling
    /// key (equal keys, case forms and productive diminutives begin alike), the key itself and the full
    /// names the lists give it (Pepík and Josef).</summary>
    public IEnumerable<string> GivenNameBuckets(string name, LanguageCode language)
    {
        var buckets = new HashSet<string>(StringComparer.Ordinal);
        foreach (var form in new[] { name, NameFolding.Stem(name, language) })
        {
            var key = _lists.Variants.Key(form);
            buckets.Add("p:" + key[..Math.Min(BucketLetters, key.Length)]);
            buckets.Add("k:" + key);
            foreach (var full in _lists.Variants.FullNames(form)) buckets.Add("k:" + full);
        }
        return buckets;
    }

    /// <summary>Letters of the spelling key a productive diminutive or case form shares with its name:
    /// the shortest stem the variant rules accept.</summary>
    private const int BucketLetters = 3;

    /// <summary>A cheap bar before the case-form match, which tries every language's endings: a case
    /// form starts with its name's letter and is at most a few letters longer or shorter.</summary>
    private static bool MayInflect(string a, string b) =>
        a.Length > 0 && b.Length > 0 && Math.Abs(a.Length - b.Length) <= 4 && char.ToLowerInvariant(a[0]) == char.ToLowerInvariant(b[0]);
}
