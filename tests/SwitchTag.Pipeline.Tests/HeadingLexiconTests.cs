using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Indexing;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Pipeline.Models;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Pipeline.Tests;

/// <summary>Given names as heading building sees them, on the shipped lists: a productive diminutive
/// is the same given name unless it is a listed first name of its own. Marek is listed as a first name
/// in models/lexicon/Languages/pl/first-names.tsv (from @faker-js/faker, checked with grep); Slovak
/// Zuzanka for Zuzana is common usage (known from memory) and listed in no hypocoristics.tsv.
/// Feminine surnames follow the standard Czech, Slovak, Polish and Russian grammars (-ová, -ska, -ova
/// beside the family form; known from memory); Piet for Pieter and Eve for Eva are common usage (known
/// from memory). The persons are invented.</summary>
public class HeadingLexiconTests
{
    private static readonly Lazy<(HeadingLexicon Lexicon, NameListSet Lists)> Loaded = new(() =>
    {
        var at = new ModelLocation(Path.Combine(TestPaths.RepoRoot, "models"));
        var lists = NameListSet.Load(at.PathOf(NameListSet.FolderName));
        return (new HeadingLexicon(ShippedModels.LoadGazetteer(at), lists), lists);
    });

    private static readonly LanguageCode Slovak = new("sk"), Polish = new("pl"), Czech = new("cs"), Russian = new("ru"), English = new("en"), Dutch = new("nl"), Hungarian = new("hu");

    /// <summary>Headings of one turn said by <paramref name="speaker"/> that names the persons one
    /// sentence each.</summary>
    private static HeadingResult Build(string speaker, params (string Text, LanguageCode Language)[] names) =>
        BuildText(string.Join(" ", names.Select(n => $"There was {n.Text}.")), names, speaker);

    /// <summary>Headings of one turn of <paramref name="text"/>; each name a PER mention at its next
    /// occurrence in the text.</summary>
    private static HeadingResult BuildText(string text, params (string Text, LanguageCode Language)[] names) => BuildText(text, names, "Narrator");

    private static HeadingResult BuildText(string text, (string Text, LanguageCode Language)[] names, string speaker)
    {
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        int from = 0;
        foreach (var (name, language) in names)
        {
            int at = text.IndexOf(name, from, StringComparison.Ordinal);
            Assert.True(at >= 0, name);
            mentions.Add(new Mention(new TurnId(0), new CharSpan(at, at + name.Length), name, NameLabel.PER, language, 0.9, MentionSource.Model));
            from = at + name.Length;
        }
        var times = mentions.Select((_, i) => new TimeRange(new Timecode(i * 1000), new Timecode(i * 1000 + 500))).ToImmutableArray();
        var turn = new Turn(new TurnId(0), speaker, speaker, new TimeRange(Timecode.Zero, new Timecode(100_000)), text, []);
        return new HeadingBuilder(Loaded.Value.Lexicon).Build(mentions.ToImmutable(), times, [turn]);
    }

    /// <summary>Birth-name markers of Languages/*/birth-name-markers.txt: Polish "z domu" and English
    /// "born" before a maiden name (common usage, known from memory).</summary>
    [Fact]
    public void A_name_after_a_birth_name_marker_is_the_woman_named_before_it()
    {
        var polish = BuildText("My mother was Anna Nowak, z domu Wiśniewska, from Lublin. Her brother Jan Wiśniewski stayed there.",
            ("Anna Nowak", English), ("Wiśniewska", Polish), ("Jan Wiśniewski", English));
        Assert.Equal([["Anna Nowak", "Wiśniewska"], ["Jan Wiśniewski"]], Variants(polish));

        var english = BuildText("After the wedding I was Ruth Adler. But I was born Ruth Stein, in Vienna.", ("Ruth Adler", English), ("Ruth Stein", English));
        Assert.Equal([["Ruth Adler", "Ruth Stein"]], Variants(english));

        // Without the marker two women of one given name stay two headings.
        var cousins = BuildText("After the wedding I was Ruth Adler. My cousin Ruth Stein lived in Vienna.", ("Ruth Adler", English), ("Ruth Stein", English));
        Assert.Equal(2, cousins.Headings.Length);
    }

