using SwitchTag.Tagging.Sources.Model;
using SwitchTag.Tagging;
using Xunit;

namespace SwitchTag.Tagging.Tests;

public class TrainedScriptsTests
{
    [Theory]
    // Script membership per the Unicode code charts (Basic Latin, Latin-1, Latin Extended-A/B,
    // Latin Extended Additional, CJK Unified Ideographs): block ranges from memory of the charts.
    [InlineData("Kraków", true)]
    [InlineData("Łódź", true)]
    [InlineData("Nguyễn", true)]
    [InlineData("北京", true)]
    [InlineData("מײַן קינד", false)] // Hebrew script (Yiddish)
    [InlineData("Москва", false)]   // Cyrillic
    [InlineData("123 -", false)]
    public void Model_mentions_are_kept_only_in_trained_scripts(string text, bool covered) =>
        Assert.Equal(covered, TrainedScripts.Covers(text));
}
