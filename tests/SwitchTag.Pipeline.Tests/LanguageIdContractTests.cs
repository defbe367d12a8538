using System.Text.Json;
using SwitchTag.LanguageId.Training;
using SwitchTag.Tests.Shared;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Pipeline.Tests;

/// <summary>The JSON contracts of /work/shared/DESIGN.md ("Contracts other tools rely on"):
/// <c>switchtag langid --lines FILE --json</c> and <c>switchtag eval langid --dir DIR --json</c>.</summary>
[Collection(nameof(ModelCollection))]
public sealed class LanguageIdContractTests(ModelFixture fixture)
{
    [Fact]
    public void LinesJsonHasOneObjectPerInputLineInOrder()
    {
        string[] lines = ["We lived in a small house by the river.", "", "Mieszkaliśmy w małym domu nad rzeką.", "1945"];
        var output = new StringWriter();
        LanguageIdLines.Write(fixture.Segmenter, lines, output, json: true);
        var objects = output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(lines.Length, objects.Length);
        var languages = new List<string>();
        for (int i = 0; i < lines.Length; i++)
        {
            using var doc = JsonDocument.Parse(objects[i]);
            var root = doc.RootElement;
            languages.Add(root.GetProperty("language").GetString()!);
            Assert.InRange(root.GetProperty("confidence").GetDouble(), 0, 1);
            foreach (var span in root.GetProperty("spans").EnumerateArray())
            {
                Assert.InRange(span.GetProperty("start").GetInt32(), 0, lines[i].Length);
                Assert.InRange(span.GetProperty("end").GetInt32(), 0, lines[i].Length);
                Assert.False(string.IsNullOrEmpty(span.GetProperty("language").GetString()));
            }
        }
        Assert.Equal(["en", "und", "pl", "und"], languages);
    }

    [Fact]
    public void LinesAreOneConversationUnlessEachLineIsAsked()
    {
        // Held-out Spanish lines of lid/es.txt (Universal Dependencies), then a one-word turn "sí"
        // ("yes", from memory) that judged alone is easily another language.
        var lines = fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == "es").Take(20).Select(l => l.Text).Append("sí.").ToList();
        var conversation = new StringWriter();
        LanguageIdLines.Write(fixture.Segmenter, lines, conversation, json: true);
        var alone = new StringWriter();
        LanguageIdLines.Write(fixture.Segmenter, lines, alone, json: true, eachLineAlone: true);
        var last = conversation.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(lines.Count, last.Length);
        Assert.Equal(lines.Count, alone.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
        using var doc = JsonDocument.Parse(last[^1]);
        Assert.Equal("es", doc.RootElement.GetProperty("language").GetString());
        Assert.Equal("es", doc.RootElement.GetProperty("spans")[0].GetProperty("language").GetString());
    }

    [Fact]
    public void EvalJsonHasTheDesignShape()
    {
        var dir = Directory.CreateTempSubdirectory("switchtag-evaljson-");
        try
        {
            // Held-out lines of lid/de.txt (Universal Dependencies); zz is no ISO 639 code.
            File.WriteAllLines(Path.Combine(dir.FullName, "de.txt"),
                fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == "de").Take(20).Select(l => l.Text));
            File.WriteAllLines(Path.Combine(dir.FullName, "zz.txt"), ["text"]);
            var result = LanguageIdEvaluation.Evaluate(fixture.Segmenter, dir.FullName);
            using var doc = JsonDocument.Parse(LanguageIdEvaluation.ToJson(result));
            Assert.InRange(doc.RootElement.GetProperty("mean").GetDouble(), 0, 1);
            var de = doc.RootElement.GetProperty("languages").GetProperty("de");
            Assert.Equal(20, de.GetProperty("n").GetInt32());
            Assert.InRange(de.GetProperty("accuracy").GetDouble(), 0, 1);
            Assert.Equal("zz", doc.RootElement.GetProperty("skipped")[0].GetString());
        }
        finally
        {
            dir.Delete(recursive: true);
        }
    }

    [Fact]
    public void LanguagesAreIso639Codes()
    {
        // ISO 639-1 two-letter codes where one exists, else ISO 639-3 (hsb); from memory.
        Assert.All(fixture.Segmenter.Languages, c => Assert.Matches("^[a-z]{2,3}$", c));
        Assert.Contains(new LanguageCode("hsb"), fixture.Segmenter.Languages);
        Assert.Contains(new LanguageCode("hu"), fixture.Segmenter.Languages);
        Assert.Equal(fixture.Segmenter.Languages.Order(), fixture.Segmenter.Languages);
    }

    [Fact]
    public void EvalDirScoresSupportedCodesAndSkipsOthers()
    {
        var dir = Directory.CreateTempSubdirectory("switchtag-evallangid-");
        try
        {
            // Held-out lines of lid/en.txt and lid/fr.txt (Universal Dependencies); xx is no ISO code.
            File.WriteAllLines(Path.Combine(dir.FullName, "en.txt"),
                fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == "en").Take(40).Select(l => l.Text));
            File.WriteAllLines(Path.Combine(dir.FullName, "fr.txt"),
                fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == "fr").Take(40).Select(l => l.Text));
            File.WriteAllLines(Path.Combine(dir.FullName, "xx.txt"), ["some text"]);
            var result = LanguageIdEvaluation.Evaluate(fixture.Segmenter, dir.FullName);
            Assert.Equal(["en", "fr"], result.Languages.Keys);
            Assert.Equal(40, result.Languages["en"].N);
            Assert.Equal(["xx"], result.Skipped);
            Assert.InRange(result.Mean, 0.9, 1);
        }
        finally
        {
            dir.Delete(recursive: true);
        }
    }
}