    /// <summary>Giorgos is listed only as a form in models/lexicon/Languages/el/hypocoristics.tsv (the
    /// first-name list has Γιώργος); Lenio is listed there as a form of Eleni (common Greek usage,
    /// known from memory).</summary>
    [Fact]
    public void A_romanised_given_name_the_variant_lists_know_is_no_nickname()
    {
        var result = BuildText("This is Eleni Stavrou. Everybody called me Lenio. My father, Giorgos Stavrou, had a boat.",
            ("Eleni Stavrou", English), ("Lenio", English), ("Giorgos Stavrou", English));
        Assert.Equal([["Eleni Stavrou", "Lenio"], ["Giorgos Stavrou"]], Variants(result));
    }

    private static string[][] Variants(HeadingResult result) =>
        [.. result.Headings.OrderBy(h => h.Name, StringComparer.Ordinal).Select(h => h.Variants.ToArray())];

    [Theory]
    [InlineData("Nováková", "cs", "Novák", "en")]
    [InlineData("Hudecová", "sk", "Hudec", "sk")]
    [InlineData("Kowalska", "pl", "Kowalski", "en")]
    [InlineData("Orlova", "en", "Orlov", "en")]
    [InlineData("Орлова", "ru", "Orlov", "en")]
    public void A_womans_surname_and_its_family_form_are_one_family(string a, string languageA, string b, string languageB) =>
        Assert.True(Loaded.Value.Lexicon.SameFamilyName(a, new LanguageCode(languageA), b, new LanguageCode(languageB)), $"{a} / {b}");

    [Fact]
    public void Other_surnames_are_not_one_family() =>
        Assert.False(Loaded.Value.Lexicon.SameFamilyName("Nováková", Czech, "Novotný", Czech));

    [Fact]
    public void A_woman_under_the_family_form_of_her_surname_abroad_is_one_person()
    {
        Assert.Equal([["Eva Kleinová", "Eve Klein"]], Variants(Build("Marta", ("Eva Kleinová", Slovak), ("Eve Klein", English))));
        // Husband and wife: a stem shared by the given names is not enough.
        Assert.Equal(2, Build("Marta", ("Jan Novák", Czech), ("Jana Nováková", Czech)).Headings.Length);
    }

    /// <summary>Bill is listed beside Vasilis as an adopted equivalent (name-equivalents.tsv; Greek
    /// immigrants' usage, known from memory): "Vasilis Georgiou" and "Bill Georgiou" are one person, and
    /// "Bill" alone then meets the second of his full names.</summary>
    [Fact]
    public void A_one_word_name_meets_any_full_name_of_its_person() =>
        Assert.Single(Build("Evangelia", ("Vasilis Georgiou", English), ("Bill Georgiou", English), ("Bill", English)).Headings);

    /// <summary>Pan Novotný and paní Novotná (Czech -ný / -ná, feminine-surname-endings.tsv) are a
    /// husband and wife; said alone, the two forms are never one person.</summary>
    [Fact]
    public void A_womans_and_a_mans_form_of_one_surname_said_alone_are_two_persons() =>
        Assert.Equal([["Novotná"], ["Novotný"]], Variants(Build("Markéta", ("Novotný", Czech), ("Novotná", Czech))));

    [Fact]
    public void A_surname_said_in_another_language_joins_the_woman_it_names_not_her_father()
    {
        var result = Build("Marta", ("Marta Hudecová", English), ("Ondrej Hudec", English), ("Hudecová", Slovak));
        Assert.Equal([["Marta Hudecová", "Hudecová"], ["Ondrej Hudec"]], Variants(result));
    }

    [Fact]
    public void A_dutch_short_form_and_a_surname_after_particles_join_their_full_names()
    {
        var result = Build("Johanna", ("Johanna van den Berg", English), ("Pieter van den Berg", Dutch), ("Piet", English), ("Van den Berg", Dutch));
        Assert.Equal([["Johanna van den Berg", "Van den Berg"], ["Pieter van den Berg", "Piet"]], Variants(result));
    }

    [Fact]
    public void A_derived_diminutive_is_the_same_given_name()
    {
        Assert.True(Loaded.Value.Lexicon.SameGivenName("Zuzana", Slovak, "Zuzanka", Slovak));
    }

    /// <summary>Slovak instrumental -om ("s Imrichom", with Imrich; standard grammar, from memory).</summary>
    [Fact]
    public void A_case_form_is_the_same_given_name_in_either_language()
    {
        Assert.True(Loaded.Value.Lexicon.SameGivenName("Imrich", Slovak, "Imrichom", Slovak));
        Assert.True(Loaded.Value.Lexicon.SameGivenName("Imrich", English, "Imrichom", Slovak));
    }

