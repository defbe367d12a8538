using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.Tests;

public class AuthorityListTests
{
    private static AuthorityList Parse(string csv)
    {
        var (list, problems) = AuthorityList.Parse(csv, "list.csv");
        Assert.Empty(problems);
        return list;
    }

    [Fact]
    public void Load_reads_quoted_fields_variants_and_line_numbers()
    {
        // Quoting per RFC 4180 §2 rules 5–7: commas, doubled quotes and a line break inside fields.
        var path = Path.Combine(Path.GetTempPath(), $"authority-{Guid.NewGuid():N}.csv");
        File.WriteAllText(path,
            "label,name,variants\r\n" +
            "PER,\"Kowalczyk, Anna\",\"Anna Kowalczyk|Ania \"\"Hania\"\" Kowalczyk\"\r\n" +
            "ORG,\"Polish\r\nScouting Association\",ZHP\r\n" +
            "LOC,Lwów,Lviv|Lemberg|Львів\r\n");
        try
        {
            var (list, problems) = AuthorityList.Load(path);
            Assert.Empty(problems);
            Assert.Equal(3, list.Entries.Length);
            Assert.Equal("Kowalczyk, Anna", list.Entries[0].Name);
            Assert.Equal(["Anna Kowalczyk", "Ania \"Hania\" Kowalczyk"], list.Entries[0].Variants.ToArray());
            Assert.Equal("Polish\r\nScouting Association", list.Entries[1].Name);
            Assert.Equal(new SourceLine(path, 3), list.Entries[1].At);
            Assert.Equal(new SourceLine(path, 5), list.Entries[2].At); // the quoted line break moved it down
            Assert.Equal(NameLabel.LOC, list.Entries[2].Label);
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void Bad_rows_become_diagnostics_with_file_and_line()
    {
        var (list, problems) = AuthorityList.Parse(
            "label,name,variants\nPER,Anna Kowalczyk,\nXYZ,Somebody,\nLOC,\nPER,a,b,c\nLOC,\"Kraków\",\"x\"y\n", "list.csv");
        Assert.Single(list.Entries);
        Assert.Equal(["list.csv:3", "list.csv:4", "list.csv:5", "list.csv:6"], problems.Select(p => p.At.ToString()));
        Assert.All(problems, p => Assert.Equal(Severity.Error, p.Severity));
    }

    [Fact]
    public void Missing_file_is_a_diagnostic_not_an_exception()
    {
        var (list, problems) = AuthorityList.Load("/nonexistent/authority.csv");
        Assert.Empty(list.Entries);
        Assert.Equal("/nonexistent/authority.csv:1", Assert.Single(problems).At.ToString());
    }

    [Fact]
    public void Find_matches_inflected_forms_with_offsets_into_the_text()
    {
        var list = Parse("label,name,variants\nLOC,Kraków,Krakow|Cracow\nPER,Anna Kowalczyk,\n");
        const string text = "Urodziłam się w Krakowie, a Anna Kowalczyk też.";
        var matches = list.Find(text, new LanguageCode("pl"));
        Assert.Equal(2, matches.Length);
        Assert.Equal("Krakowie", text[matches[0].CharStart..matches[0].CharEnd]);
        Assert.Equal("Kraków", matches[0].Canonical);
        Assert.Equal(MentionSource.Authority, matches[0].Source);
        Assert.Equal("Anna Kowalczyk", text[matches[1].CharStart..matches[1].CharEnd]);
        Assert.Equal(list.Entries[1].Name, matches[1].Canonical);
    }

    [Fact]
    public void Find_in_english_text_falls_back_to_the_inflection_rules()
    {
        var list = Parse("label,name,variants\nLOC,Warszawa,Warsaw\n");
        const string text = "We lived in Warsaw, w Warszawie, you know.";
        var matches = list.Find(text, new LanguageCode("en"));
        Assert.Equal(["Warsaw", "Warszawie"], matches.Select(m => text[m.CharStart..m.CharEnd]));
    }

    [Fact]
    public void Find_takes_the_longest_match_first_and_respects_word_boundaries()
    {
        var list = Parse("label,name,variants\nLOC,Nowy Sącz,\nLOC,Sącz,\nPER,Jan,\n");
        const string text = "W Nowym Sączu mieszkał Janek, nie Jan.";
        var matches = list.Find(text, new LanguageCode("pl"));
        Assert.Equal(["Nowym Sączu", "Jan"], matches.Select(m => text[m.CharStart..m.CharEnd]));
    }

    [Fact]
    public void One_word_entries_need_a_capital()
    {
        var list = Parse("label,name,variants\nPER,Rose,\n");
        Assert.Empty(list.Find("the rose garden", new LanguageCode("en")));
        Assert.Single(list.Find("Rose said so", new LanguageCode("en")));
    }

    [Fact]
    public void A_listed_person_is_never_a_place_and_a_place_never_a_person()
    {
        var list = Parse("label,name,variants\nPER,Paris Hilton,\nLOC,Paris,\nPER,Jordan,\nORG,Lech Poznań,Lech\n");
        const string text = "Paris Hilton flew to Paris; Jordan met Lech fans.";
        var matches = list.Find(text, new LanguageCode("en"));
        Assert.Equal(
            [("Paris Hilton", NameLabel.PER), ("Paris", NameLabel.LOC), ("Jordan", NameLabel.PER), ("Lech", NameLabel.ORG)],
            matches.Select(m => (text[m.CharStart..m.CharEnd], m.Label)));
        Assert.All(matches, m => Assert.Equal(list.Entries.First(e => e.Name == m.Canonical).Label, m.Label));
    }

    [Fact]
    public void The_same_name_under_two_labels_warns_and_the_earlier_row_wins()
    {
        var (list, problems) = AuthorityList.Parse("label,name,variants\nPER,Jordan,\nLOC,Jordan,\n", "list.csv");
        Assert.Equal("list.csv:3", Assert.Single(problems).At.ToString());
        Assert.Equal(NameLabel.PER, Assert.Single(list.Find("Jordan", new LanguageCode("en"))).Label);
    }

    [Fact]
    public void IsKnownName_knows_words_of_listed_names_as_written()
    {
        var list = Parse("label,name,variants\nPER,Anna Kowalczyk,\nLOC,Jedwabne,\n");
        Assert.True(list.IsKnownName("Kowalczyk"));
        Assert.True(list.IsKnownName("Jedwabne"));
        Assert.False(list.IsKnownName("kowalczyk"));   // not capitalised
        Assert.False(list.IsKnownName("Kowalczyka"));  // an inflected form carries its language
        Assert.False(list.IsKnownName("Warszawa"));
    }

    [Fact]
    public void Union_of_lexicons_knows_what_either_knows()
    {
        var people = Parse("label,name,variants\nPER,Anna Kowalczyk,\n");
        var places = Parse("label,name,variants\nLOC,Jedwabne,\n");
        var union = new NameLexiconUnion(people, places);
        Assert.True(union.IsKnownName("Kowalczyk"));
        Assert.True(union.IsKnownName("Jedwabne"));
        Assert.False(union.IsKnownName("Jedwabnem"));
    }

    [Fact]
    public void Multi_word_names_may_span_a_line_break_but_not_a_comma()
    {
        var list = Parse("label,name,variants\nLOC,Nowy Sącz,\nLOC,St. Louis,\n");
        Assert.Single(list.Find("born in Nowy\nSącz", new LanguageCode("pl")));         // a cue's lines are joined by '\n'
        Assert.Empty(list.Find("Nowy, Sącz", new LanguageCode("pl")));
        const string text = "then St. Louis";
        var m = Assert.Single(list.Find(text, new LanguageCode("en")));
        Assert.Equal("St. Louis", text[m.CharStart..m.CharEnd]);
    }
}
