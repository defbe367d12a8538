using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Stages;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tagging.Sources;
using SwitchTag.Tagging.Sources.Authority;
using SwitchTag.Tagging.Sources.Cues;
using SwitchTag.Tagging.Sources.Gazetteer;
using SwitchTag.Tagging.Sources.Model;
using SwitchTag.Tagging.Sources.Organisations;
using SwitchTag.Tagging.Sources.PlaceEvidence;
using SwitchTag.Tagging.Sources.Regions;
using SwitchTag.Tagging.Sources.GivenNames;
using SwitchTag.Tagging.Sources.Vetoes;

namespace SwitchTag.Tagging;

/// <summary>The tag stage: every registered name source proposes mentions for the turn, the
/// precedence policy decides which stand (<see cref="NamePrecedence"/>), and the vetoes drop standing
/// mentions that name nothing (<see cref="IMentionVeto"/>; never the authority list's or a cue's).</summary>
public sealed class NameTagger(NameSources sources, NamePrecedence? precedence = null, IReadOnlyList<IMentionVeto>? vetoes = null) : INameTagger
{
    private readonly NamePrecedence _precedence = Checked(sources, precedence ?? NamePrecedence.Default);
    private readonly IReadOnlyList<IMentionVeto> _vetoes = vetoes ?? [];

    /// <summary>The shipped cascade: the authority list, person cues, the gazetteer (with place
    /// evidence), first-level regions said as places and the vetoes of <paramref name="lists"/>, and in
    /// <see cref="TaggingMode.RulesThenModel"/> the model when there is one.</summary>
    public static NameTagger Create(NerModel? model = null, AuthorityList? authority = null, Lexicon.Gazetteer? gazetteer = null,
        TaggingMode mode = TaggingMode.RulesThenModel, NameListSet? lists = null)
    {
        gazetteer ??= Lexicon.Gazetteer.Empty;
        lists ??= NameListSet.Empty;
        var sources = ShippedSources(mode == TaggingMode.RulesThenModel ? model : null, authority, gazetteer, lists);
        return new NameTagger(sources, null, ShippedVetoes(gazetteer, lists));
    }

    /// <summary>The sources of the shipped cascade: the authority list, organisation and person cues,
    /// the gazetteer (with place evidence), first-level regions said as places, the model when
    /// there is one, and listed given names said alone.</summary>
    public static NameSources ShippedSources(NerModel? model, AuthorityList? authority, Lexicon.Gazetteer gazetteer, NameListSet lists)
    {
        var sources = new NameSources()
            .Add(new AuthorityListSource(authority ?? AuthorityList.Empty))
            .Add(new OrganisationCueSource())
            .Add(new PersonCueSource(lists.Cues, lists.NotPlaces, gazetteer, lists.Variants))
            .Add(new GazetteerSource(gazetteer, new PlaceContext(gazetteer, lists.Prepositions, lists.Cues, lists.Variants)))
            .Add(new RegionSource(lists.Regions, lists.Prepositions));
        if (model is not null) sources.Add(new NameModelSource(model));
        sources.Add(new GivenNameSource(lists.Cues, lists.NotPlaces, lists.Variants, lists.Prepositions));
        return sources;
    }

    /// <summary>The vetoes of the shipped cascade: words that are never names, and ordinary words
    /// the model calls places at a sentence start.</summary>
    public static IReadOnlyList<IMentionVeto> ShippedVetoes(Lexicon.Gazetteer gazetteer, NameListSet lists) =>
        [new NotPlaceWordVeto(lists.NotPlaces), new OrdinaryWordVeto(gazetteer, lists.Prepositions), new BarePlaceVeto(gazetteer, lists.Prepositions)];

    public ImmutableArray<Mention> Tag(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        // Each source's proposals, then one list of all of them sized once: a long turn has a million.
        // Each source leaves its whole-turn scratch behind, which the next would pile onto (LongTalk).
        var found = new ImmutableArray<Mention>[sources.Count];
        for (int i = 0; i < found.Length; i++)
        {
            found[i] = sources[i].Find(turn, turnText, spans);
            if (turnText.Length >= LongTalk.Chars) LongTalk.Compact();
        }
        var proposals = new List<Mention>(found.Sum(f => f.Length));
        foreach (var f in found) proposals.AddRange(f);
        var standing = _precedence.Resolve(proposals);
        if (_vetoes.Count == 0) return standing;
        var kept = ImmutableArray.CreateBuilder<Mention>(standing.Length);
        foreach (var m in standing)
            if (m.Source == MentionSource.Authority || m.Source == MentionSource.Cue || !_vetoes.Any(v => v.Vetoes(m, turnText)))
                kept.Add(m);
        return kept.DrainToImmutable();
    }

    private static NamePrecedence Checked(NameSources sources, NamePrecedence precedence)
    {
        foreach (var s in sources)
            foreach (var proposed in s.Proposes)
                if (!precedence.Ranks(proposed)) throw new ArgumentException($"name source {proposed} has no place in the precedence");
        return precedence;
    }
}