    [Fact]
    public void A_derived_form_that_is_a_first_name_of_its_own_is_not()
    {
        Assert.Equal("Marek", Loaded.Value.Lists.Variants.DiminutiveOf("Mara", "Marek"));
        Assert.True(Loaded.Value.Lexicon.IsFirstName("Marek"));
        Assert.False(Loaded.Value.Lexicon.SameGivenName("Mara", Polish, "Marek", Polish));
    }

    /// <summary>Hungarian puts the family name first ("Weisz Sándor" is Sándor Weisz) and marks the
    /// accusative with -t after r ("Grünfeld Tibort"); both from the standard grammar, known from
    /// memory. Erzsi is listed for Erzsébet in Languages/hu/hypocoristics.tsv.</summary>
    [Fact]
    public void A_name_said_family_name_first_is_the_same_person()
    {
        var result = Build("Ilona", ("Weisz Sándor", English), ("Sándor Weisz", English), ("Klein Erzsébet", Hungarian), ("Erzsi", English));
        Assert.Equal([["Klein Erzsébet", "Erzsi"], ["Weisz Sándor", "Sándor Weisz"]], Variants(result));
        Assert.Single(Build("Ilona", ("Grünfeld Tibort", Hungarian), ("Tibor Grünfeld", English)).Headings);
    }

    /// <summary>Two names with one surname and two listed first names stay two persons whichever way
    /// round they are said.</summary>
    [Fact]
    public void A_reversed_name_is_not_read_where_both_words_are_given_names() =>
        Assert.Equal(2, Build("Ilona", ("Weisz Sándor", Hungarian), ("Weisz György", Hungarian)).Headings.Length);

    /// <summary>Marriage words of Languages/*/marriage-words.txt ("married", Hungarian "férjemet", my
    /// husband, accusative; common usage, known from memory).</summary>
    [Fact]
    public void A_married_name_said_as_a_marriage_is_the_same_woman()
    {
        var later = BuildText("In New York she was Eve Klein, and later Eve Stern, when she married.", ("Eve Klein", English), ("Eve Stern", English));
        Assert.Equal([["Eve Klein", "Eve Stern"]], Variants(later));

        var husband = BuildText("I married Harry Lindsay in 1951. I was Gertrude Brauner in Vienna, and here I am Gertrude Lindsay.",
            ("Harry Lindsay", English), ("Gertrude Brauner", English), ("Gertrude Lindsay", English));
        Assert.Equal([["Gertrude Brauner", "Gertrude Lindsay"], ["Harry Lindsay"]], Variants(husband));
    }

    [Fact]
    public void Two_women_of_one_given_name_stay_two_without_a_marriage_or_with_a_kinship_word()
    {
        Assert.Equal(2, BuildText("In New York she was Eve Klein. Eve Stern lived next door.", ("Eve Klein", English), ("Eve Stern", English)).Headings.Length);
        Assert.Equal(2, BuildText("After she married, Eve Klein moved. My cousin Eve Stern stayed.", ("Eve Klein", English), ("Eve Stern", English)).Headings.Length);
    }

    [Fact]
    public void Marriage_words_are_read_in_every_listed_language()
    {
        Assert.True(Loaded.Value.Lists.Cues.SpeaksOfMarriage(["megismertem", "a", "férjemet,"]));
        Assert.True(Loaded.Value.Lists.Cues.SpeaksOfMarriage(["when", "she", "married."]));
        Assert.False(Loaded.Value.Lists.Cues.SpeaksOfMarriage(["we", "moved", "to", "Vienna"]));
    }

