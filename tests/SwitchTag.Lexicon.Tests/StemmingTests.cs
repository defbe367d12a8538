using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.Tests;

/// <summary>Case forms of place names. Every inflected form here is a grammar fact known from
/// memory (standard grammars of each language), marked "(from memory)" once per block.</summary>
public class StemmingTests
{
    // (from memory) Polish: Kraków gen. Krakowa, loc. Krakowie, instr. Krakowem; Warszawa gen.
    // Warszawy, dat./loc. Warszawie, acc. Warszawę, instr. Warszawą; Lwów gen. Lwowa; Poznań gen.
    // Poznania, loc. Poznaniu; Gdynia gen./loc. Gdyni; Łódź gen. Łodzi.
    [Theory]
    [InlineData("Krakowie", "Kraków")]
    [InlineData("Krakowa", "Kraków")]
    [InlineData("Krakowem", "Kraków")]
    [InlineData("Warszawie", "Warszawa")]
    [InlineData("Warszawy", "Warszawa")]
    [InlineData("Warszawę", "Warszawa")]
    [InlineData("Warszawą", "Warszawa")]
    [InlineData("Lwowa", "Lwów")]
    [InlineData("Poznania", "Poznań")]
    [InlineData("Poznaniu", "Poznań")]
    [InlineData("Gdyni", "Gdynia")]
    [InlineData("Łodzi", "Łódź")]
    public void Polish_keys_agree(string inflected, string name) =>
        Assert.Equal(NameFolding.Key(name, new LanguageCode("pl")), NameFolding.Key(inflected, new LanguageCode("pl")));

    // (from memory) Russian: Москва loc. Москве, gen. Москвы, acc. Москву, instr. Москвой;
    // Казань gen. Казани; Санкт-Петербург loc. Санкт-Петербурге.
    [Theory]
    [InlineData("Москве", "Москва")]
    [InlineData("Москвы", "Москва")]
    [InlineData("Москву", "Москва")]
    [InlineData("Москвой", "Москва")]
    [InlineData("Казани", "Казань")]
    [InlineData("Санкт-Петербурге", "Санкт-Петербург")]
    public void Russian_keys_agree(string inflected, string name) =>
        Assert.Equal(NameFolding.Key(name, new LanguageCode("ru")), NameFolding.Key(inflected, new LanguageCode("ru")));

    // (from memory) Czech: Praha gen. Prahy, instr. Prahou; Brno loc. Brně; Ostrava loc. Ostravě.
    // Slovak: Bratislava loc. Bratislave; Košice loc. Košiciach.
    [Theory]
    [InlineData("Prahy", "Praha", "cs")]
    [InlineData("Prahou", "Praha", "cs")]
    [InlineData("Brně", "Brno", "cs")]
    [InlineData("Ostravě", "Ostrava", "cs")]
    [InlineData("Bratislave", "Bratislava", "sk")]
    [InlineData("Košiciach", "Košice", "sk")]
    [InlineData("Pepíkův", "Pepík", "cs")]     // (from memory) possessive adjective: Pepíkův bratr
    [InlineData("Jiřímu", "Jiří", "cs")]       // (from memory) Jiří declines as a soft adjective: dat. Jiřímu
    public void Czech_and_Slovak_keys_agree(string inflected, string name, string language) =>
        Assert.Equal(NameFolding.Key(name, new LanguageCode(language)), NameFolding.Key(inflected, new LanguageCode(language)));

    // (from memory) Lithuanian: Vilnius gen. Vilniaus, loc. Vilniuje, acc. Vilnių; Kaunas loc.
    // Kaune, gen. Kauno; Klaipėda loc. Klaipėdoje. Latvian: Rīga loc. Rīgā, gen. Rīgas, acc. Rīgu.
    [Theory]
    [InlineData("Vilniuje", "Vilnius", "lt")]
    [InlineData("Vilniaus", "Vilnius", "lt")]
    [InlineData("Vilnių", "Vilnius", "lt")]
    [InlineData("Kaune", "Kaunas", "lt")]
    [InlineData("Kauno", "Kaunas", "lt")]
    [InlineData("Klaipėdoje", "Klaipėda", "lt")]
    [InlineData("Rīgā", "Rīga", "lv")]
    [InlineData("Rīgas", "Rīga", "lv")]
    [InlineData("Rīgu", "Rīga", "lv")]
    public void Baltic_keys_agree(string inflected, string name, string language) =>
        Assert.Equal(NameFolding.Key(name, new LanguageCode(language)), NameFolding.Key(inflected, new LanguageCode(language)));

    // (from memory) Hungarian: Budapest superessive Budapesten, sublative Budapestre, delative
    // Budapestről, inessive-type town suffixes -ban/-ben; German genitive: Berlins, Hamburgs.
    [Theory]
    [InlineData("Budapesten", "Budapest", "hu")]
    [InlineData("Budapestre", "Budapest", "hu")]
    [InlineData("Budapestről", "Budapest", "hu")]
    [InlineData("Tibort", "Tibor", "hu")]      // (from memory) accusative after r and l: Tibort, Sándort, Pált
    [InlineData("Pált", "Pál", "hu")]
    [InlineData("Sándort", "Sándor", "hu")]
    [InlineData("Berlins", "Berlin", "de")]
    [InlineData("Hamburgs", "Hamburg", "de")]
    public void Hungarian_and_German_keys_agree(string inflected, string name, string language) =>
        Assert.Equal(NameFolding.Key(name, new LanguageCode(language)), NameFolding.Key(inflected, new LanguageCode(language)));

