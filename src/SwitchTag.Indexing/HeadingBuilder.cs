using System.Collections.Immutable;
using System.Runtime.InteropServices;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Pipeline;

namespace SwitchTag.Indexing;

/// <summary>Headings found for one interview: the headings, the heading id of every mention (null
/// when held for review) and the review items; <see cref="Mentions"/>, when set, are the mentions
/// with the labels the interview-wide vote gave them (<see cref="LabelVote"/>).</summary>
public sealed record HeadingResult(ImmutableArray<Heading> Headings, ImmutableArray<HeadingId?> HeadingOf, ImmutableArray<ReviewItem> Review)
{
    public ImmutableArray<Mention> Mentions { get; init; }
}

/// <summary>Groups mentions under headings.
/// Places: each LOC mention's gazetteer candidates (alternate names in all languages) are resolved by
/// evidence (see <see cref="PlaceScore"/>): population, whether the name said is the place's own name,
/// and the countries of the interview's unambiguous places (every candidate in one country: Haifa the city and the district); the others are kept as alternatives. Mentions resolved to one gazetteer
/// id form one heading; a LOC mention the gazetteer does not know joins a linked heading whose variant
/// has its folded key, else forms a heading without coordinates.
/// Persons are grouped conservatively: multi-word names group by their folded first and last words
/// (a middle name may come and go); a one-word name joins a multi-word heading only when exactly one
/// such heading has it as its first or last word (so "Kowalczyk" stays apart when two Kowalczyks are
/// named); other one-word names group by folded key.
/// A camp, ghetto or historical region or state the name lists know (<see cref="IHeadingLexicon.Listed"/>)
/// keeps the name said as its heading: a camp is shown at its town ("Auschwitz", at Oświęcim, PL); a
/// historical region or state is not linked to a modern place of the name (<see cref="Historical"/>),
/// which stays among the alternatives for the reviewer.
/// Organisations group by folded key.
/// Held for review instead: mentions below the confidence floor, model PER mentions, and model LOC
/// mentions the gazetteer does not know, holding a lower-case word that is no name particle, multi-word PER mentions that are the own name of a town or region, PER mentions that are the own name
/// of a place of 100,000 people or more, surfaces tagged both PER and LOC in the interview, model mentions whose first letter is
/// lower case (names in cased scripts are capitalised; uncased scripts are never caught), one-word
/// model mentions the interview also writes in lower case as an ordinary word (unless a place
/// mention the gazetteer knows: "o porto" beside Porto) and one-word bare gazetteer matches it so
/// writes (no context and no model backs them: "Coats from the morning" beside "sewing coats"),
/// multi-word model mentions opening a sentence whose every word the interview also writes in lower
/// case ("Mia madre si alzava" beside "mia" and "madre"; "She became"), and
/// one-word places nothing knows whose ending makes them a word for people ("Neapolitan"), and
/// places whose every gazetteer candidate is accented otherwise (<see cref="Respelling"/>: "Perón" is
/// not Péron, FR) or is a village named so only in one of its other names (<see cref="VillagePopulation"/>).</summary>
public sealed class HeadingBuilder(IHeadingLexicon lexicon, double reviewBelow = HeadingBuilder.DefaultReviewBelow)
{
    public const double DefaultReviewBelow = 0.5;

    /// <summary>A person's name competes with a place only when it is the own name of a place this
    /// large: small towns named like given names (Hanna, Alberta) would otherwise hold back every person.</summary>
    public const long CompetingPlacePopulation = 100_000;

    /// <summary>A place smaller than this, reached only through one of its other names (not its own)
    /// by a one-word Latin-script name with no place evidence, is too weak a link to index unreviewed
    /// ("against Perón" is not Leones, AR, once called Perón). The gazetteer's village size.</summary>
    public const long VillagePopulation = 15_000;

    /// <summary>A town this large reached through another of its names is what a speaker means rather
    /// than a first-level region of that name ("New York").</summary>
    public const long MetropolisPopulation = 1_000_000;

    /// <summary>A city this large said by its own name is meant rather than a first-level region of the
    /// name abroad, unless the interview's places point to the region's country: "lived in Manchester"
    /// beside Leeds and London is the English city, not the Jamaican parish.</summary>
    public const long OwnNameCityPopulation = 100_000;

    public HeadingResult Build(
        ImmutableArray<Mention> mentions,
        ImmutableArray<TimeRange> times,
        ImmutableArray<Turn> turns,
        IReadOnlySet<MentionId>? accepted = null)
    {
        int n = mentions.Length;
        // A long interview's steps below each leave whole-interview arrays and groups behind, which
        // piled up over the stage (LongTalk): its memory is given back after each.
        bool isLong = LongTalk.IsLong(turns);
        var keys = new string[n];
        var places = new ImmutableArray<PlaceLink>[n];
        var respelled = new PlaceLink?[n];
        var placeCache = new Dictionary<(string, LanguageCode), ImmutableArray<PlaceLink>>();
        // One key string per name said, not per mention: a long turn says the same few names 100k times.
        var keyCache = new Dictionary<(string, LanguageCode), string>();
        for (int i = 0; i < n; i++)
        {
            var m = mentions[i];
            if (!keyCache.TryGetValue((m.Text, m.Language), out keys[i]!)) keyCache[(m.Text, m.Language)] = keys[i] = lexicon.Key(m.Text, m.Language);
            var found = CachedPlaces(placeCache, m.Text, m.Language);
            places[i] = found.RemoveAll(p => Respelling.MarksConflict(m.Text, p.Name));
            if (places[i].IsEmpty && !found.IsEmpty) respelled[i] = found[0];
            // An accented name said is not a village spelt plainly: the link goes, the place stays.
            places[i] = places[i].RemoveAll(p => p.HasGeonameId && p.Population < VillagePopulation && Respelling.MarksAdded(m.Text, p.Name));
        }

        var lowerWords = LowerCaseWords(turns);
        mentions = LabelVote.Apply(mentions, keys, places, lexicon, lowerWords);
        for (int i = 0; i < n; i++)
            if (mentions[i].Label == NameLabel.ORG) places[i] = [];

        var review = ImmutableArray.CreateBuilder<ReviewItem>();
        var held = new bool[n];
        var labelsOfSurface = new Dictionary<string, HashSet<NameLabel>>(StringComparer.Ordinal);
        for (int i = 0; i < n; i++)
        {
            if (!labelsOfSurface.TryGetValue(keys[i], out var set)) labelsOfSurface[keys[i]] = set = [];
            set.Add(mentions[i].Label);
        }
        for (int i = 0; i < n; i++)
        {
            if (accepted?.Contains(new MentionId(i)) == true) continue;
            var reason = ReviewReason(mentions[i], keys[i], places[i], respelled[i], labelsOfSurface[keys[i]], lowerWords, turns[mentions[i].Turn.Index].Text);
            if (reason is null) continue;
            held[i] = true;
            review.Add(new ReviewItem(new MentionId(i), reason));
        }

        if (isLong) LongTalk.Compact();
        var groups = new List<Group>();
        GroupPlaces(mentions, keys, places, held, groups);
        if (isLong) LongTalk.Compact();
        GroupPersons(mentions, keys, held, groups, turns);
        GroupByKey(mentions, keys, held, groups, NameLabel.ORG);
        if (isLong) LongTalk.Compact();

        var headingOf = new HeadingId?[n];
        var headings = new List<Heading>();
        var usedIds = new HashSet<HeadingId>();
        var idOf = new Dictionary<Group, HeadingId>();
        foreach (var g in groups)
        {
            var heading = ToHeading(g, mentions, times, turns, places, usedIds);
            foreach (var m in heading.Mentions) headingOf[m.Index] = heading.Id;
            idOf[g] = heading.Id;
            headings.Add(heading);
        }
        for (int k = 0; k < groups.Count; k++)
            if (groups[k].Possible.Count > 0)
                headings[k] = headings[k] with { PossiblySame = [.. groups[k].Possible.Select(g => idOf[g]).Order()] };
        var ordered = HeadingOrder.Sort(headings);
        return new HeadingResult(ordered, ImmutableCollectionsMarshal.AsImmutableArray(headingOf), review.ToImmutable()) { Mentions = mentions };
    }

    private ImmutableArray<PlaceLink> CachedPlaces(Dictionary<(string, LanguageCode), ImmutableArray<PlaceLink>> cache, string text, LanguageCode language)
    {
        if (!cache.TryGetValue((text, language), out var found))
            cache[(text, language)] = found = lexicon.Places(text, language);
        return found.IsDefault ? [] : found;
    }

    /// <summary>Every word of the interview written with a lower-case first letter: a capitalised
    /// one-word "name" that the same talk also uses as an ordinary word ("Her", "She", "Schnell" at a
    /// sentence start beside "her", "schnell") is more likely that word than a name.</summary>
    private static HashSet<string> LowerCaseWords(ImmutableArray<Turn> turns)
    {
        var words = new HashSet<string>(StringComparer.Ordinal);
        foreach (var turn in turns)
        {
            var text = turn.Text;
            for (int i = 0; i < text.Length;)
            {
                if (!char.IsLetter(text[i])) { i++; continue; }
                int start = i;
                while (i < text.Length && (char.IsLetter(text[i]) || char.GetUnicodeCategory(text[i]) == System.Globalization.UnicodeCategory.NonSpacingMark)) i++;
                if (char.IsLower(text[start])) words.Add(text[start..i]);
            }
        }
        return words;
    }