    /// <summary>"η Σοφία" is Greek for "Sofia" with the article (standard usage, from memory); Sofia is
    /// also Bulgaria's capital in the shipped gazetteer. The cue-marked person names the same word said
    /// in another script.</summary>
    [Fact]
    public void A_name_a_cue_marked_as_a_person_is_that_person_in_another_script()
    {
        const string text = "My mother, Sofia, was from Kavala. Η μάνα μου η Σοφία έψηνε ψωμί.";
        int latin = text.IndexOf("Sofia", StringComparison.Ordinal), greek = text.IndexOf("Σοφία", StringComparison.Ordinal);
        var mentions = ImmutableArray.Create(
            new Mention(new TurnId(0), new CharSpan(latin, latin + 5), "Sofia", NameLabel.PER, English, 1.0, MentionSource.Cue),
            new Mention(new TurnId(0), new CharSpan(greek, greek + 5), "Σοφία", NameLabel.LOC, new LanguageCode("el"), 1.0, MentionSource.Gazetteer));
        var times = ImmutableArray.Create(new TimeRange(Timecode.Zero, new Timecode(500)), new TimeRange(new Timecode(1000), new Timecode(1500)));
        var turn = new Turn(new TurnId(0), "Evangelia", "Evangelia", new TimeRange(Timecode.Zero, new Timecode(2000)), text, []);
        var heading = Assert.Single(new HeadingBuilder(Loaded.Value.Lexicon).Build(mentions, times, [turn]).Headings);
        Assert.Equal(NameLabel.PER, heading.Label);
        Assert.Equal([mentions[0].Text, mentions[1].Text], heading.Variants.ToArray());
    }

    /// <summary>Naming phrases of Languages/*/naming-phrases.tsv ("called me", "called him"; common
    /// usage, known from memory). Mausi and Bubi are pet names in no list.</summary>
    [Fact]
    public void A_name_a_naming_phrase_gives_is_the_speaker_or_the_person_just_named()
    {
        var self = BuildText("This is Markéta Hellerová. Avraham always called me Mausi.",
            [("Markéta Hellerová", Czech), ("Avraham", English), ("Mausi", English)], "Markéta");
        Assert.Equal([["Avraham"], ["Markéta Hellerová", "Mausi"]], Variants(self));

        var other = BuildText("One brother, Jozef. We called him Bubi. And my mother, Ilona, my father called her Mausi.",
            ("Jozef", Slovak), ("Bubi", English), ("Ilona", English), ("Mausi", English));
        Assert.Equal([["Ilona", "Mausi"], ["Jozef", "Bubi"]], Variants(other));
    }

    /// <summary>Avraham is in no first-name list but in name-equivalents.tsv (he:Avraham): a model
    /// organisation of two words opening with it is a person.</summary>
    [Fact]
    public void A_model_organisation_opening_with_a_known_given_name_is_a_person()
    {
        const string text = "Here I married Avraham Shapira, and we lived in Haifa.";
        int at = text.IndexOf("Avraham", StringComparison.Ordinal);
        var mention = new Mention(new TurnId(0), new CharSpan(at, at + 15), "Avraham Shapira", NameLabel.ORG, English, 0.8, MentionSource.Model);
        var turn = new Turn(new TurnId(0), "Markéta", "Markéta", new TimeRange(Timecode.Zero, new Timecode(2000)), text, []);
        var result = new HeadingBuilder(Loaded.Value.Lexicon).Build([mention], [new TimeRange(Timecode.Zero, new Timecode(500))], [turn]);
        Assert.Equal(NameLabel.PER, Assert.Single(result.Headings).Label);
    }

    /// <summary>Went-by phrases of Languages/*/naming-phrases.tsv: a wartime or married name said
    /// right after "I was" / Polish "byłam" is the narrator's (common usage, known from memory); a
    /// possessive after the name, or a comma between, names no alias.</summary>
    [Fact]
    public void A_name_the_speaker_says_she_went_by_joins_her_heading()
    {
        const string text = "My name is Barbara Zielińska. For two years I was Marysia Kwiatkowska, a niece from Radom. Byłam Marysią Kwiatkowską.";
        var told = BuildText(text, [("Barbara Zielińska", English), ("Marysia Kwiatkowska", English), ("Marysią Kwiatkowską", Polish)], "Barbara");
        Assert.True(told.Headings.Length == 1, string.Join(" / ", told.Headings.Select(h => string.Join(", ", h.Variants))));
        var heading = told.Headings[0];
        Assert.Equal(3, heading.Mentions.Length);

        const string possessive = "My name is Barbara Zielińska. I was Marysia Kwiatkowska's friend.";
        Assert.Equal(2, BuildText(possessive, [("Barbara Zielińska", English), ("Marysia Kwiatkowska", English)], "Barbara").Headings.Length);
        const string comma = "My name is Barbara Zielińska. Who was there? I was, Marysia Kwiatkowska was.";
        Assert.Equal(2, BuildText(comma, [("Barbara Zielińska", English), ("Marysia Kwiatkowska", English)], "Barbara").Headings.Length);
    }

