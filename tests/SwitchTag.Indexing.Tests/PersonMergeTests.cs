using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Indexing.Decisions;
using SwitchTag.Indexing.Tests.Fakes;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests;

/// <summary>One heading per person where the interview supports it (issue 10, item 4: certain merges
/// made, probable ones shown as "possibly the same person"). Names and sentences are invented; the
/// equivalence Stanisław / Stanley is the usual adopted English form (known from memory, and listed in
/// models/lexicon/name-equivalents.tsv).</summary>
public class PersonMergeTests
{
    private static readonly FakeLexicon Lexicon = new(new Dictionary<string, ImmutableArray<PlaceLink>>(), equivalents: [("Stanisław", "Stanley")],
        firstNames: new HashSet<string> { "Ernesto", "Pedro", "Walter", "Samuel", "Stanley", "Ivan", "Anna", "El" });

    /// <summary>One turn of <paramref name="text"/> said by <paramref name="speaker"/>; each name is
    /// a PER mention at its n-th occurrence in the text (names in order of appearance).</summary>
    private static HeadingResult Build(string speaker, string text, params string[] names)
    {
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        int from = 0;
        foreach (var name in names)
        {
            int at = text.IndexOf(name, from, StringComparison.Ordinal);
            Assert.True(at >= 0, name);
            mentions.Add(new Mention(new TurnId(0), new CharSpan(at, at + name.Length), name, NameLabel.PER, new LanguageCode("en"), 0.9, MentionSource.Model));
            from = at + name.Length;
        }
        var times = mentions.Select((_, i) => new TimeRange(new Timecode(i * 1000), new Timecode(i * 1000 + 500))).ToImmutableArray();
        var turn = new Turn(new TurnId(0), speaker, speaker, new TimeRange(Timecode.Zero, new Timecode(100_000)), text, []);
        return new HeadingBuilder(Lexicon).Build(mentions.ToImmutable(), times, [turn]);
    }

    private static string Filler(int words) => string.Join(' ', Enumerable.Repeat("and then", words / 2));

    [Fact]
    public void A_lone_surname_beside_several_full_names_joins_the_one_naming_the_speaker()
    {
        const string text = "My name is Walter Lindner. My father, Samuel Lindner, was a tailor. Mister Lindner, thank you.";
        var told = Build("Walter", text, "Walter Lindner", "Samuel Lindner", "Lindner");
        Assert.Equal(2, told.Headings.Length);
        Assert.Equal(["Walter Lindner", "Lindner"], told.Headings.Single(h => h.Name == "Walter Lindner").Variants.ToArray());

        // Said by someone the full names do not name: the surname is not guessed onto either.
        Assert.Equal(3, Build("Miriam", text, "Walter Lindner", "Samuel Lindner", "Lindner").Headings.Length);
    }

    [Fact]
    public void A_nickname_before_a_surname_said_close_to_the_full_name_joins_it()
    {
        const string text = "A friend from the factory, Ernesto Gallardo. Ernesto, Gallardo, yes. El Gordo Gallardo, they called him.";
        var result = Build("Manuel", text, "Ernesto Gallardo", "Ernesto", "Gallardo", "Gordo Gallardo");
        var heading = Assert.Single(result.Headings);
        Assert.Equal(["Ernesto Gallardo", "Ernesto", "Gallardo", "Gordo Gallardo"], heading.Variants.ToArray());

        // With its article, though "El" is listed as a first name (as the shipped French list has it):
        // a stop word of a language profile (SwitchTag.Core/Languages/es/stopwords.txt) is no given name.
        const string withArticle = "A friend from the factory, Ernesto Gallardo. Ernesto, Gallardo, yes. El Gordo Gallardo, they called him.";
        var article = Build("Manuel", withArticle, "Ernesto Gallardo", "Ernesto", "Gallardo", "El Gordo Gallardo");
        Assert.Equal(["Ernesto Gallardo", "Ernesto", "Gallardo", "El Gordo Gallardo"], Assert.Single(article.Headings).Variants.ToArray());
    }

    [Fact]
    public void A_nickname_far_from_the_full_name_is_only_possibly_that_person()
    {
        var text = "Ernesto Gallardo worked with me. " + Filler(HeadingBuilder.TieReachWords + 10) + " Gordo Gallardo came too.";
        var result = Build("Manuel", text, "Ernesto Gallardo", "Gordo Gallardo");
        Assert.Equal(2, result.Headings.Length);
        var ernesto = result.Headings.Single(h => h.Name == "Ernesto Gallardo");
        var gordo = result.Headings.Single(h => h.Name == "Gordo Gallardo");
        Assert.Equal([gordo.Id], ernesto.PossiblySame.ToArray());
        Assert.Equal([ernesto.Id], gordo.PossiblySame.ToArray());
    }

