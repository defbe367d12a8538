using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Tagging.Sources;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Tagging.Tests;

/// <summary>The precedence policy on its own: which of overlapping proposals stands. The spans are
/// invented offsets; what they check is the rule stated in issues 8 and 10 (an archive's list is never
/// overwritten; cues, then place evidence, then the model, then the gazetteer; a new source slots in by its rank).</summary>
public class NamePrecedenceTests
{
    private static Mention M(int start, int end, MentionSource source, NameLabel label = NameLabel.LOC) =>
        new(new TurnId(0), new CharSpan(start, end), new string('x', end - start), label, new LanguageCode("en"), 0.9, source);

    [Fact]
    public void AnAuthoritySpanIsNeverOverwritten()
    {
        var listed = M(0, 12, MentionSource.Authority, NameLabel.PER);
        var standing = NamePrecedence.Default.Resolve([M(0, 5, MentionSource.Model), M(6, 20, MentionSource.Model), M(0, 12, MentionSource.Gazetteer), listed]);
        Assert.Equal([listed], standing.ToArray());
    }

    [Fact]
    public void TheModelWinsOverTheGazetteerAndGazetteerMatchesElsewhereStand()
    {
        var model = M(0, 15, MentionSource.Model, NameLabel.PER);
        var elsewhere = M(20, 26, MentionSource.Gazetteer);
        var standing = NamePrecedence.Default.Resolve([M(0, 6, MentionSource.Gazetteer), elsewhere, model]);
        Assert.Equal([model, elsewhere], standing.ToArray());
    }

    [Fact]
    public void ADroppedProposalBlocksNothing()
    {
        // The model's span loses to the list; the gazetteer match it overlapped (but the list does not) stands.
        var listed = M(0, 4, MentionSource.Authority);
        var place = M(10, 16, MentionSource.Gazetteer);
        var standing = NamePrecedence.Default.Resolve([listed, M(2, 12, MentionSource.Model), place]);
        Assert.Equal([listed, place], standing.ToArray());
    }

    [Fact]
    public void AnInsertedSourceRanksWhereItIsPutAndNeverAboveAProtectedOne()
    {
        var cues = new MentionSource("late-cues");
        var policy = NamePrecedence.Default.InsertAfter(MentionSource.Model, cues).InsertBefore(MentionSource.Authority, new MentionSource("early"));
        Assert.Equal([MentionSource.Authority, new MentionSource("early"), new MentionSource("organisation-cue"), MentionSource.Cue, MentionSource.PlaceEvidence, MentionSource.Model, cues, MentionSource.GivenName, MentionSource.Gazetteer],
            policy.Order.ToArray());
        var cue = M(0, 10, cues, NameLabel.PER);
        Assert.Equal([cue], policy.Resolve([M(0, 6, MentionSource.Gazetteer), cue]).ToArray());
        Assert.Equal([M(0, 6, MentionSource.Model)], policy.Resolve([M(0, 6, MentionSource.Model), cue]).ToArray());
    }

    /// <summary>A lone listed given name is the weakest person evidence: it beats only a bare gazetteer
    /// match ("Roza" beside Roza, RU), never the model or place evidence.</summary>
    [Fact]
    public void A_lone_given_name_beats_only_a_bare_gazetteer_match()
    {
        var given = M(0, 4, MentionSource.GivenName, NameLabel.PER);
        Assert.Equal([given], NamePrecedence.Default.Resolve([M(0, 4, MentionSource.Gazetteer), given]).ToArray());
        Assert.Equal([M(0, 4, MentionSource.Model)], NamePrecedence.Default.Resolve([M(0, 4, MentionSource.Model), given]).ToArray());
        Assert.Equal([M(0, 4, MentionSource.PlaceEvidence)], NamePrecedence.Default.Resolve([M(0, 4, MentionSource.PlaceEvidence), given]).ToArray());
    }

    /// <summary>The cascade of issue 10: a titled or kin-marked name is a person whatever the model or
    /// gazetteer say ("Mr. Roth" is not Roth, DE); place evidence beats a model organisation or a bare
    /// gazetteer match, but gives way to a person the model found over it.</summary>
    [Fact]
    public void CuesBeatPlacesAndPlaceEvidenceGivesWayOnlyToAModelPerson()
    {
        var cue = M(4, 8, MentionSource.Cue, NameLabel.PER);
        Assert.Equal([cue], NamePrecedence.Default.Resolve([M(4, 8, MentionSource.PlaceEvidence), M(0, 8, MentionSource.Model), cue]).ToArray());
        var place = M(3, 10, MentionSource.PlaceEvidence);
        Assert.Equal([place], NamePrecedence.Default.Resolve([M(3, 10, MentionSource.Model, NameLabel.ORG), M(3, 10, MentionSource.Gazetteer), place]).ToArray());
        var person = M(3, 10, MentionSource.Model, NameLabel.PER);
        Assert.Equal([person], NamePrecedence.Default.Resolve([place, person]).ToArray());
        // An unsure model person (below SurePerson) does not: "from Bobruisk" stays a place.
        var unsure = person with { Confidence = NamePrecedence.SurePerson - 0.2 };
        Assert.Equal([place], NamePrecedence.Default.Resolve([place, unsure]).ToArray());
    }

    [Fact]
    public void AnUnrankedSourceIsRefused()
    {
        Assert.Throws<ArgumentException>(() => NamePrecedence.Default.Resolve([M(0, 3, new MentionSource("unranked"))]));
    }

    /// <summary>"in Berlin" is place evidence twice, from the city and from the city-state of the name:
    /// one mention stands, not two at one place.</summary>
    [Fact]
    public void TheVerySameSpanOfOneRankStandsOnce()
    {
        var city = M(9, 15, MentionSource.PlaceEvidence);
        var region = M(9, 15, MentionSource.PlaceEvidence);
        Assert.Equal([city], NamePrecedence.Default.Resolve([city, region]).ToArray());
        var longer = M(9, 20, MentionSource.PlaceEvidence);
        Assert.Equal([city, longer], NamePrecedence.Default.Resolve([city, longer]).ToArray());
    }
}