    /// <summary>Relations of Languages/*/kinship.tsv (the glosses: father and ojciec a parent, brother and
    /// brat a sibling): a son named like his father is another person, and so is the short form said
    /// of him (Staś for Stanisław, common Polish usage known from memory); "my mother's brother" is no
    /// brother of the speaker, so "my uncle Joaquim" is the same man.</summary>
    [Fact]
    public void A_father_and_a_brother_of_one_given_name_are_two_persons()
    {
        const string text = "My father, Stanisław Zieliński, was a tailor. I had one brother. Stanisław, like Tata, but at home he was Staś.";
        var told = BuildText(text, [("Stanisław Zieliński", English), ("Stanisław", English), ("Staś", English)], "Barbara");
        Assert.Equal(2, told.Headings.Length);
        Assert.Equal(["Stanisław", "Staś"], told.Headings.Single(h => h.Name != "Stanisław Zieliński").Variants.Order(StringComparer.Ordinal).ToArray());

        const string uncle = "My uncle, my mother's brother, Joaquim Sousa, had a boat. My uncle Joaquim took me fishing.";
        Assert.Single(BuildText(uncle, [("Joaquim Sousa", English), ("Joaquim", English)], "Manuel").Headings);
    }

    /// <summary>Titles of Languages/*/titles.tsv with their sex (German Herr and Frau, English Mrs.;
    /// common usage, known from memory): a surname said after titles of both sexes names a husband and
    /// a wife, shown with their titles; "Mrs." before a surname two full names share is the woman's.
    /// Oksana and Stepan are listed in Cyrillic only (Languages/uk/first-names.tsv, from
    /// @faker-js/faker, checked with grep), read through the romanisation table.</summary>
    [Fact]
    public void Titles_of_two_sexes_before_one_surname_name_two_persons()
    {
        const string text = "The farmer, Herr Huber, was kind. Frau Huber gave me a coat.";
        var told = BuildText(text, [("Huber", English), ("Huber", English)], "Oksana");
        Assert.Equal(["Frau Huber", "Herr Huber"], told.Headings.Select(h => h.Name).Order(StringComparer.Ordinal).ToArray());

        const string couple = "I am Oksana Hrytsenko. Mrs. Hrytsenko, they said. There I met Stepan Hrytsenko.";
        var married = BuildText(couple, [("Oksana Hrytsenko", English), ("Hrytsenko", English), ("Stepan Hrytsenko", English)], "Oksana");
        Assert.Equal([["Oksana Hrytsenko", "Hrytsenko"], ["Stepan Hrytsenko"]], Variants(married));
    }

    /// <summary>The romanisation table (models/lexicon/Transliteration/cyrillic-latin.tsv) gives the
    /// soft sign no letter, as BGN/PCGN's ' (known from memory): Ольга is Olga, and Фрося, the
    /// listed short form of Ефросинья (Languages/ru/hypocoristics.tsv), meets Efrosinya.</summary>
    [Fact]
    public void A_soft_sign_leaves_no_mark_in_a_names_key()
    {
        var lexicon = Loaded.Value.Lexicon;
        Assert.True(lexicon.SameGivenName("Olga", English, "Ольга", Russian));
        Assert.True(lexicon.SameGivenName("Efrosinya", English, "Фрося", Russian));
        Assert.True(lexicon.IsFirstName("Oksana"));
        Assert.Equal('f', lexicon.GivenNameSex("Oksana"));
        Assert.Equal('m', lexicon.GivenNameSex("Stepan"));
    }

    /// <summary>Became phrases of Languages/en/naming-phrases.tsv ("she became", "became"; common
    /// usage, known from memory): the new name is the subject's, and "she" passes over a man said in
    /// between (Avram: m in Languages/ro/first-names.tsv, from @faker-js/faker, checked with grep).</summary>
    [Fact]
    public void A_name_someone_became_joins_the_subjects_heading()
    {
        const string text = "There Rozica married Avram Segal, and she became Shoshana Segal.";
        var told = BuildText(text, [("Rozica", English), ("Avram Segal", English), ("Shoshana Segal", English)], "Charlotte");
        Assert.Equal([["Avram Segal"], ["Rozica", "Shoshana Segal"]], Variants(told));

        const string bare = "In America Tibor became Ted Greenfield.";
        Assert.Single(BuildText(bare, [("Tibor", English), ("Ted Greenfield", English)], "Ilona").Headings);
        const string apart = "My brother Tibor stayed home. In America she became Anna Greenfield.";
        Assert.Equal(2, BuildText(apart, [("Tibor", English), ("Anna Greenfield", English)], "Ilona").Headings.Length);
    }