    private string? ReviewReason(Mention m, string key, ImmutableArray<PlaceLink> places, PlaceLink? respelled, HashSet<NameLabel> labelsOfSurface,
        HashSet<string> lowerWords, string turnText)
    {
        bool open = LabelVote.Open(m);
        if (open && m.Label == NameLabel.LOC && respelled is not null)
            return $"\"{m.Text}\" is accented otherwise than the only places of that name ({respelled.Name}, {respelled.Country}): another name, perhaps a person's";
        if (open && m.Label == NameLabel.LOC && !places.IsEmpty && !m.Text.Any(char.IsWhiteSpace) && m.Text.All(c => WritingScripts.Of(c) is WritingScript.None or WritingScript.Latin)
            && places.All(p => p.Population < VillagePopulation && Key(p.Name, m.Language) != key))
            return $"\"{m.Text}\" is only another name of a village ({places[0].Name}, {places[0].Country}), and the sentence does not say it is a place";
        if (labelsOfSurface.Contains(NameLabel.PER) && labelsOfSurface.Contains(NameLabel.LOC) && m.Label != NameLabel.ORG
            && m.Source != MentionSource.Cue && m.Source != MentionSource.PlaceEvidence)
            return "the same name is tagged both PER and LOC in this interview, and the evidence is even";
        if (m.Label == NameLabel.PER && m.Source != MentionSource.Cue && places.FirstOrDefault(p => CompetesWithPerson(p, m, key)) is { } place)
            return $"tagged PER, but \"{m.Text}\" is also the name of a place ({place.Name}, {place.Country})";
        if (m.Source == MentionSource.Model && m.Text.FirstOrDefault(char.IsLetter) is var first && char.IsLower(first))
            return "the model tagged a name that does not start with a capital letter";
        if (m.Source == MentionSource.Model && m.Label == NameLabel.PER && Words(m.Text).Skip(1).FirstOrDefault(OrdinaryInnerWord) is { } inner)
            return $"a person's name does not hold the lower-case word \"{inner}\"";
        if ((m.Source == MentionSource.Model && (m.Label != NameLabel.LOC || places.IsEmpty) || m.Source == MentionSource.Gazetteer || m.Source == MentionSource.GivenName)
            && !m.Text.Any(char.IsWhiteSpace) && m.Text.Length > 0 && char.IsUpper(m.Text[0])
            && lowerWords.Contains(m.Text.ToLowerInvariant()))
            return $"\"{m.Text}\" is also used as an ordinary word in this interview (\"{m.Text.ToLowerInvariant()}\")";
        if (m.Source == MentionSource.Model && m.Text.Any(char.IsWhiteSpace) && TextPosition.IsSentenceStart(turnText, m.CharStart)
            && Words(m.Text).All(w => lowerWords.Contains(w.ToLowerInvariant())))
            return $"\"{m.Text}\" opens a sentence and its words are used as ordinary words in this interview";
        // A place the gazetteer does not know is the model's word alone: "Austrian club" and Italian
        // "Avevamo fame" (we were hungry) are phrases, not places.
        if (m.Source == MentionSource.Model && m.Label == NameLabel.LOC && places.IsEmpty && Words(m.Text).Skip(1).FirstOrDefault(OrdinaryInnerWord) is { } word)
            return $"a place's name does not hold the lower-case word \"{word}\", and no place of that name is known";
        if (open && m.Label == NameLabel.LOC && places.IsEmpty && respelled is null && !m.Text.Any(char.IsWhiteSpace)
            && lexicon.Listed(m.Text, m.Language) is null && DemonymEnding(m.Text) is { } ending)
            return $"\"{m.Text}\" reads as a word for the people of a place (-{ending}), and no place of that name is known";
        if (m.Confidence < reviewBelow)
            return FormattableString.Invariant($"low confidence ({m.Confidence:0.00})");
        return null;
    }

    /// <summary>Whether a place named exactly as a person's mention says competes with the person: a town
    /// of <see cref="CompetingPlacePopulation"/> or more, or, for a name of two or more words, any town
    /// or first-level region so named (a given name and surname are seldom both a place's: "Minas
    /// Gerais" tagged PER is the state).</summary>
    private bool CompetesWithPerson(PlaceLink p, Mention m, string key) =>
        lexicon.Key(p.Name, m.Language) == key
        && (p.Population >= CompetingPlacePopulation || m.Text.Any(char.IsWhiteSpace) && (p.HasGeonameId || p.Region is not null));

    /// <summary>A lower-case word inside a capitalised person's name that is no name particle of any
    /// language (von, da, ben): names are written capitalised, so "Cucivo cappotti dalla mattina" is a
    /// sentence, not a person.</summary>
    private static bool OrdinaryInnerWord(string word) =>
        word.FirstOrDefault(char.IsLetter) is var c && char.IsLower(c)
        && !LanguageProfiles.Default.NameParticles.Contains(word.ToLowerInvariant());

    /// <summary>The demonym ending (language profiles' <c>demonym-endings.txt</c>) a word carries
    /// after a stem of three letters or more, or null: nationality and people words are never places.</summary>
    private static string? DemonymEnding(string word)
    {
        var lower = word.ToLowerInvariant();
        return LanguageProfiles.Default.DemonymEndings.FirstOrDefault(e => lower.Length >= e.Length + 3 && lower.EndsWith(e, StringComparison.Ordinal));
    }

    private sealed class Group(NameLabel label, string key)
    {
        public NameLabel Label { get; } = label;
        public string Key { get; } = key;
        public PlaceLink? Place { get; set; }

        /// <summary>A camp or historical place: the heading keeps the name said, the place is where it lies.</summary>
        public bool KeepsSpokenName { get; set; }

        /// <summary>The place is where the talk was, not the name's own gazetteer entry.</summary>
        public bool PlaceFromContext { get; set; }

        /// <summary>A title the heading's name is shown with: set when two persons are told apart by it
        /// alone ("Herr Huber", "Frau Huber").</summary>
        public string? Title { get; set; }
        public List<int> Members { get; } = [];
        public HashSet<Group> Possible { get; } = [];
    }

    /// <summary>A candidate's score: log10 of its population (size is the prior), plus 0.5 when the name
    /// said is the place's own name rather than an alternate (so a namesake wins over a place more than
    /// about three times its size only by other evidence: "Rhodes" is Ródos, GR, 56,000 people, not the
    /// Sydney suburb Rhodes, 12,000, whose own name it is), plus 3 times the share of the interview's
    /// unambiguous places lying in its country. So "Paris" beside Dallas and Houston is the Texan one, but
    /// one American town elsewhere in the interview does not turn "Vienna" into Vienna, Virginia.</summary>
    private static double PlaceScore(PlaceLink p, bool ownName, Dictionary<string, int> evidence, int evidenceTotal) =>
        Math.Log10(Math.Max(1, p.Population)) + (ownName ? 0.5 : 0) +
        (evidenceTotal == 0 ? 0 : 3.0 * evidence.GetValueOrDefault(p.Country) / evidenceTotal);

    private string Key(string name, LanguageCode language) => lexicon.Key(name, language);

    private void GroupPlaces(ImmutableArray<Mention> mentions, string[] keys, ImmutableArray<PlaceLink>[] places, bool[] held, List<Group> groups)
    {
        var listed = new ListedPlace?[mentions.Length];
        for (int i = 0; i < mentions.Length; i++)
            if (!held[i] && mentions[i].Label == NameLabel.LOC) listed[i] = lexicon.Listed(mentions[i].Text, mentions[i].Language);

        var evidence = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < mentions.Length; i++)
            if (!held[i] && mentions[i].Label == NameLabel.LOC && listed[i] is null && !places[i].IsEmpty
                && places[i].All(p => p.Country == places[i][0].Country))
                evidence[places[i][0].Country] = evidence.GetValueOrDefault(places[i][0].Country) + 1;

        int evidenceTotal = evidence.Values.Sum();
        var byPlace = new Dictionary<string, Group>(StringComparer.Ordinal);
        var bySpoken = new Dictionary<string, Group>(StringComparer.Ordinal);
        var unlinked = new List<int>();
        for (int i = 0; i < mentions.Length; i++)
        {
            if (held[i] || mentions[i].Label != NameLabel.LOC) continue;
            var m = mentions[i];
            if (listed[i] is { } spoken && (spoken.IsSite || Historical(spoken, m, places[i], evidence)))
            {
                if (!bySpoken.TryGetValue(spoken.Name, out var own))
                {
                    bySpoken[spoken.Name] = own = new Group(NameLabel.LOC, keys[i]) { Place = spoken.At, KeepsSpokenName = true };
                    groups.Add(own);
                }
                own.Members.Add(i);
                continue;
            }
            if (places[i].IsEmpty) { unlinked.Add(i); continue; }
            var chosen = Choose(m, places[i], evidence, evidenceTotal);
            if (!byPlace.TryGetValue(chosen.Key, out var group))
            {
                byPlace[chosen.Key] = group = new Group(NameLabel.LOC, chosen.Key) { Place = chosen };
                groups.Add(group);
            }
            group.Members.Add(i);
        }

