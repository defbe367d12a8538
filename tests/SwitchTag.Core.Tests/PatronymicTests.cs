using SwitchTag.Core.Languages;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Russian and Ukrainian patronymics and a case form of one (standard grammar, known from
/// memory), against the language profiles' Languages/ru and uk/patronymics.txt.</summary>
public class PatronymicTests
{
    [Theory]
    [InlineData("Петрович", true)]
    [InlineData("Петровича", true)]
    [InlineData("Petrivna", true)]
    [InlineData("Ivanovna", true)]
    [InlineData("Petrović", false)]
    [InlineData("Kowalczyk", false)]
    public void Patronymics_and_their_case_forms_are_told_from_other_words(string word, bool patronymic) =>
        Assert.Equal(patronymic, LanguageProfiles.Default.IsPatronymic(word, caseLetters: 2));

    [Fact]
    public void Without_case_letters_only_the_dictionary_form_counts()
    {
        Assert.True(LanguageProfiles.Default.IsPatronymic("Петрович"));
        Assert.False(LanguageProfiles.Default.IsPatronymic("Петровича"));
    }
}
