using System.Text.Json;
using SwitchTag.Pipeline;
using SwitchTag.Tagging;
using Xunit;
using SwitchTag.Tests.Shared;
using SwitchTag.Core.Languages;

namespace SwitchTag.Pipeline.Tests;

/// <summary>Per-source and per-language scores of <c>eval ner</c>. Expected counts follow
/// conlleval's exact-chunk rules (CoNLL-2000 conlleval.pl, from memory), computed by hand for
/// each group; file names are those of the shared data (README of ../shared/data).</summary>
public class NerReportTests
{
    [Theory]
    [InlineData("/d/ner/uner/English-EWT/en_ewt-ud-test.iob2", "English-EWT", "en")]
    [InlineData("/d/ner-extra/multileg/multileg-pl-test.tsv", "multileg", "pl")]
    [InlineData("/d/ner-extra/ehri-ner/ehri_yi.tsv", "ehri-ner", "yi")]
    [InlineData("/tmp/switchtag-ner-test/GermEval2014/de-test.tsv", "GermEval2014", "de")]
    [InlineData("/d/ner-extra/factrueval2016/factrueval-test.tsv", "factrueval2016", "und")]
    public void SourceIsTheFolderAndLanguageTheFirstTwoLetterToken(string path, string source, string language) =>
        Assert.Equal(new GoldFileLabel(source, new LanguageCode(language)), GoldFileLabel.Of(path));

    [Fact]
    public void GroupsPoolTheirOwnFilesOnly()
    {
        GoldSentence S(params string[] tags) => new([.. tags.Select((_, i) => "w" + i)], tags, 1);
        var files = new List<(GoldFileLabel, IReadOnlyList<GoldSentence>)>
        {
            (new("A", new LanguageCode("de")), [S("B-PER", "I-PER", "O"), S("B-LOC")]),
            (new("B", new LanguageCode("de")), [S("B-ORG", "O")]),
            (new("A", new LanguageCode("pl")), [S("O", "B-LOC")]),
        };
        IReadOnlyList<string>[] predicted =
        [
            ["B-PER", "I-PER", "O"],  // PER exact: correct
            ["B-ORG"],                // LOC missed, spurious ORG
            ["B-ORG", "O"],           // ORG correct
            ["B-LOC", "I-LOC"],       // too long: wrong, LOC missed
        ];
        var report = NerEvaluation.Score(files, predicted);
        // Pooled: gold PER 1, LOC 2, ORG 1 = 4; predicted PER, ORG, ORG, LOC = 4; correct 2.
        Assert.Equal(new PrfScore(2, 4, 4), report.Overall["micro"]);
        // Source A: files 1 and 3: gold PER, LOC, LOC; predicted PER, ORG, LOC(wrong); correct 1.
        Assert.Equal(new PrfScore(1, 3, 3), report.BySource["A"]["micro"]);
        Assert.Equal(new PrfScore(1, 1, 1), report.BySource["B"]["micro"]);
        // Language de: files 1 and 2: gold PER, LOC, ORG; predicted PER, ORG, ORG; correct 2.
        Assert.Equal(new PrfScore(2, 3, 3), report.ByLanguage["de"]["micro"]);
        Assert.Equal(new PrfScore(0, 1, 1), report.ByLanguage["pl"]["micro"]);
        Assert.Equal(["A", "B"], report.BySource.Keys);

        var json = JsonDocument.Parse(NerEvaluation.ToJson(report)).RootElement;
        Assert.Equal(["micro", "PER", "LOC", "ORG", "bySource", "byLanguage"], json.EnumerateObject().Select(p => p.Name));
        Assert.Equal(3, json.GetProperty("byLanguage").GetProperty("de").GetProperty("goldNames").GetInt32());
        Assert.Equal(0.6667, json.GetProperty("byLanguage").GetProperty("de").GetProperty("micro").GetProperty("f1").GetDouble());
    }

