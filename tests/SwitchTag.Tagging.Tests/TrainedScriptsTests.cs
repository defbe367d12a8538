using SwitchTag.Tagging.Sources.Model;
using SwitchTag.Tagging;
using Xunit;

namespace SwitchTag.Tagging.Tests;

public class TrainedScriptsTests
{
    [Theory]
    // Script membership per the Unicode code charts (Basic Latin, Latin-1, Latin Extended-A/B,
    // Latin Extended Additional, Cyrillic, Hebrew, Greek and Coptic, Arabic, CJK Unified
    // Ideographs): block ranges from memory of the charts. The model's training sets per script
    // are listed in models/ner.md.
    [InlineData("Kraków", true)]
    [InlineData("Łódź", true)]
    [InlineData("Nguyễn", true)]
    [InlineData("北京", true)]
    [InlineData("מײַן קינד", true)]  // Hebrew script (Yiddish: EHRI-NER)
    [InlineData("Москва", true)]     // Cyrillic (Russian: WikiNER, FactRuEval)
    [InlineData("Αθήνα", false)]     // Greek: no training set
    [InlineData("القاهرة", false)]   // Arabic: no training set
    [InlineData("123 -", false)]
    public void Model_mentions_are_kept_only_in_trained_scripts(string text, bool covered) =>
        Assert.Equal(covered, TrainedScripts.Covers(text));
}
