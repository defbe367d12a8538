using System.Collections.Immutable;
using System.Runtime.InteropServices;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing;

/// <summary>One label per name per interview, decided by the evidence over the whole interview
/// before headings are grouped. Only the model's, the bare gazetteer's and a lone listed given name's labels change; the authority
/// list, person cues and place evidence fixed theirs earlier in the cascade.
/// In order: (1) a name of two or more words whose first word is a listed first name (or a given name
/// the variant lists know: "Avraham Shapira") and which the gazetteer does not know as a whole is a
/// person ("Esterina Saltiel"); (2) a one-word name that is the
/// first or last word of a person named in full in the interview, or a listed diminutive of that
/// person's given name, is that person's name ("Szwarc" beside "Hanka Szwarc", "Pina" beside "Giuseppina
/// Russo"), and so is the same name as a one-word person a cue marked, in any script ("η Σοφία" beside
/// "my mother, Sofia,"), unless place evidence put it in a place; (3) every mention of one grouping
/// key (so inflected forms too: "Krakowie" beside "Kraków") takes the label with the most evidence:
/// cues and place evidence weigh 10, a model mention its confidence, a bare gazetteer match or lone given name 0.5, and
/// a place mention the gazetteer knows 0.5 more. Changes by (1) and (2) are recorded as decided by a
/// cue.</summary>
internal static class LabelVote
{
    private const double FixedWeight = 10, GazetteerWeight = 0.5, KnownPlaceBonus = 0.5;

    public static ImmutableArray<Mention> Apply(ImmutableArray<Mention> mentions, string[] keys, ImmutableArray<PlaceLink>[] places,
        IHeadingLexicon lexicon, HashSet<string> lowerWords)
    {
        var result = mentions.ToArray();
        for (int i = 0; i < result.Length; i++)
        {
            var m = result[i];
            if (!Open(m) || m.Label == NameLabel.PER) continue;
            var words = Words(m.Text);
            if (words.Length >= 2 && (lexicon.IsFirstName(words[0]) || lexicon.KnowsGivenName(words[0])) && places[i].IsEmpty && char.IsUpper(words[^1][0])
                && !lowerWords.Contains(words[^1].ToLowerInvariant()))
                result[i] = m with { Label = NameLabel.PER, Source = MentionSource.Cue };
        }

        var nameParts = new HashSet<string>(StringComparer.Ordinal);
        var givenNames = new HashSet<(string Name, LanguageCode Language)>();
        foreach (var m in result)
        {
            if (m.Label != NameLabel.PER) continue;
            var words = Words(m.Text);
            // A one-word name a title or kinship word marked ("my mother, Sofia") names that person
            // wherever else it is said, in any script ("η Σοφία").
            if (words.Length == 1 && m.Source == MentionSource.Cue) givenNames.Add((words[0], m.Language));
            if (words.Length < 2) continue;
            nameParts.Add(lexicon.Key(words[0], m.Language));
            nameParts.Add(lexicon.Key(words[^1], m.Language));
            givenNames.Add((words[0], m.Language));
        }
        // The given names by bucket, and the answer once per name said: a long interview says thousands of
        // names, and comparing each with every given name grew with the square of the talk.
        var given = givenNames.ToList();
        var byBucket = new Dictionary<string, List<int>>(StringComparer.Ordinal);
        for (int g = 0; g < given.Count; g++)
            foreach (var bucket in lexicon.GivenNameBuckets(given[g].Name, given[g].Language))
            {
                if (!byBucket.TryGetValue(bucket, out var list)) byBucket[bucket] = list = [];
                list.Add(g);
            }
        var isGiven = new Dictionary<(string, LanguageCode), bool>();
        bool IsGivenName(Mention m)
        {
            if (!isGiven.TryGetValue((m.Text, m.Language), out bool found))
                isGiven[(m.Text, m.Language)] = found = lexicon.GivenNameBuckets(m.Text, m.Language)
                    .SelectMany(b => byBucket.TryGetValue(b, out var list) ? list : [])
                    .Distinct().Any(g => IsDiminutiveOf(lexicon, m, given[g]));
            return found;
        }
        for (int i = 0; i < result.Length; i++)
            if (Open(result[i]) && result[i].Label != NameLabel.PER && Words(result[i].Text).Length == 1
                && (nameParts.Contains(keys[i]) || IsGivenName(result[i])))
                result[i] = result[i] with { Label = NameLabel.PER, Source = MentionSource.Cue };

        foreach (var group in Enumerable.Range(0, result.Length).GroupBy(i => keys[i], StringComparer.Ordinal))
        {
            var members = group.ToList();
            if (members.Select(i => result[i].Label).Distinct().Count() < 2) continue;
            var weights = new Dictionary<NameLabel, double>();
            foreach (int i in members)
                weights[result[i].Label] = weights.GetValueOrDefault(result[i].Label) + Weight(result[i], places[i]);
            var ranked = weights.OrderByDescending(p => p.Value).ToList();
            if (ranked[0].Value - ranked[1].Value < 1e-9) continue;
            foreach (int i in members)
                if (Open(result[i])) result[i] = result[i] with { Label = ranked[0].Key };
        }
        // The array is not touched again: handed over, not copied (571k mentions in a 200k-cue turn).
        return ImmutableCollectionsMarshal.AsImmutableArray(result);
    }

    /// <summary>The given name, a case form of it or a listed diminutive or nickname of the given name
    /// of a person named in full in the interview ("Pina" beside "Giuseppina Russo", "Chico" beside "Francisco Ruiz"): the interview ties
    /// the word to that person, whatever small place bears it.</summary>
    private static bool IsDiminutiveOf(IHeadingLexicon lexicon, Mention m, (string Name, LanguageCode Language) given) =>
        lexicon.SameGivenName(given.Name, given.Language, m.Text, m.Language);

    /// <summary>Whether a later stage may change the mention's label.</summary>
    internal static bool Open(Mention m) => m.Source == MentionSource.Model || m.Source == MentionSource.Gazetteer || m.Source == MentionSource.GivenName;

    private static double Weight(Mention m, ImmutableArray<PlaceLink> places)
    {
        double w = m.Source == MentionSource.Model ? m.Confidence
            : m.Source == MentionSource.Gazetteer || m.Source == MentionSource.GivenName ? GazetteerWeight
            : FixedWeight;
        return w + (m.Label == NameLabel.LOC && !places.IsEmpty ? KnownPlaceBonus : 0);
    }

    private static string[] Words(string text) => text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
}