    /// <summary>Named phrases of Languages/en/naming-phrases.tsv ("we named"; common usage, known from
    /// memory): a daughter named for her mother is another person, and a later short form (Марійка,
    /// listed for Марія in Languages/uk/hypocoristics.tsv) is the daughter's, said last.</summary>
    [Fact]
    public void A_child_named_for_a_parent_is_another_person()
    {
        const string text = "Mama was Марія, she sang. Our daughter we named Maria, for my mother. Марійка teaches here.";
        var told = BuildText(text, [("Марія", new LanguageCode("uk")), ("Maria", English), ("Марійка", new LanguageCode("uk"))], "Oksana");
        Assert.Equal([["Maria", "Марійка"], ["Марія"]], Variants(told));
    }

    /// <summary>Czech "rozená" before a birth name (Languages/cs/birth-name-markers.txt; standard usage,
    /// known from memory) after a one-word given name; Berta is no man's name in the first-name lists.
    /// And a kinship word inside another phrase ("pro babičku", for grandma) gives the name after it no
    /// relation: Heinrich, the German equivalent of Jindřich (name-equivalents.tsv), said beside
    /// Jindřich, is the father named before.</summary>
    [Fact]
    public void A_birth_name_after_a_given_name_and_a_kinship_word_in_another_phrase()
    {
        const string text = "Maminka se jmenovala Berta, rozená Fischerová.";
        Assert.Single(BuildText(text, [("Berta", Czech), ("Fischerová", Czech)], "Zuzana").Headings);

        const string father = "My father, Jindřich Sýkora, had a shop. Tatínek byl pro babičku vždycky Heinrich, nikdy Jindřich.";
        Assert.Single(BuildText(father, [("Jindřich Sýkora", English), ("Heinrich", Czech), ("Jindřich", Czech)], "Zuzana").Headings);
    }

    /// <summary>Polish "Pani" is a title for women (Languages/pl/titles.tsv; common usage, known from
    /// memory): said by the narrator before a surname that her own wartime name shares, it names the
    /// other woman of that surname.</summary>
    [Fact]
    public void A_titled_surname_the_speaker_says_is_not_her_own_name()
    {
        const string text = "My name is Barbara Zielińska. A woman, pani Irena Kwiatkowska, took me out. For two years I was Marysia Kwiatkowska. Pani Kwiatkowska I found again.";
        var told = BuildText(text, [("Barbara Zielińska", English), ("Irena Kwiatkowska", Polish), ("Marysia Kwiatkowska", English), ("Kwiatkowska", Polish)], "Barbara");
        Assert.Contains(told.Headings, h => h.Variants.Order(StringComparer.Ordinal).SequenceEqual(["Irena Kwiatkowska", "Kwiatkowska"]));
    }

    /// <summary>The label vote compares a name only with the given names sharing a bucket with it, so every
    /// pair the lists call one given name must share one: listed short forms (Pepík for Josef, Фрося for
    /// Ефросинья; Languages/cs and ru/hypocoristics.tsv), productive diminutives (Hanka), case forms
    /// (Slovak instrumental Imrichom; Greek accusative Γιώργο) and other scripts (Giorgos).</summary>
    [Theory]
    [InlineData("Josef", "cs", "Pepík", "cs")]
    [InlineData("Efrosinya", "en", "Фрося", "ru")]
    [InlineData("Hanna", "pl", "Hanka", "pl")]
    [InlineData("Imrich", "sk", "Imrichom", "sk")]
    [InlineData("Giorgos", "en", "Γιώργο", "el")]
    public void Names_the_lists_call_one_given_name_share_a_bucket(string a, string languageA, string b, string languageB)
    {
        var lexicon = Loaded.Value.Lexicon;
        LanguageCode la = new(languageA), lb = new(languageB);
        Assert.True(lexicon.SameGivenName(a, la, b, lb), $"{a} / {b}");
        Assert.True(lexicon.GivenNameBuckets(a, la).Intersect(lexicon.GivenNameBuckets(b, lb)).Any(), $"{a} / {b}");
    }
}
