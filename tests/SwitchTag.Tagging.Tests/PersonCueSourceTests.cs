using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tagging.Sources.Cues;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Tagging.Tests;

/// <summary>Person cues read from the shipped lists (models/lexicon) and language profiles.
/// Patronymic forms follow the standard Russian and Ukrainian grammars (-ovna, -ovich, -івна;
/// from memory).</summary>
public class PersonCueSourceTests
{
    private static readonly NameListSet Lists = NameListSet.Load(Path.Combine(Models.Directory, NameListSet.FolderName));

    private static readonly Lazy<Gazetteer> Places = new(() => Gazetteer.Load(Path.Combine(Models.Directory, Gazetteer.FileName)));

    private static string[] Persons(string text, Gazetteer? places = null) =>
        [.. new PersonCueSource(Lists.Cues, Lists.NotPlaces, places ?? Gazetteer.Empty).Find(new TurnId(0), text, []).Select(m => m.Text)];

    private static string[] PersonsWithPlaces(string text) => Persons(text, Places.Value);

    [Theory]
    [InlineData("Our teacher was Lidiya Petrovna, very strict.", "Lidiya Petrovna")]
    [InlineData("Нас учил Иван Петрович Сидоров.", "Иван Петрович Сидоров")]
    [InlineData("Вчителька Ганна Іванівна прийшла.", "Ганна Іванівна")]
    public void A_given_name_with_a_patronymic_is_a_person(string text, string person) =>
        Assert.Equal([person], Persons(text));

    /// <summary>Titles of the shipped lists (Mrs, Herr, pan) before names with particles (van den, von;
    /// the language profiles' particles.txt); Polish "i" is "and" (known from memory).</summary>
    [Theory]
    [InlineData("Mrs. Van den Berg, where were you born?", "Van den Berg")]
    [InlineData("Das war Herr von Braun aus Berlin.", "von Braun")]
    [InlineData("Byli tam pan Kowalski i Nowak.", "Kowalski")]
    public void A_titled_name_takes_its_particles_but_no_conjunction(string text, string person) =>
        Assert.Equal([person], Persons(text));

    /// <summary>Berliner, Deutsch and Polak are people's or language words of the shipped lists
    /// (Languages/*/peoples.tsv, CLDR language names) and surnames too (common usage, from memory).</summary>
    [Theory]
    [InlineData("Dr. Berliner came every month to see us.", "Berliner")]
    [InlineData("Doktor Berliner sprach Deutsch mit uns.", "Berliner")]
    [InlineData("Byli tam pan Polak i jego żona.", "Polak")]
    public void After_a_title_a_peoples_word_is_a_surname(string text, string person) =>
        Assert.Equal([person], Persons(text));

    [Fact]
    public void After_a_kinship_word_a_peoples_word_is_no_name() =>
        Assert.Empty(Persons("My uncle German was what they called him, no, my uncle was Jewish."));

    [Fact]
    public void A_word_ending_like_a_patronymic_alone_is_no_cue() =>
        Assert.Empty(Persons("We went to Baranovichi and then to Kyiv."));

    [Theory]
    [InlineData("My mother, Assunta, she made the bread for half the village.", "Assunta")]
    [InlineData("My father, Samuel Lindner, came from Lemberg.", "Samuel Lindner")]
    [InlineData("And my grandmother, Rivka.", "Rivka")]
    public void A_name_set_off_by_commas_after_a_kinship_word_is_a_person(string text, string person) =>
        Assert.Equal([person], PersonsWithPlaces(text));

    /// <summary>A first name some city also has is still a person when said alone in apposition:
    /// "Stanisław" is an old name of Ivano-Frankivsk, UA, and Sofia is Bulgaria's capital, in GeoNames;
    /// both are in the shipped (faker) first-name lists.</summary>
    [Fact]
    public void A_first_name_a_city_also_has_is_a_person_in_apposition()
    {
        Assert.Equal(["Stanisław"], PersonsWithPlaces("And my brother, Stanisław."));
        Assert.Equal(["Sofia"], PersonsWithPlaces("My mother, Sofia, was from Kavala."));
    }

    [Fact]
    public void Towns_listed_after_a_kinship_word_are_no_persons()
    {
        // Kraków and Tarnów are GeoNames towns of the shipped gazetteer; "father" is in the English kinship list.
        Assert.Empty(PersonsWithPlaces("We travelled with my father, Kraków, Tarnów, everywhere."));
        Assert.Empty(PersonsWithPlaces("We travelled with my father, Sofia, Varna, everywhere."));
        // No comma after the name: the clause goes on, so nothing marks the word as a name in apposition.
        Assert.Empty(PersonsWithPlaces("I asked my mother, Where is the bread?"));
    }
}