    // (from memory) Greek accusative and genitive of the -ος, -ας and -η declensions: τον Γιώργο, του
    // Γιώργου, τον Κώστα, της Ελένης (Languages/el/stemming.txt).
    [Theory]
    [InlineData("Γιώργο", "Γιώργος")]
    [InlineData("Γιώργου", "Γιώργος")]
    [InlineData("Κώστα", "Κώστας")]
    [InlineData("Ελένης", "Ελένη")]
    public void Greek_keys_agree(string inflected, string name) =>
        Assert.Equal(NameFolding.Key(name, new LanguageCode("el")), NameFolding.Key(inflected, new LanguageCode("el")));

    // Forms whose stem changes before the ending: the primary key differs, but the inflection
    // check undoes the change. (from memory) Polish Praga loc. Pradze, Wiedeń gen. Wiednia;
    // Czech Praha loc. Praze, Plzeň gen. Plzně; Ukrainian Львів gen. Львова, Київ gen. Києва,
    // loc. Києві; Hungarian Debrecen inessive Debrecenben, Budapest instrumental Budapesttel.
    [Theory]
    [InlineData("Pradze", "Praga", "pl")]
    [InlineData("Polsce", "Polska", "pl")]      // (from memory) loc. of Polska
    [InlineData("Niemczech", "Niemcy", "pl")]   // (from memory) loc. of the plural name Niemcy
    [InlineData("Węgrzech", "Węgry", "pl")]     // (from memory) loc. of Węgry
    [InlineData("Wiednia", "Wiedeń", "pl")]
    [InlineData("Praze", "Praha", "cs")]
    [InlineData("Plzně", "Plzeň", "cs")]
    [InlineData("Львова", "Львів", "uk")]
    [InlineData("Києва", "Київ", "uk")]
    [InlineData("Києві", "Київ", "uk")]
    [InlineData("Debrecenben", "Debrecen", "hu")]
    [InlineData("Budapesttel", "Budapest", "hu")]
    [InlineData("Vilniuje", "Vilnius", "lt")]
    [InlineData("Москве", "Москва", "ru")]
    public void Inflection_check_undoes_stem_changes(string inflected, string name, string language) =>
        Assert.True(NameFolding.IsInflectionOf(inflected, name, new LanguageCode(language)));

    [Theory]
    [InlineData("Ufa", "pl", "ufa")]          // stripping "-a" would leave 2 letters
    [InlineData("Oslo", "pl", "osl")]
    [InlineData("Bari", "en", "bari")]         // English has no rule: identity
    [InlineData("Paris", "fr", "paris")]
    [InlineData("Budapest", "hu", "budapest")] // -t after s is the name's own letter
    public void Stem_keeps_at_least_three_letters_and_leaves_other_languages_alone(string word, string language, string stem) =>
        Assert.Equal(stem, NameFolding.Stem(word, new LanguageCode(language)));

    [Fact]
    public void Nominative_endings_are_not_stripped_from_dictionary_forms()
    {
        // "-om" is an instrumental/dative ending, not a nominative one: Bytom (a Polish town) must
        // not meet "Byty" through a shared "byt".
        Assert.False(NameFolding.IsInflectionOf("Byty", "Bytom", new LanguageCode("pl")));
        Assert.True(NameFolding.IsInflectionOf("Bytomiu", "Bytom", new LanguageCode("pl"))); // (from memory) loc. Bytomiu
    }

    [Fact]
    public void Language_without_rules_falls_back_to_every_rule()
    {
        Assert.True(NameFolding.IsInflectionOf("Krakowie", "Kraków", new LanguageCode("en")));
        Assert.True(NameFolding.IsInflectionOf("Krakowie", "Kraków", new LanguageCode("und")));
        // A language with rules of its own uses only those: Polish has no "-en" ending.
        Assert.False(NameFolding.IsInflectionOf("Budapesten", "Budapest", new LanguageCode("pl")));
    }

    [Fact]
    public void Language_codes_accept_iso_639_3_and_regions()
    {
        // ISO 639-2/3: pol = Polish, ces/cze = Czech, hun = Hungarian.
        Assert.Equal(NameFolding.Stem("Warszawie", new LanguageCode("pl")), NameFolding.Stem("Warszawie", new LanguageCode("pol")));
        // BCP 47 (RFC 5646): a region subtag after the language code does not change the language.
        Assert.Same(StemRules.For("pl"), StemRules.For("pl-PL"));
        Assert.Equal(NameFolding.Stem("Budapesten", new LanguageCode("hu")), NameFolding.Stem("Budapesten", new LanguageCode("hun")));
    }

    [Fact]
    public void SameName_links_mentions_across_languages()
    {
        // (from memory) Polish genitive of Anna is Anny; of Kowalczyk, Kowalczyka.
        Assert.True(NameFolding.SameName("Anny", new LanguageCode("pl"), "Anna", new LanguageCode("en")));
        Assert.True(NameFolding.SameName("Anna", new LanguageCode("en"), "Anny", new LanguageCode("pl")));
        Assert.True(NameFolding.SameName("Kowalczyka", new LanguageCode("pl"), "Kowalczyk", new LanguageCode("en")));
        Assert.False(NameFolding.SameName("Anna", new LanguageCode("en"), "Hanna", new LanguageCode("pl")));
    }
}