    [Fact]
    public void Two_first_names_with_one_surname_said_together_are_two_persons()
    {
        var result = Build("Manuel", "My uncles Ernesto Gallardo and Pedro Gallardo.", "Ernesto Gallardo", "Pedro Gallardo");
        Assert.Equal(2, result.Headings.Length);
        Assert.All(result.Headings, h => Assert.Empty(h.PossiblySame));
    }

    /// <summary>Ukrainian patronymics end in -ovych (standard grammar, known from memory; listed in
    /// SwitchTag.Core/Languages/uk/patronymics.txt).</summary>
    [Fact]
    public void A_given_name_with_a_patronymic_joins_the_full_name_holding_both()
    {
        var result = Build("Ivan", "My father was Ivan Petrovych Hnatyuk. Ivan Petrovych, everybody called him.", "Ivan Petrovych Hnatyuk", "Ivan Petrovych");
        Assert.Equal(["Ivan Petrovych Hnatyuk", "Ivan Petrovych"], Assert.Single(result.Headings).Variants.ToArray());

        // Beside a full name without it, the patronymic form is only possibly that person.
        var apart = Build("Ivan", "My father was Ivan Hnatyuk. Ivan Petrovych, everybody called him.", "Ivan Hnatyuk", "Ivan Petrovych");
        Assert.Equal(2, apart.Headings.Length);
        var father = apart.Headings.Single(h => h.Name == "Ivan Hnatyuk");
        Assert.Equal([apart.Headings.Single(h => h.Name == "Ivan Petrovych").Id], father.PossiblySame.ToArray());
    }

    [Fact]
    public void A_patronymic_looking_word_another_name_has_as_surname_is_that_surname()
    {
        var result = Build("Ivan", "Anna Borysovych and Pedro Borysovych, her brother.", "Anna Borysovych", "Pedro Borysovych");
        Assert.Equal(2, result.Headings.Length);
        Assert.All(result.Headings, h => Assert.Empty(h.PossiblySame));
    }

    [Fact]
    public void A_listed_equivalent_the_talk_ties_to_a_full_name_is_merged()
    {
        var result = Build("Irena", "And Stanisław, he became Stanley. Stanley Kowalczyk.", "Stanisław", "Stanley Kowalczyk");
        var heading = Assert.Single(result.Headings);
        Assert.Equal(["Stanisław", "Stanley Kowalczyk"], heading.Variants.ToArray());
    }

    [Fact]
    public void An_untied_equivalent_is_only_possibly_the_same_person_and_stays_so_through_decisions()
    {
        var text = "My brother Stanisław. " + Filler(HeadingBuilder.TieReachWords + 10) + " Stanley Kowalczyk sold cars.";
        var result = Build("Irena", text, "Stanisław", "Stanley Kowalczyk");
        Assert.Equal(2, result.Headings.Length);
        var stanislaw = result.Headings.Single(h => h.Name == "Stanisław");
        var stanley = result.Headings.Single(h => h.Name == "Stanley Kowalczyk");
        Assert.Equal([stanley.Id], stanislaw.PossiblySame.ToArray());
        Assert.Equal([stanislaw.Id], stanley.PossiblySame.ToArray());

        // The decision stage rebuilds the headings: the links must come out of it too.
        var mentions = result.Mentions;
        var times = mentions.Select((_, i) => new TimeRange(new Timecode(i * 1000), new Timecode(i * 1000 + 500))).ToImmutableArray();
        var (_, _, after, _) = new DecisionStage([], "x").ApplyToHeadings(mentions, times, result);
        Assert.Equal([stanley.Id], after.Headings.Single(h => h.Name == "Stanisław").PossiblySame.ToArray());
        Assert.Equal([stanislaw.Id], after.Headings.Single(h => h.Name == "Stanley Kowalczyk").PossiblySame.ToArray());
    }

    [Fact]
    public void A_farther_equivalent_ties_only_when_no_other_person_is_named_between()
    {
        var alone = "Stanley Kowalczyk came back. " + Filler(HeadingBuilder.TieWords + 10) + " We still called him Stanisław.";
        Assert.Single(Build("Irena", alone, "Stanley Kowalczyk", "Stanisław").Headings);

        var between = "Stanley Kowalczyk came back. " + Filler(HeadingBuilder.TieWords + 4) + " Then Marek came. We called him Stanisław.";
        var result = Build("Irena", between, "Stanley Kowalczyk", "Marek", "Stanisław");
        Assert.Equal(3, result.Headings.Length);
        var stanley = result.Headings.Single(h => h.Name == "Stanley Kowalczyk");
        Assert.Equal([stanley.Id], result.Headings.Single(h => h.Name == "Stanisław").PossiblySame.ToArray());
    }
}
