using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Training;

namespace SwitchTag.LanguageId.Tests;

/// <summary>Training with a word list beside the running text. Lines from ../shared/data/lid/de.txt and
/// lb.txt (Universal Dependencies); the list's words are Luxembourgish from memory.</summary>
[Collection(nameof(ModelCollection))]
public sealed class WordListTrainingTests(ModelFixture fixture)
{
    private static readonly Vocabulary Luxembourgish = new("lb",
        ["Schwëster", "Schwësteren", "gëschter", "haut", "muer", "Kaffi", "Moien", "Äddi", "wéivill", "Wieder", "Bréiwer", "Frënn"], "test");

    private CodeSwitchSegmenter Train(IReadOnlyList<Vocabulary> lists) =>
        new(ModelTrainer.Train(fixture.Corpus.Where(l => l.Code is "de" or "lb").ToList(), lists,
            new TrainingOptions(FitSwitching: false), TextWriter.Null).Model);

    [Fact]
    public void AWordOnlyTheListHasCountsForItsLanguage()
    {
        // "Schwëster" is in neither language's lines: German n-grams win it until the list has it.
        Assert.Equal("de", Train([]).Identify("Schwëster").Language);
        Assert.Equal("lb", Train([Luxembourgish]).Identify("Schwëster").Language);
    }

    [Fact]
    public void ListsAreReadSortedWithoutRepeats()
    {
        var folder = Directory.CreateTempSubdirectory();
        try
        {
            File.WriteAllLines(Path.Combine(folder.FullName, "sr-Latn.txt"), ["kuća", "", "beograd", "kuća"]);
            var list = Assert.Single(Vocabulary.Load(folder.FullName));
            Assert.Equal("sr-Latn", list.Class);
            Assert.Equal(["beograd", "kuća"], list.Words.ToArray());
        }
        finally { folder.Delete(true); }
    }
}