    [Fact]
    public void LowercaseFlagScoresTheSameAsALowerCasedFile()
    {
        // Universal NER v1, Danish-DDT test split (CC BY-SA 4.0): the first 60 sentences, written
        // once as they are and once lower-cased by hand here; --lowercase on the first must give
        // exactly the scores of the second, and gold names are the same in both.
        var source = TestPaths.RequireData("ner/uner/Danish-DDT/da_ddt-ud-test.iob2");
        var sentences = GoldReader.Read(source, []).Take(60).ToList();
        var dir = Path.Combine(Path.GetTempPath(), $"switchtag-eval-{Guid.NewGuid():N}");
        var cased = Path.Combine(dir, "Danish-DDT", "da-test.tsv");
        var lower = Path.Combine(dir, "Danish-DDT-lower", "da-test.tsv");
        Directory.CreateDirectory(Path.GetDirectoryName(cased)!);
        Directory.CreateDirectory(Path.GetDirectoryName(lower)!);
        try
        {
            File.WriteAllText(cased, Conll(sentences, w => w));
            File.WriteAllText(lower, Conll(sentences, w => w.ToLowerInvariant()));
            var viaFlag = Json(cased, lowercase: true);
            var viaFile = Json(lower, lowercase: false);
            var asWritten = Json(cased, lowercase: false);
            Assert.Equal(viaFile.GetProperty("micro").ToString(), viaFlag.GetProperty("micro").ToString());
            Assert.Equal(
                asWritten.GetProperty("bySource").GetProperty("Danish-DDT").GetProperty("goldNames").GetInt32(),
                viaFlag.GetProperty("bySource").GetProperty("Danish-DDT").GetProperty("goldNames").GetInt32());
            Assert.Equal(["da"], viaFlag.GetProperty("byLanguage").EnumerateObject().Select(p => p.Name));
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    [Fact]
    public void ManyFilesAreReportedPerSourceAndLanguage()
    {
        // Universal NER v1 test splits (CC BY-SA 4.0) of Danish-DDT and Swedish-Talbanken: the
        // per-source gold counts add up to the pooled one, and each source equals its file's own run.
        var da = TestPaths.RequireData("ner/uner/Danish-DDT/da_ddt-ud-test.iob2");
        var sv = TestPaths.RequireData("ner/uner/Swedish-Talbanken/sv_talbanken-ud-test.iob2");
        var output = new StringWriter();
        Assert.Equal(NameEvaluationResult.Scored, NameModelEvaluation.Run([da, sv], json: true, output, new StringWriter()));
        var both = JsonDocument.Parse(output.ToString()).RootElement;
        var sources = both.GetProperty("bySource");
        Assert.Equal(["Danish-DDT", "Swedish-Talbanken"], sources.EnumerateObject().Select(p => p.Name));
        Assert.Equal(["da", "sv"], both.GetProperty("byLanguage").EnumerateObject().Select(p => p.Name));
        var gold = sources.EnumerateObject().Sum(p => p.Value.GetProperty("goldNames").GetInt32());
        var daAlone = Json(da, lowercase: false);
        Assert.Equal(daAlone.GetProperty("micro").ToString(), sources.GetProperty("Danish-DDT").GetProperty("micro").ToString());
        Assert.Equal(gold, daAlone.GetProperty("bySource").GetProperty("Danish-DDT").GetProperty("goldNames").GetInt32()
            + Json(sv, lowercase: false).GetProperty("bySource").GetProperty("Swedish-Talbanken").GetProperty("goldNames").GetInt32());
    }

    private static JsonElement Json(string path, bool lowercase)
    {
        var output = new StringWriter();
        Assert.Equal(NameEvaluationResult.Scored, NameModelEvaluation.Run([path], json: true, output, new StringWriter(), lowercase: lowercase));
        return JsonDocument.Parse(output.ToString()).RootElement;
    }

    private static string Conll(IEnumerable<GoldSentence> sentences, Func<string, string> word) =>
        string.Concat(sentences.Select(s => string.Concat(s.Words.Select((w, i) => $"{word(w)}\t{s.Tags[i]}\n")) + "\n"));
}
