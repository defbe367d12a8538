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

    private static string[] Persons(string text) =>
        [.. new PersonCueSource(Lists.Cues, Lists.NotPlaces, Gazetteer.Empty).Find(new TurnId(0), text, []).Select(m => m.Text)];

    [Theory]
    [InlineData("Our teacher was Lidiya Petrovna, very strict.", "Lidiya Petrovna")]
    [InlineData("Нас учил Иван Петрович Сидоров.", "Иван Петрович Сидоров")]
    [InlineData("Вчителька Ганна Іванівна прийшла.", "Ганна Іванівна")]
    public void A_given_name_with_a_patronymic_is_a_person(string text, string person) =>
        Assert.Equal([person], Persons(text));

    [Fact]
    public void A_word_ending_like_a_patronymic_alone_is_no_cue() =>
        Assert.Empty(Persons("We went to Baranovichi and then to Kyiv."));
}
