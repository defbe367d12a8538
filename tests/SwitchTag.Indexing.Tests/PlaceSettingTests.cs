using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Indexing.Tests.Fakes;
using Xunit;

namespace SwitchTag.Indexing.Tests;

/// <summary>A place the gazetteer lacks is shown at the town the talk was at. Checked against the GeoNames
/// cities15000 dump in ../shared/data/gazetteer: Kraków is row 3094802 (PL) and neither Podgórze nor
/// Ironbound has a row (grep). Sentences are invented.</summary>
public class PlaceSettingTests
{
    private sealed class WithContinents(FakeLexicon inner) : IHeadingLexicon
    {
        public string Key(string name, LanguageCode language) => inner.Key(name, language);
        public ImmutableArray<PlaceLink> Places(string name, LanguageCode language) => inner.Places(name, language);
        public bool IsWorldRegion(string name, LanguageCode language) => name == "Europe";
        public bool IsFirstName(string word) => word == "Roza";
    }

    /// <summary>One turn per string; each name is a LOC mention at its first occurrence in its turn.</summary>
    private static HeadingResult Build(params (string Text, string[] Places)[] turns)
    {
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        var built = ImmutableArray.CreateBuilder<Turn>();
        for (int t = 0; t < turns.Length; t++)
        {
            var (text, places) = turns[t];
            built.Add(new Turn(new TurnId(t), "A", "A", new TimeRange(new Timecode(t * 10_000), new Timecode(t * 10_000 + 9_000)), text, []));
            foreach (var p in places)
            {
                int at = text.IndexOf(p, StringComparison.Ordinal);
                mentions.Add(new Mention(new TurnId(t), new CharSpan(at, at + p.Length), p, NameLabel.LOC, new LanguageCode("en"), 0.9, MentionSource.Model));
            }
        }
        var all = mentions.ToImmutable();
        var times = all.Select(m => new TimeRange(new Timecode(m.Turn.Index * 10_000), new Timecode(m.Turn.Index * 10_000 + 500))).ToImmutableArray();
        return new HeadingBuilder(new WithContinents(GeoNamesFixture.Lexicon())).Build(all, times, built.ToImmutable());
    }

    [Fact]
    public void A_district_the_gazetteer_lacks_is_shown_at_the_town_said_before_it()
    {
        var result = Build(("We lived in Kraków.", ["Kraków"]), ("It was in Podgórze, across the river.", ["Podgórze"]));
        var district = result.Headings.Single(h => h.Variants.Contains("Podgórze"));
        Assert.Equal("Podgórze", district.Name);
        Assert.Equal(3094802, district.Place!.GeonameId);
        Assert.True(district.PlaceFromContext);
        Assert.False(result.Headings.Single(h => h.Variants.Contains("Kraków")).PlaceFromContext);
    }

    [Fact]
    public void A_town_said_more_than_two_turns_before_sets_no_scene()
    {
        var result = Build(("We lived in Kraków.", ["Kraków"]), ("Yes.", []), ("And then?", []), ("Then Podgórze, across the river.", ["Podgórze"]));
        var district = result.Headings.Single(h => h.Variants.Contains("Podgórze"));
        Assert.Null(district.Place);
        Assert.False(district.PlaceFromContext);
    }

    [Fact]
    public void A_place_said_first_a_continent_or_a_first_name_is_never_placed_so()
    {
        var first = Build(("Ironbound, then Kraków.", ["Ironbound", "Kraków"]));
        Assert.Null(first.Headings.Single(h => h.Name == "Ironbound").Place);

        var continent = Build(("From Kraków to Europe.", ["Kraków", "Europe"]));
        Assert.Null(continent.Headings.Single(h => h.Name == "Europe").Place);

        // A first name the tagger called a place gets no map point from its neighbour.
        var person = Build(("In Kraków, Roza was waiting.", ["Kraków", "Roza"]));
        Assert.Null(person.Headings.Single(h => h.Name == "Roza").Place);
    }
}