        var linkedKeys = new Dictionary<string, Group>(StringComparer.Ordinal);
        foreach (var g in byPlace.Values)
            foreach (int i in g.Members)
                linkedKeys.TryAdd(keys[i], g);
        var byKey = new Dictionary<string, Group>(StringComparer.Ordinal);
        foreach (int i in unlinked)
        {
            if (linkedKeys.TryGetValue(keys[i], out var linked)) { linked.Members.Add(i); continue; }
            if (!byKey.TryGetValue(keys[i], out var group))
            {
                byKey[keys[i]] = group = new Group(NameLabel.LOC, keys[i]);
                groups.Add(group);
            }
            group.Members.Add(i);
        }

        var linkedAt = new Dictionary<int, PlaceLink>();
        foreach (var g in byPlace.Values)
            if (g.Place is { HasGeonameId: true } p)
                foreach (int i in g.Members) linkedAt[i] = p;
        foreach (var g in byKey.Values)
            if (Placeable(mentions[g.Members[0]]) && SettingOf(g.Members.Min(), mentions, linkedAt) is { } setting)
            {
                g.Place = setting;
                g.KeepsSpokenName = true;
                g.PlaceFromContext = true;
            }
    }

    /// <summary>Whether the talk may place a name the gazetteer lacks: not a continent, nor a lone
    /// listed first name (a person read as a place must not get a map point).</summary>
    private bool Placeable(Mention m) =>
        !lexicon.IsWorldRegion(m.Text, m.Language) && !(Words(m.Text).Length == 1 && lexicon.IsFirstName(m.Text));

    /// <summary>How many turns back the talk's last linked place still sets the scene for a place the
    /// gazetteer lacks.</summary>
    public const int SettingTurns = 2;

    /// <summary>The place the talk was last at before mention <paramref name="first"/> (a town or
    /// country linked by name, in its turn or at most <see cref="SettingTurns"/> turns before): a
    /// district, street, park or village the gazetteer lacks is shown there ("in Podgórze, across the
    /// river" after Kraków), marked as placed by context.</summary>
    private static PlaceLink? SettingOf(int first, ImmutableArray<Mention> mentions, Dictionary<int, PlaceLink> linkedAt)
    {
        int turn = mentions[first].Turn.Index;
        for (int j = first - 1; j >= 0 && mentions[j].Turn.Index >= turn - SettingTurns; j--)
            if (linkedAt.TryGetValue(j, out var place)) return place;
        return null;
    }

    /// <summary>The place a LOC mention is linked to. A first-level region of the name (which the lists
    /// give no population) is chosen over towns reached only through another of their names: Veneto
    /// is not Venice, New Jersey not Three Rivers, Michigan. A town keeps precedence when the name said
    /// is its own name and it lies in the region's country or the interview's places point to its
    /// country or it is a city of <see cref="OwnNameCityPopulation"/> people or more (Manchester), unless they
    /// point to the region's country only (Murcia, not Asturias, PH), when it has <see cref="MetropolisPopulation"/> people or more (New
    /// York beside the state), or when its own name also names the region (Wien, the city-state); a
    /// country of the name does too (Georgia). Otherwise the <see cref="PlaceScore"/> decides, among
    /// regions the interview's countries only.</summary>
    private PlaceLink Choose(Mention m, ImmutableArray<PlaceLink> places, Dictionary<string, int> evidence, int evidenceTotal)
    {
        string said = Key(m.Text, m.Language);
        var regions = places.Where(p => p.Region is not null).ToList();
        var towns = places.Where(p => p.Region is null).ToList();
        // A town named so in its own right keeps precedence over a region of the name when it lies in
        // that region's country (Salzburg, Murcia: the namesake town) or the interview's other places
        // point to its country; a town abroad does not (Asturias, PH is not the Spanish region). And
        // it yields when those places lie in a region's country and none in its own.
        bool regionBacked = regions.Any(r => evidence.ContainsKey(r.Country))
            && !towns.Any(p => Key(p.Name, m.Language) == said && evidence.ContainsKey(p.Country));
        bool townFirst = regions.Count == 0 || towns.Any(p => p.GeonameId < 0 || p.Population >= MetropolisPopulation
            || Key(p.Name, m.Language) == said && !regionBacked
                && (regions.Any(r => r.Country == p.Country) || evidence.ContainsKey(p.Country) || p.Population >= OwnNameCityPopulation)
            || lexicon.Places(p.Name, m.Language).Any(r => r.Region is not null && r.Country == p.Country && regions.Any(x => x.Region == r.Region)));
        return (townFirst ? towns : regions)
            .OrderByDescending(p => PlaceScore(p, Key(p.Name, m.Language) == said, evidence, evidenceTotal))
            .ThenBy(p => p.GeonameId).ThenBy(p => p.Key, StringComparer.Ordinal)
            .First();
    }

    /// <summary>Whether a listed historical region or state is meant rather than a modern place of the
    /// name. A modern country of the name gives way only to a historical state, and only when the
    /// interview's other places lie in a country holding it (Palestine beside Haifa is the Mandate, not
    /// the State of Palestine; Polish "Czechy" stays Czechia, though Bohemia is also so called). A town
    /// gives way when its own name is not the name said (Galicia is not Galich, RU), or when the other
    /// places lie in a country holding the region. Otherwise the modern place stands (Galicia in a
    /// Spanish story).</summary>
    private bool Historical(ListedPlace spoken, Mention m, ImmutableArray<PlaceLink> places, Dictionary<string, int> evidence)
    {
        bool inCountry = spoken.Countries.Any(evidence.ContainsKey);
        if (places.Any(p => p.GeonameId < 0)) return spoken.Kind == "state" && inCountry;
        return inCountry || places.All(p => Key(p.Name, m.Language) != Key(m.Text, m.Language));
    }

    /// <summary>Persons, merged only on certain evidence. A full name (two or more words) joins a
    /// heading whose surname has its spelling key (Szwarc / Schwarz, Feigl / Feigel) and whose given
    /// name is the same, a diminutive of the same full name (Hanka / Hanna) or a listed equivalent
    /// (Stanisław / Stanley: with the same surname, two pieces of evidence); a woman's surname form
    /// and its family form (Eva Kleinová / Eve Klein) only with the very given name or a listed
    /// equivalent. A surname after particles ("Van den Berg") is a one-word name. A one-word name joins the
    /// one full-name heading having it as first or last word (of several, the one whose first word is a
    /// listed first name, when only one is), else the one whose given name it is a
    /// diminutive of (Irenko / Irena Kowalczyk); one-word names that are diminutives of each other
    /// join (Ilona / Ilonka). A one-word name several full names have as a word joins the one of them
    /// that names a speaker of the interview ("Mister Lindner" beside Walter and Samuel Lindner, said
    /// to WALTER): <see cref="SpeakerOwner"/>. A one-word name that is only a listed equivalent of
    /// another heading's given name (Stanisław beside Stanley Kowalczyk) is a probable link: it is
    /// merged only when that is the one heading it could mean and the interview ties the two, saying
    /// them in one turn at most <see cref="TieWords"/> words apart ("Stanisław, he became Stanley.
    /// Stanley Kowalczyk"), or at most <see cref="TieReachWords"/> with no other person named between; otherwise both headings name each other as "possibly the same person".
    /// A full name whose first word is no listed first name is read as a nickname before a surname
    /// ("El Gordo Gallardo, they called him"): it joins the one full name with that surname and a
    /// listed first name when the two are said at most <see cref="TieWords"/> words apart in one turn,
    /// and is otherwise only possibly that person. Two listed first names with one surname are two
    /// persons (siblings) and never merge this way. A given name with a patronymic ("Ivan Petrovych")
    /// joins the one full name with that given name and patronymic ("Ivan Petrovych Hnatyuk"), and is
    /// otherwise possibly the one full name with that given name. A two-word name said family name
    /// first ("Weisz Sándor") is read given name first (<see cref="FamilyNameFirst"/>).</summary>
    private void GroupPersons(ImmutableArray<Mention> mentions, string[] keys, bool[] held, List<Group> groups, ImmutableArray<Turn> turns)
    {
        var byKey = new Dictionary<string, Group>(StringComparer.Ordinal);
        var full = new List<(Group Group, string First, string Last, LanguageCode Language, string Surname, string? Middle)>();
        var single = new List<int>();
        var patronymic = new List<(int Index, string[] Words)>();
        var forms = new HashSet<(Group, string, string)>();
        void AddFull(int i, string[] words)
        {
            var m = mentions[i];
            string first = words[0], last = words[^1], surname = lexicon.SurnameKey(last, m.Language);
            var known = full.FirstOrDefault(f => f.Surname == surname
                && (lexicon.SameGivenName(f.First, f.Language, first, m.Language) || lexicon.EquivalentGivenNames(f.First, first)));
            // A woman's surname beside the family form (Eva Kleinová / Eve Klein abroad) only with the
            // very given name or a listed equivalent, never a stem or diminutive: Jan Novák and Jana
            // Nováková are two people.
            if (known.Group is null)
                known = full.FirstOrDefault(f => f.Surname != surname && lexicon.SameFamilyName(f.Last, f.Language, last, m.Language)
                    && (lexicon.Key(f.First, LanguageCode.Undetermined) == lexicon.Key(first, LanguageCode.Undetermined) || lexicon.EquivalentGivenNames(f.First, first)));
            var group = known.Group;
            if (group is not null) group.Members.Add(i);
            else group = Add(byKey, groups, NameLabel.PER, lexicon.Key(first, m.Language) + " " + lexicon.Key(last, m.Language), i);
            // Every full form a person is named by is kept, so a one-word name meets any of them ("Bill"
            // after "Vasilis Georgiou ... Here he was Bill Georgiou").
            if (forms.Add((group, first, last))) full.Add((group, first, last, m.Language, surname, words.Length > 2 ? words[1] : null));
        }

        var bySecond = NamesBySecondWord(mentions, held);
        for (int i = 0; i < mentions.Length; i++)
        {
            if (held[i] || mentions[i].Label != NameLabel.PER) continue;
            var words = Words(mentions[i].Text);
            if (words.Length < 2 || SurnameAfterParticles(words)) single.Add(i);
            else if (words.Length == 2 && LanguageProfiles.Default.IsPatronymic(words[1], CaseLetters)) patronymic.Add((i, words));
            else AddFull(i, FamilyNameFirst(words, mentions[i].Language, bySecond) ? [words[1], words[0]] : words);
        }

        var patronymicNames = new List<(Group Group, string First, string Last, LanguageCode Language, string Surname, string? Middle)>();
        // A patronymic-looking second word that some full name has as its surname is that surname
        // (Rabinovich, Abramovich are surnames too).
        foreach (var (i, words) in patronymic)
        {
            var m = mentions[i];
            if (full.Any(f => f.Surname == lexicon.SurnameKey(words[1], m.Language))) { AddFull(i, words); continue; }
            var sameGiven = full.Where(f => lexicon.SameGivenName(f.First, f.Language, words[0], m.Language)).ToList();
            var named = sameGiven.Where(f => f.Middle is not null && lexicon.Key(f.Middle, f.Language) == lexicon.Key(words[1], m.Language)).Select(f => f.Group).Distinct().ToList();
            if (named is [var owner]) { owner.Members.Add(i); continue; }
            var group = Add(byKey, groups, NameLabel.PER, lexicon.Key(words[0], m.Language) + " " + lexicon.Key(words[1], m.Language), i);
            if (group.Members.Count > 1) continue;
            if (sameGiven.Select(f => f.Group).Distinct().ToList() is [var only])
            {
                group.Possible.Add(only);
                only.Possible.Add(group);
            }
            patronymicNames.Add((group, words[0], words[1], m.Language, lexicon.SurnameKey(words[1], m.Language), null));
        }
        // Now a name a lone given name or patronymic may belong to.
        full.AddRange(patronymicNames);

        TurnPositions? persons = null;
        List<HashSet<string>>? speakers = null;
        var namesSpeaker = new Dictionary<Group, bool>();
        var lone = new List<(Group Group, string Name, LanguageCode Language)>();
        var loneByKey = new Dictionary<string, Group>(StringComparer.Ordinal);
        // The full names a one-word name may belong to, worked out once per distinct text and language.
        var ownersOf = new Dictionary<(string, LanguageCode, char?), List<Group>>();
        var relations = new Dictionary<Group, string?>();
        string? RelationOf(Group g)
        {
            if (!relations.TryGetValue(g, out var relation))
                relations[g] = relation = g.Members.Order().Take(FirstMentionsSearched).Select(k => RelationBefore(mentions[k], turns)).FirstOrDefault(r => r is not null);
            return relation;
        }
        // A father and a son of one given name: "My father, Stanisław Zieliński ... I had one brother.
        // Stanisław" names two persons, and so does a short form said beside the brother ("Staś").
        bool RelationsDiffer(Group owner, Mention m)
        {
            if (RelationOf(owner) is not { } theirs) return false;
            if (RelationBefore(m, turns) is { } own && own != theirs) return true;
            return lone.Any(l => l.Group.Members.Count > 0 && lexicon.SameGivenName(l.Name, l.Language, m.Text, m.Language)
                && RelationOf(l.Group) is { } other && other != theirs);
        }
        var ownSpeakerHeading = new Dictionary<string, Group?>(StringComparer.Ordinal);
        HashSet<(Group, string)>? wentBy = null;
        // The title (and the sex it gives) of a one-word heading's first titled name ("Herr Huber"):
        // "Frau Huber" is his wife.
        var loneTitle = new Dictionary<Group, (string Title, char Sex)>();
        bool SexDiffers(Group g, char? sex) => sex is { } s && loneTitle.TryGetValue(g, out var own) && own.Sex != s;
        // Candidates by shared key, so each one-word name is compared with the few full and one-word
        // names it can match, not with all of them: a long turn of many names stayed quadratic otherwise.
        // A name word and a full name's first or last word are one name only with equal grouping or
        // surname keys in the language of either (SameNameWord, SameSurname); given names, only in a
        // shared bucket (IHeadingLexicon.GivenNameBuckets).
        var fullLanguages = full.Select(f => f.Language).Distinct().ToList();
        var fullByKey = new Dictionary<(LanguageCode, string), List<int>>();
        var indexedLanguages = new HashSet<LanguageCode>();
        void Index<TKey>(Dictionary<TKey, List<int>> index, TKey key, int k) where TKey : notnull
        {
            if (!index.TryGetValue(key, out var list)) index[key] = list = [];
            if (list.Count == 0 || list[^1] != k) list.Add(k);
        }
        IEnumerable<string> WordKeys(string word, LanguageCode language) => [lexicon.Key(word, language), "\u0001" + lexicon.SurnameKey(word, language)];
        List<int> WordCandidates(string word, LanguageCode language)
        {
            foreach (var l in fullLanguages.Append(language).Distinct())
                if (indexedLanguages.Add(l))
                {
                    for (int k = 0; k < full.Count; k++)
                        foreach (var key in WordKeys(full[k].First, l).Concat(WordKeys(full[k].Last, l))) Index(fullByKey, (l, key), k);
                }
            var found = new SortedSet<int>();
            foreach (var l in fullLanguages.Append(language).Distinct())
                foreach (var key in WordKeys(word, l))
                    if (fullByKey.TryGetValue((l, key), out var list)) found.UnionWith(list);
            return [.. found];
        }
        Dictionary<string, List<int>>? fullByBucket = null;
        List<int> GivenCandidates(string name, LanguageCode language)
        {
            if (fullByBucket is null)
            {
                fullByBucket = new Dictionary<string, List<int>>(StringComparer.Ordinal);
                for (int k = 0; k < full.Count; k++)
                    foreach (var bucket in lexicon.GivenNameBuckets(full[k].First, full[k].Language)) Index(fullByBucket, bucket, k);
            }
            var found = new SortedSet<int>();
            foreach (var bucket in lexicon.GivenNameBuckets(name, language))
                if (fullByBucket.TryGetValue(bucket, out var list)) found.UnionWith(list);
            return [.. found];
        }
        // One-word headings by bucket, the latest first when looked up (the last one of a given name is the one meant).
        var loneByBucket = new Dictionary<string, List<int>>(StringComparer.Ordinal);
        var bucketsOf = new Dictionary<(string, LanguageCode), List<string>>();
        List<string> Buckets(string name, LanguageCode language) =>
            bucketsOf.TryGetValue((name, language), out var known) ? known : bucketsOf[(name, language)] = [.. lexicon.GivenNameBuckets(name, language)];
        void AddLone((Group Group, string Name, LanguageCode Language) entry)
        {
            lone.Add(entry);
            foreach (var bucket in Buckets(entry.Name, entry.Language)) Index(loneByBucket, bucket, lone.Count - 1);
        }
        // Worked out again only when a one-word heading was added since: a long turn says the same few names 100k times.
        var loneCandidates = new Dictionary<(string, LanguageCode), (int Count, int[] Latest)>();
        int[] LoneCandidates(string name, LanguageCode language)
        {
            if (loneCandidates.TryGetValue((name, language), out var known) && known.Count == lone.Count) return known.Latest;
            var found = new SortedSet<int>();
            foreach (var bucket in Buckets(name, language))
                if (loneByBucket.TryGetValue(bucket, out var list)) found.UnionWith(list);
            int[] latest = [.. found.Reverse()];
            loneCandidates[(name, language)] = (lone.Count, latest);
            return latest;
        }
        foreach (int i in single)
        {
            var m = mentions[i];
            // "Our daughter we named Maria, for my mother": a new person, whom later short forms of the
            // name join (the last one-word heading of a given name is the one meant).
            if (m.CharStart > 0 && lexicon.NamedBefore(turns[m.Turn.Index].Text[Math.Max(0, m.CharStart - NamingChars)..m.CharStart]))
            {
                AddLone((Add(loneByKey, groups, NameLabel.PER, keys[i] + " " + i, i), m.Text, m.Language));
                continue;
            }
            var title = TitleBefore(m, turns);
            char? sex = title?.Sex;
            if (!ownersOf.TryGetValue((m.Text, m.Language, sex), out var owners))
            {
                // A surname after its particles ("Mrs. Van den Berg") is matched by its last word.
                string word = Words(m.Text)[^1];
                // A surname key is the word's key with spelling folds on top, so it also meets the plain key.
                owners = WordCandidates(word, m.Language).Select(k => full[k]).Where(f => SameNameWord(f.First, f.Language, word, m.Language)
                        || SameSurname(f.Last, f.Language, word, m.Language) && !lexicon.WomansAndMansForm(f.Last, word))
                    .Select(f => f.Group).Distinct().ToList();
                if (owners.Count == 0)
                {
                    owners = GivenCandidates(m.Text, m.Language).Select(k => full[k])
                        .Where(f => lexicon.SameGivenName(f.First, f.Language, m.Text, m.Language)).Select(f => f.Group).Distinct().ToList();
                    // A short form of two full names ("Takis": Panagiotis or Dimitrios) said beside a
                    // one-word name of the other one belongs to neither full name by the lists alone.
                    if (owners.Count > 0 && lone.Any(l => l.Group.Members.Count > 0 && lexicon.SameGivenName(l.Name, l.Language, m.Text, m.Language)
                            && !full.Any(f => owners.Contains(f.Group) && lexicon.SameGivenName(f.First, f.Language, l.Name, l.Language))))
                        owners = [];
                }
                if (owners.Count > 1 && owners.Where(g => full.Any(f => f.Group == g && GivenName(f.First))).ToList() is [var named]) owners = [named];
                if (owners.Count > 1 && SpeakerOwner(owners, mentions, speakers ??= SpeakerWords(turns), namesSpeaker) is { } speaker) owners = [speaker];
                // "Mrs. Hrytsenko" is not Stepan Hrytsenko, nor "Mr. Roth" Eva Roth: a title's sex
                // against the given names' leaves the one it can be, or none (his wife, her husband).
                if (sex is { } s)
                    owners = owners.Where(g => full.Where(f => f.Group == g).Any(f => lexicon.GivenNameSex(f.First) is not { } given || given == s)).ToList();
                ownersOf[(m.Text, m.Language, sex)] = owners;
            }
            // Nobody calls themselves "Pani Kwiatkowska": a titled surname several full names bear is not
            // the one naming the turn's speaker, nor a name she says she went by (Marysia Kwiatkowska).
            if (title is not null && owners.Count > 1 && turns[m.Turn.Index].Speaker is { } talking)
            {
                var self = SpeakerHeading(talking, mentions, groups, ownSpeakerHeading);
                var others = owners.Where(g => g != self && !(wentBy ??= NamesWentBy(mentions, turns, full)).Contains((g, talking))).ToList();
                if (others.Count > 0) owners = others;
            }
            if (owners.Count == 1 && RelationsDiffer(owners[0], m)) owners = [];
            if (owners.Count == 1) { owners[0].Members.Add(i); continue; }
            if (owners.Count == 0 && LoneCandidates(m.Text, m.Language).Select(k => lone[k]).FirstOrDefault(l => lexicon.SameGivenName(l.Name, l.Language, m.Text, m.Language)
                    && !lexicon.WomansAndMansForm(l.Name, m.Text) && !SexDiffers(l.Group, sex)) is { Group: not null } kin)
            {
                kin.Group.Members.Add(i);
                continue;
            }
            // Novotná and Novotný share a stem but are a wife and a husband: the later form gets a key of its own.
            string key = loneByKey.TryGetValue(keys[i], out var same) && lone.Any(l => l.Group == same && lexicon.WomansAndMansForm(l.Name, m.Text))
                ? keys[i] + " " + lexicon.SurnameKey(m.Text, LanguageCode.Undetermined) : keys[i];
            // So are "Herr Huber" and "Frau Huber": two headings, each shown with its title.
            bool split = loneByKey.TryGetValue(key, out var titled) && SexDiffers(titled, sex);
            if (split) key += " " + sex;
            var group = Add(loneByKey, groups, NameLabel.PER, key, i);
            if (group.Members.Count == 1) AddLone((group, m.Text, m.Language));
            if (title is { } t) loneTitle.TryAdd(group, t);
            if (split)
            {
                titled!.Title = loneTitle[titled].Title;
                group.Title = title!.Value.Title;
            }
        }

        foreach (var nick in full.Where(f => !GivenName(f.First)).ToList())
        {
            var named = full.Where(f => f.Group != nick.Group && f.Surname == nick.Surname && GivenName(f.First)).Select(f => f.Group).Distinct().ToList();
            if (named is not [var only]) continue;
            if (Tied(nick.Group, only, mentions, turns, persons ??= PersonPositions(mentions), TieWords))
            {
                MergeInto(nick.Group, only, groups);
                full.Remove(nick);
                continue;
            }
            nick.Group.Possible.Add(only);
            only.Possible.Add(nick.Group);
        }

        JoinBirthNames(mentions, held, groups, turns, full);
        JoinMarriedNames(mentions, groups, turns, full);
        JoinGivenNames(mentions, groups, turns);
        JoinNamesWentBy(mentions, groups, turns);
        JoinNamesBecame(mentions, groups, turns);

        foreach (var l in lone)
        {
            if (l.Group.Members.Count == 0) continue;
            var probable = full.Where(f => lexicon.EquivalentGivenNames(f.First, l.Name)).Select(f => f.Group)
                .Concat(lone.Where(o => o.Group != l.Group && o.Group.Members.Count > 0 && lexicon.EquivalentGivenNames(o.Name, l.Name)).Select(o => o.Group))
                .Distinct().ToList();
            if (probable is [var only] && full.Any(f => f.Group == only) && !(RelationOf(only) is { } theirs && RelationOf(l.Group) is { } own && own != theirs)
                && Tied(l.Group, only, mentions, turns, persons ??= PersonPositions(mentions), TieReachWords))
            {
                MergeInto(l.Group, only, groups);
                continue;
            }
            foreach (var other in probable)
            {
                l.Group.Possible.Add(other);
                other.Possible.Add(l.Group);
            }
        }
    }

    /// <summary>Whether a two-word name is said family name first (Hungarian "Weisz Sándor", a
    /// list's "Kowalski Jan"): its first word is no given name, and its second is one or the interview
    /// also says the two words the other way round ("Grünfeld Tibort" beside "Tibor Grünfeld", where
    /// the case ending hides the given name from the lists).</summary>
    private bool FamilyNameFirst(string[] words, LanguageCode language, Dictionary<string, List<(string First, LanguageCode Language)>> bySecond)
    {
        if (words.Length != 2 || GivenName(words[0])) return false;
        if (GivenName(words[1])) return true;
        return new[] { lexicon.Key(words[0], language), lexicon.Key(words[0], LanguageCode.Undetermined) }.Distinct()
            .Any(key => bySecond.TryGetValue(key, out var firsts) && firsts.Any(f => lexicon.SameGivenName(f.First, f.Language, words[1], language)));
    }

    /// <summary>The first words of the two-word person names by the key of their second word (in the
    /// mention's language and in none), for finding a name said both ways round without comparing every pair.</summary>
    private Dictionary<string, List<(string First, LanguageCode Language)>> NamesBySecondWord(ImmutableArray<Mention> mentions, bool[] held)
    {
        var bySecond = new Dictionary<string, List<(string, LanguageCode)>>(StringComparer.Ordinal);
        foreach (var (text, language) in Enumerable.Range(0, mentions.Length)
            .Where(i => !held[i] && mentions[i].Label == NameLabel.PER).Select(i => (mentions[i].Text, mentions[i].Language)).Distinct())
        {
            var words = Words(text);
            if (words.Length != 2) continue;
            foreach (var key in new[] { lexicon.Key(words[1], language), lexicon.Key(words[1], LanguageCode.Undetermined) }.Distinct())
            {
                if (!bySecond.TryGetValue(key, out var firsts)) bySecond[key] = firsts = [];
                firsts.Add((words[0], language));
            }
        }
        return bySecond;
    }

    /// <summary>Whether two name words are one name: equal keys when both are read in the language of
    /// either. A name said in a Slovak and in an English sentence stems differently ("Hudecová" is
    /// hudecov in Slovak, hudecova in English), yet it is the same word.</summary>
    private bool SameNameWord(string a, LanguageCode languageA, string b, LanguageCode languageB) =>
        lexicon.Key(a, languageA) == lexicon.Key(b, languageA) || lexicon.Key(a, languageB) == lexicon.Key(b, languageB);

    /// <summary><see cref="SameNameWord"/> with surname spelling keys (Szwarc / Schwarz).</summary>
    private bool SameSurname(string a, LanguageCode languageA, string b, LanguageCode languageB) =>
        lexicon.SurnameKey(a, languageA) == lexicon.SurnameKey(b, languageA) || lexicon.SurnameKey(a, languageB) == lexicon.SurnameKey(b, languageB);

    /// <summary>A surname after name particles only ("Van den Berg", "de Vries"): a one-word name,
    /// not a given name and a surname.</summary>
    private static bool SurnameAfterParticles(string[] words) =>
        words.Length > 1 && words[..^1].All(w => LanguageProfiles.Default.NameParticles.Contains(w.ToLowerInvariant()));

    /// <summary>Chars before a name searched for a birth-name marker ("nazwisko panieńskie, ").</summary>
    private const int MarkerChars = 32;

    /// <summary>A name after a birth-name marker ("Anna Nowak, z domu Wiśniewska"; "I was born Ruth
    /// Stein") is the woman named before it under the name she was born with. A surname alone joins
    /// the nearest full name, or given name not listed for men, before it in its turn, at most <see cref="TieWords"/> words back; a full
    /// name joins the one full name of another surname with her given name (the same name, a
    /// diminutive or a listed equivalent), its heading's other mentions with it.</summary>
    private void JoinBirthNames(ImmutableArray<Mention> mentions, bool[] held, List<Group> groups, ImmutableArray<Turn> turns,
        List<(Group Group, string First, string Last, LanguageCode Language, string Surname, string? Middle)> full)
    {
        Dictionary<int, Group>? groupOf = null;
        for (int i = 0; i < mentions.Length; i++)
        {
            var m = mentions[i];
            if (held[i] || m.Label != NameLabel.PER || m.CharStart == 0) continue;
            var text = turns[m.Turn.Index].Text;
            int from = Math.Max(0, m.CharStart - MarkerChars);
            if (!lexicon.EndsWithBirthNameMarker(text[from..m.CharStart])) continue;
            groupOf ??= groups.Where(g => g.Label == NameLabel.PER).SelectMany(g => g.Members.Select(k => (k, g))).ToDictionary(x => x.k, x => x.g);
            if (!groupOf.TryGetValue(i, out var own)) continue;
            var words = Words(m.Text);
            if (words.Length > 1)
            {
                var hers = full.Where(f => f.Group != own && groups.Contains(f.Group) && f.Surname != lexicon.SurnameKey(words[^1], m.Language)
                    && (lexicon.SameGivenName(f.First, f.Language, words[0], m.Language) || lexicon.EquivalentGivenNames(f.First, words[0])))
                    .Select(f => f.Group).Distinct().ToList();
                if (hers is not [var woman]) continue;
                foreach (int k in own.Members) groupOf[k] = woman;
                MergeInto(own, woman, groups);
                full.RemoveAll(f => f.Group == own);
                continue;
            }
            // The woman named before: a full name, or a given name not listed for men ("Berta, rozená Fischerová").
            int before = Enumerable.Range(0, i).Reverse().TakeWhile(j => mentions[j].Turn == m.Turn)
                .FirstOrDefault(j => !held[j] && mentions[j].Label == NameLabel.PER
                    && (Words(mentions[j].Text).Length > 1 || lexicon.GivenNameSex(mentions[j].Text) != 'm'), -1);
            if (before < 0 || !groupOf.TryGetValue(before, out var named) || named == own
                || Words(text[mentions[before].CharEnd..m.CharStart]).Length > TieWords) continue;
            own.Members.Remove(i);
            if (own.Members.Count == 0) groups.Remove(own);
            named.Members.Add(i);
            groupOf[i] = named;
        }
    }

    /// <summary>A woman's married name ("Eve Klein, and later Eve Stern, when she married"; "I married
    /// Nikos Pappas ... Here I was Helen Pappas") joins the one person with her given name (the same,
    /// a short form or a listed equivalent) and another family name, when the talk says it is a
    /// marriage: a word of marriage (Languages/*/marriage-words.txt) at most <see cref="TieReachWords"/>
    /// words from one of the name's first <see cref="FirstMentionsSearched"/> mentions in its turn, or a person of that surname and another given name said at
    /// most <see cref="TieWords"/> words from such a word (the husband). A name said right after a
    /// kinship word ("my cousin Ruth Stein") is a relative, never the woman under another name.</summary>
    private void JoinMarriedNames(ImmutableArray<Mention> mentions, List<Group> groups, ImmutableArray<Turn> turns,
        List<(Group Group, string First, string Last, LanguageCode Language, string Surname, string? Middle)> full)
    {
        var married = new Dictionary<(int, int), bool>();
        bool Near(int i, int words)
        {
            if (!married.TryGetValue((i, words), out bool near))
            {
                var m = mentions[i];
                var text = turns[m.Turn.Index].Text;
                var before = Words(text[Math.Max(0, m.CharStart - MarriageReachChars)..m.CharStart]).TakeLast(words);
                var after = Words(text[m.CharEnd..Math.Min(text.Length, m.CharEnd + MarriageReachChars)]).Take(words);
                married[(i, words)] = near = lexicon.SpeaksOfMarriage(before.Concat(after));
            }
            return near;
        }
        // "my cousin Ruth Stein" is a relative of the speaker, not the speaker under another name.
        bool AfterKin(int i)
        {
            var m = mentions[i];
            var before = Words(turns[m.Turn.Index].Text[Math.Max(0, m.CharStart - MarkerChars)..m.CharStart]);
            return before.Length > 0 && lexicon.IsKinshipWord(before[^1].Trim(',', ':'));
        }
        foreach (var b in full.ToList())
        {
            if (!groups.Contains(b.Group)) continue;
            var hers = full.Where(a => a.Group != b.Group && groups.Contains(a.Group) && !lexicon.SameFamilyName(a.Last, a.Language, b.Last, b.Language)
                    && (lexicon.SameGivenName(a.First, a.Language, b.First, b.Language) || lexicon.EquivalentGivenNames(a.First, b.First)))
                .Select(a => a.Group).Distinct().ToList();
            if (hers is not [var woman] || woman.Members.Concat(b.Group.Members).Any(AfterKin)) continue;
            bool said = b.Group.Members.Take(FirstMentionsSearched).Any(i => Near(i, TieReachWords));
            bool husband = !said && full.Any(s => s.Group != b.Group && s.Group != woman && groups.Contains(s.Group) && s.Surname == b.Surname
                && !lexicon.SameGivenName(s.First, s.Language, b.First, b.Language) && s.Group.Members.Take(FirstMentionsSearched).Any(i => Near(i, TieWords)));
            if (!said && !husband) continue;
            MergeInto(b.Group, woman, groups);
            full.RemoveAll(f => f.Group == b.Group);
        }
    }

    /// <summary>A one-word name given by a naming phrase (Languages/*/naming-phrases.tsv) at one of its
    /// first <see cref="FirstMentionsSearched"/> mentions is the person the phrase names, when it heads nothing but one-word names: the speaker ("Doma mi říkali
    /// Grete", said by Markéta) or the person said last before it in the turn, at most
    /// <see cref="TieWords"/> words back ("One brother, Jozef. We called him Jožko").</summary>
    private void JoinGivenNames(ImmutableArray<Mention> mentions, List<Group> groups, ImmutableArray<Turn> turns)
    {
        var groupOf = groups.Where(g => g.Label == NameLabel.PER).SelectMany(g => g.Members.Select(k => (k, g))).ToDictionary(x => x.k, x => x.g);
        // Whether a heading holds only one-word names, worked out once per heading.
        var oneWord = new Dictionary<Group, bool>();
        // The heading naming each speaker (every word of the label a word of one of its full names), once per label.
        var speakerHeading = new Dictionary<string, Group?>(StringComparer.Ordinal);
        var searched = new Dictionary<Group, int>();
        foreach (var (i, own) in groupOf.OrderBy(x => x.Key).ToList())
        {
            if (!groups.Contains(own)) continue;
            int seen = searched.GetValueOrDefault(own);
            if (seen >= FirstMentionsSearched) continue;
            searched[own] = seen + 1;
            if (!oneWord.TryGetValue(own, out bool only)) oneWord[own] = only = own.Members.All(k => Words(mentions[k].Text).Length == 1);
            if (!only) continue;
            var m = mentions[i];
            var turn = turns[m.Turn.Index];
            var text = turn.Text;
            bool? self = lexicon.NamingPhraseAround(text[Math.Max(0, m.CharStart - NamingChars)..m.CharStart], text[m.CharEnd..Math.Min(text.Length, m.CharEnd + NamingChars)]);
            if (self is null) continue;
            Group? target;
            if (self.Value)
            {
                if (turn.Speaker is null) continue;
                target = SpeakerHeading(turn.Speaker, mentions, groups, speakerHeading);
            }
            else
            {
                // The person said last before; when that is the name's own heading, the two are joined already.
                int before = Enumerable.Range(0, i).Reverse().TakeWhile(j => mentions[j].Turn == m.Turn)
                    .FirstOrDefault(j => groupOf.TryGetValue(j, out var g) && groups.Contains(g), -1);
                target = before >= 0 && groupOf[before] != own && Words(text[mentions[before].CharEnd..m.CharStart]).Length <= TieWords ? groupOf[before] : null;
            }
            if (target is null || !groups.Contains(target)) continue;
            foreach (int k in own.Members) groupOf[k] = target;
            oneWord.Remove(target);
            MergeInto(own, target, groups);
        }
    }

    /// <summary>The heading naming a speaker (every word of the label a word of one of its full names),
    /// when exactly one does; looked up once per label.</summary>
    private Group? SpeakerHeading(string label, ImmutableArray<Mention> mentions, List<Group> groups, Dictionary<string, Group?> cache)
    {
        if (cache.TryGetValue(label, out var found) && (found is null || groups.Contains(found))) return found;
        var speaker = SpeakerKeys(label);
        var named = groups.Where(g => g.Label == NameLabel.PER && g.Members.Any(k => Words(mentions[k].Text) is { Length: > 1 } w
            && speaker.IsSubsetOf(w.Select(x => lexicon.Key(x, LanguageCode.Undetermined))))).ToList();
        return cache[label] = named is [var one] ? one : null;
    }

    /// <summary>The full-name headings a speaker says she went by ("For two years I was Marysia
    /// Kwiatkowska"), with the speaker's label: looked for at each heading's first mentions.</summary>
    private HashSet<(Group, string)> NamesWentBy(ImmutableArray<Mention> mentions, ImmutableArray<Turn> turns,
        List<(Group Group, string First, string Last, LanguageCode Language, string Surname, string? Middle)> full)
    {
        var found = new HashSet<(Group, string)>();
        foreach (var g in full.Select(f => f.Group).Distinct())
            foreach (int i in g.Members.Order().Take(FirstMentionsSearched))
            {
                var m = mentions[i];
                var turn = turns[m.Turn.Index];
                if (turn.Speaker is not { } speaker) continue;
                var text = turn.Text;
                if (lexicon.SpeakerWentBy(text[Math.Max(0, m.CharStart - NamingChars)..m.CharStart], text[m.CharEnd..Math.Min(text.Length, m.CharEnd + NamingChars)]))
                    found.Add((g, speaker));
            }
        return found;
    }

    /// <summary>The title right before a name, as said, with the sex it gives the name ("Frau Huber",
    /// "Mrs. Roth"); null for none or one of either sex ("Dr.").</summary>
    private (string Title, char Sex)? TitleBefore(Mention m, ImmutableArray<Turn> turns)
    {
        // Scanned in place: a long turn has hundreds of thousands of one-word names.
        var text = turns[m.Turn.Index].Text;
        int end = m.CharStart;
        while (end > 0 && char.IsWhiteSpace(text[end - 1])) end--;
        if (end == m.CharStart || end == 0) return null;
        int start = end;
        while (start > 0 && !char.IsWhiteSpace(text[start - 1])) start--;
        var word = text[start..end];
        return lexicon.TitleSex(word) is { } sex ? (word, sex) : null;
    }

    /// <summary>Words that join two names, not a kinship word to its name ("my father and Stanisław"):
    /// "and" in the languages of the kinship lists.</summary>
    private static readonly HashSet<string> Conjunctions = new(StringComparer.Ordinal) { "and", "und", "i", "a", "y", "e", "et", "en", "és", "и", "та", "oraz", "och", "og", "ve", "ir", "un", "και" };

    /// <summary>The relation a kinship word right before a name gives it ("my brother Yasha", "I had one
    /// brother. Stanisław", "My father was Yankl Rabinovich": one lower-case word between at most), or null
    /// (also after a possessive: "my father's brother, Max Brauner").</summary>
    private string? RelationBefore(Mention m, ImmutableArray<Turn> turns)
    {
        var before = Words(turns[m.Turn.Index].Text[Math.Max(0, m.CharStart - MarkerChars)..m.CharStart]);
        for (int k = before.Length - 1; k >= Math.Max(0, before.Length - 2); k--)
        {
            var word = before[k].Trim(',', ':', '.', ';', '—', '-');
            if (word.Length == 0) return null;
            // "my mother's brother, Joaquim Sousa" is an uncle: a relation of someone else is none here.
            if (lexicon.KinshipRole(word) is { } relation) return k > 0 && (before[k - 1].EndsWith("'s", StringComparison.Ordinal) || before[k - 1].EndsWith("’s", StringComparison.Ordinal)) ? null : relation;
            // One short lower-case word may stand between, a copula ("was", "war", "był", "era"); a longer
            // one makes the kinship word part of another phrase ("pro babičku vždycky Heinrich", for grandma).
            if (k < before.Length - 1 || !char.IsLower(word[0]) || before[k].Length != word.Length || word.Length > CopulaLetters || Conjunctions.Contains(word)) return null;
        }
        return null;
    }

    /// <summary>Longest word taken for a copula between a kinship word and its name ("byla", "volt").</summary>
    private const int CopulaLetters = 4;

    /// <summary>A name said right after a went-by phrase (Languages/*/naming-phrases.tsv: "In Melbourne
    /// I was Angela Georgiou", "For two years I was Marysia Kwiatkowska") is one the speaker went by: its
    /// heading joins the speaker's, when every word it holds is a word of that name (so no other
    /// person it was grouped with comes along). Searched at a heading's first
    /// <see cref="FirstMentionsSearched"/> mentions.</summary>
    private void JoinNamesWentBy(ImmutableArray<Mention> mentions, List<Group> groups, ImmutableArray<Turn> turns)
    {
        var speakerHeading = new Dictionary<string, Group?>(StringComparer.Ordinal);
        foreach (var own in groups.Where(g => g.Label == NameLabel.PER).ToList())
        {
            if (!groups.Contains(own)) continue;
            foreach (int i in own.Members.Order().Take(FirstMentionsSearched).ToList())
            {
                var m = mentions[i];
                var turn = turns[m.Turn.Index];
                if (turn.Speaker is null) continue;
                var text = turn.Text;
                if (!lexicon.SpeakerWentBy(text[Math.Max(0, m.CharStart - NamingChars)..m.CharStart], text[m.CharEnd..Math.Min(text.Length, m.CharEnd + NamingChars)])) continue;
                var target = SpeakerHeading(turn.Speaker, mentions, groups, speakerHeading);
                if (target is null || target == own) break;
                var said = Words(m.Text);
                if (!own.Members.All(k => Words(mentions[k].Text).All(x => said.Any(w => SameNameWord(w, m.Language, x, mentions[k].Language)
                        || SameSurname(w, m.Language, x, mentions[k].Language))))) break;
                MergeInto(own, target, groups);
                break;
            }
        }
    }

    /// <summary>A name said right after a became phrase (Languages/*/naming-phrases.tsv: "There Rozica
    /// married Avram Segal, and she became Shoshana Segal"; "Tibor became Ted") is a new name of the
    /// phrase's subject: with a pronoun, the person said last before it in the turn, at most
    /// <see cref="TieReachWords"/> words back, whose given names or titles are not of the other sex
    /// (so not Avram); without one, the person said right before the phrase. Its heading joins the
    /// subject's when every word it holds is a word of the name said, as <see cref="JoinNamesWentBy"/>.</summary>
    private void JoinNamesBecame(ImmutableArray<Mention> mentions, List<Group> groups, ImmutableArray<Turn> turns)
    {
        // Each mention's person heading, made when a phrase is first met: an array, not a map, as a long
        // turn has half a million mentions and no such phrase may be said at all.
        Group?[]? groupOf = null;
        var sexOf = new Dictionary<Group, char?>();
        char? SexOf(Group g)
        {
            if (sexOf.TryGetValue(g, out var known)) return known;
            var sexes = g.Members.Order().Take(FirstMentionsSearched)
                .Select(k => TitleBefore(mentions[k], turns)?.Sex ?? lexicon.GivenNameSex(Words(mentions[k].Text)[0]))
                .OfType<char>().Distinct().ToList();
            return sexOf[g] = sexes is [var one] ? one : null;
        }
        foreach (var own in groups.Where(g => g.Label == NameLabel.PER).ToList())
        {
            if (!groups.Contains(own)) continue;
            foreach (int i in own.Members.Order().Take(FirstMentionsSearched).ToList())
            {
                var m = mentions[i];
                var text = turns[m.Turn.Index].Text;
                string before = text[Math.Max(0, m.CharStart - NamingChars)..m.CharStart], after = text[m.CharEnd..Math.Min(text.Length, m.CharEnd + NamingChars)];
                if (lexicon.SpeakerWentBy(before, after) || lexicon.BecameBefore(before, after) is not { } phrase) continue;
                if (groupOf is null)
                {
                    groupOf = new Group?[mentions.Length];
                    foreach (var g in groups.Where(g => g.Label == NameLabel.PER))
                        foreach (int k in g.Members) groupOf[k] = g;
                }
                Group? target = null;
                for (int j = i - 1; j >= 0 && mentions[j].Turn == m.Turn; j--)
                {
                    int gap = Words(text[mentions[j].CharEnd..m.CharStart]).Length;
                    if (gap > (phrase.Pronoun ? TieReachWords : BareSubjectWords)) break;
                    if (groupOf[j] is not { } g || g == own || !groups.Contains(g)) continue;
                    if (!phrase.Pronoun || SexOf(g) is not { } sex || sex == phrase.Sex) { target = g; break; }
                }
                if (target is null) break;
                var said = Words(m.Text);
                if (!own.Members.All(k => Words(mentions[k].Text).All(x => said.Any(w => SameNameWord(w, m.Language, x, mentions[k].Language)
                        || SameSurname(w, m.Language, x, mentions[k].Language))))) break;
                foreach (int k in own.Members) groupOf[k] = target;
                sexOf.Remove(target);
                MergeInto(own, target, groups);
                break;
            }
        }
    }

    /// <summary>Words between a became phrase without a pronoun and the name said, the phrase
    /// included: "Tibor became Ted" is one.</summary>
    private const int BareSubjectWords = 1;

    /// <summary>How many of a heading's mentions, in text order, are searched for a word of marriage or a
    /// naming phrase: a new name is explained where it first comes up, and a name said thousands of
    /// times in one long turn then costs no scan of them all.</summary>
    private const int FirstMentionsSearched = 50;

    /// <summary>Chars either side of a one-word name searched for a naming phrase.</summary>
    private const int NamingChars = 60;

    /// <summary>Chars either side of a name searched for a word of marriage: <see cref="TieReachWords"/>
    /// words of talk fit well within them.</summary>
    private const int MarriageReachChars = 400;

    /// <summary>Final letters a patronymic may carry as a case ending ("Ivana Petrovicha").</summary>
    private const int CaseLetters = 2;

    /// <summary>Whether a name's first word is a given name: a listed first name, or a given name or
    /// form the name-variant lists know ("Giorgos" is no nickname before Stavrou), that is no stop word
    /// or title of any language ("El" of "El Gordo Gallardo" is listed as a French first name).</summary>
    private bool GivenName(string word) =>
        (lexicon.IsFirstName(word) || lexicon.KnowsGivenName(word)) && !LanguageProfiles.Default.StopWords.Contains(word.ToLowerInvariant());

    /// <summary>Moves a group's mentions into another and drops it; "possibly the same person" links
    /// to the dropped group now point at the one that took its mentions.</summary>
    private static void MergeInto(Group from, Group into, List<Group> groups)
    {
        into.Members.AddRange(from.Members);
        from.Members.Clear();
        foreach (var other in from.Possible)
        {
            other.Possible.Remove(from);
            if (other == into) continue;
            other.Possible.Add(into);
            into.Possible.Add(other);
        }
        into.Possible.Remove(from);
        groups.Remove(from);
    }

    /// <summary>How close, in words of one turn, a one-word name and a full name it is a listed
    /// equivalent of must be said for the interview to tie them.</summary>
    public const int TieWords = 12;

    /// <summary>Farther apart, up to this many words of one turn, the two still tie when no other
    /// person is named between them: the later name then takes up the only person in play ("Her name
    /// was Giuseppina Russo. She came from Italy ... everybody called her Josefina").</summary>
    public const int TieReachWords = 40;

    /// <summary>Chars between two names beyond which no tie is looked for (far more than
    /// <see cref="TieReachWords"/> words), so a name said thousands of times costs no scan of its text.</summary>
    private const int TieReachChars = 2_000;

    private static TurnPositions PersonPositions(ImmutableArray<Mention> mentions) =>
        new(mentions, Enumerable.Range(0, mentions.Length).Where(k => mentions[k].Label == NameLabel.PER));

    /// <summary>Whether some mention of <paramref name="a"/> and the nearest mention of <paramref name="b"/>
    /// on either side of it in its turn are tied: at most <see cref="TieWords"/> words apart, or at most
    /// <paramref name="reach"/> with no other person named between. Each member costs two binary searches.</summary>
    private static bool Tied(Group a, Group b, ImmutableArray<Mention> mentions, ImmutableArray<Turn> turns, TurnPositions persons, int reach)
    {
        var others = new TurnPositions(mentions, b.Members);
        var either = a.Members.Concat(b.Members).ToHashSet();
        foreach (int i in a.Members)
        {
            var turn = mentions[i].Turn;
            var sameTurn = others.In(turn);
            int at = TurnPositions.FirstAtOrAfter(sameTurn, mentions[i].CharStart);
            foreach (int k in new[] { at - 1, at })
            {
                if (k < 0 || k >= sameTurn.Length) continue;
                int j = sameTurn[k].Index;
                int from = Math.Min(mentions[i].CharEnd, mentions[j].CharEnd), to = Math.Max(mentions[i].CharStart, mentions[j].CharStart);
                if (from >= to) return true;
                if (to - from > TieReachChars) continue;
                int between = Words(turns[turn.Index].Text[from..to]).Length;
                if (between <= TieWords) return true;
                if (between <= reach && !persons.AnyWithin(turn, from, to, k2 => !either.Contains(k2))) return true;
            }
        }
        return false;
    }

    /// <summary>Some mentions of an interview by turn, in text order, for binary searches by offset.</summary>
    private sealed class TurnPositions(ImmutableArray<Mention> mentions, IEnumerable<int> indices)
    {
        private readonly Dictionary<TurnId, (int Start, int Index)[]> _byTurn = indices
            .GroupBy(k => mentions[k].Turn)
            .ToDictionary(g => g.Key, g => g.Select(k => (mentions[k].CharStart, k)).OrderBy(x => x.CharStart).ToArray());

        public (int Start, int Index)[] In(TurnId turn) => _byTurn.GetValueOrDefault(turn, []);

        /// <summary>The first position whose start is at or after <paramref name="offset"/>.</summary>
        public static int FirstAtOrAfter((int Start, int Index)[] list, int offset)
        {
            int lo = 0, hi = list.Length;
            while (lo < hi) { int mid = (lo + hi) >>> 1; if (list[mid].Start < offset) lo = mid + 1; else hi = mid; }
            return lo;
        }

        /// <summary>Whether a mention lying wholly within [from, to) of the turn passes <paramref name="counts"/>.</summary>
        public bool AnyWithin(TurnId turn, int from, int to, Func<int, bool> counts)
        {
            var list = In(turn);
            for (int k = FirstAtOrAfter(list, from); k < list.Length && list[k].Start < to; k++)
                if (mentions[list[k].Index].CharEnd <= to && counts(list[k].Index)) return true;
            return false;
        }
    }

    /// <summary>Of several person headings a one-word name could mean, the one naming a speaker of the
    /// interview (every word of the speaker's label is a word of its name), when exactly one does: a
    /// surname alone is said most often to or of the person being interviewed. Whether a heading names
    /// a speaker is worked out once per heading (<paramref name="known"/>).</summary>
    private Group? SpeakerOwner(List<Group> owners, ImmutableArray<Mention> mentions, List<HashSet<string>> speakers, Dictionary<Group, bool> known)
    {
        var named = owners.Where(g =>
        {
            if (!known.TryGetValue(g, out bool names))
                known[g] = names = speakers.Count > 0 && g.Members.Select(i => mentions[i].Text).Distinct(StringComparer.Ordinal).Any(text =>
                {
                    var words = Words(text).Select(w => lexicon.Key(w, LanguageCode.Undetermined)).ToHashSet(StringComparer.Ordinal);
                    return speakers.Any(sp => sp.IsSubsetOf(words));
                });
            return names;
        }).ToList();
        return named is [var one] ? one : null;
    }

    /// <summary>The folded words of each distinct speaker label of the interview.</summary>
    private List<HashSet<string>> SpeakerWords(ImmutableArray<Turn> turns) =>
        turns.Select(t => t.Speaker).OfType<string>().Distinct(StringComparer.Ordinal)
            .Select(SpeakerKeys).Where(sp => sp.Count > 0).ToList();

    /// <summary>The folded words of one speaker label.</summary>
    private HashSet<string> SpeakerKeys(string speaker) =>
        Words(speaker).Select(w => lexicon.Key(w, LanguageCode.Undetermined)).ToHashSet(StringComparer.Ordinal);

    private static void GroupByKey(ImmutableArray<Mention> mentions, string[] keys, bool[] held, List<Group> groups, NameLabel label)
    {
        var byKey = new Dictionary<string, Group>(StringComparer.Ordinal);
        for (int i = 0; i < mentions.Length; i++)
            if (!held[i] && mentions[i].Label == label)
                Add(byKey, groups, label, keys[i], i);
    }

    private static Group Add(Dictionary<string, Group> byKey, List<Group> groups, NameLabel label, string key, int mention)
    {
        if (!byKey.TryGetValue(key, out var group))
        {
            byKey[key] = group = new Group(label, key);
            groups.Add(group);
        }
        group.Members.Add(mention);
        return group;
    }

    private static string[] Words(string text) => text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);

    private static Heading ToHeading(Group g, ImmutableArray<Mention> mentions, ImmutableArray<TimeRange> times,
        ImmutableArray<Turn> turns, ImmutableArray<PlaceLink>[] places, HashSet<HeadingId> usedIds)
    {
        var members = g.Members.OrderBy(i => times[i].Start).ThenBy(i => i).ToImmutableArray();
        var variants = members.Select(i => mentions[i].Text).Distinct(StringComparer.Ordinal).ToImmutableArray();
        string name = g.KeepsSpokenName || g.Place is null ? DisplayName(g.Label, members, mentions) : g.Place.Name;
        if (g.Title is not null && Words(name).Length == 1) name = g.Title + " " + name;
        var alternatives = members.SelectMany(i => places[i]).Where(p => p.Key != g.Place?.Key)
            .DistinctBy(p => p.Key).OrderByDescending(p => p.Population).ThenBy(p => p.GeonameId).ThenBy(p => p.Key, StringComparer.Ordinal).ToImmutableArray();
        var speakers = members.Select(i => turns[mentions[i].Turn.Index].Speaker).OfType<string>().Distinct(StringComparer.Ordinal).ToImmutableArray();
        double confidence = Math.Round(members.Average(i => mentions[i].Confidence), 4);
        var source = members.Any(i => mentions[i].Source == MentionSource.Authority) ? MentionSource.Authority
            : g.Place is not null ? MentionSource.Gazetteer
            : mentions[members[0]].Source;
        return new Heading(UniqueId(g, usedIds), g.Label, name, variants, g.Place, alternatives, [.. members.Select(i => new MentionId(i))], speakers, confidence, source)
        {
            PlaceFromContext = g.PlaceFromContext,
        };
    }

    /// <summary>The most frequent surface (a multi-word one for persons when there is one), ties to
    /// the longer, then the earlier.</summary>
    private static string DisplayName(NameLabel label, ImmutableArray<int> members, ImmutableArray<Mention> mentions)
    {
        var candidates = members.Select(i => mentions[i].Text).ToList();
        if (label == NameLabel.PER && candidates.Any(t => Words(t).Length > 1))
            candidates = candidates.Where(t => Words(t).Length > 1).ToList();
        return candidates
            .Select((text, order) => (text, order))
            .GroupBy(x => x.text, StringComparer.Ordinal)
            .OrderByDescending(x => x.Count()).ThenByDescending(x => x.Key.Length).ThenBy(x => x.Min(y => y.order))
            .First().Key;
    }

    private static HeadingId UniqueId(Group g, HashSet<HeadingId> used)
    {
        string slug = string.Join('-', g.Key.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));
        if (slug.Length == 0) slug = "x";
        var unique = HeadingId.For(g.Label, slug);
        for (int k = 2; !used.Add(unique); k++) unique = HeadingId.For(g.Label, $"{slug}-{k}");
        return unique;
    }
}
