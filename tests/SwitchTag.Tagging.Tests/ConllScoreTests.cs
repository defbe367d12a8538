using System.Text.Json;
using SwitchTag.Cli;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Tagging.Tests;

/// <summary>Scoring follows conlleval (CoNLL-2000 shared task evaluation script, conlleval.pl;
/// rules from memory): exact chunk match on start, end and type; a chunk starts at B-X or at an
/// I-X that follows O or a different type; micro scores pool every type.</summary>
public class ConllScoreTests
{
    [Fact]
    public void ChunksFollowConllevalStartRules()
    {
        // conlleval: "I-PER" after "O" opens a chunk; "I-LOC" after "I-PER" closes PER and opens LOC.
        var chunks = ConllScore.Chunks(["I-PER", "I-PER", "I-LOC", "O", "B-ORG", "B-ORG", "I-ORG"]);
        Assert.Equal([(0, 2, "PER"), (2, 3, "LOC"), (4, 5, "ORG"), (5, 7, "ORG")], chunks);
    }

    [Fact]
    public void HandMadeFileScoresAsConllevalCounts()
    {
        var path = Path.Combine(Path.GetTempPath(), $"switchtag-eval-{Guid.NewGuid():N}.iob2");
        // Universal NER layout (index, token, tag, two annotator columns); MISC becomes O.
        File.WriteAllText(path, """
            # sent_id = 1
            # text = Anna Berg lives in Oslo
            1	Anna	B-PER	-	-
            2	Berg	I-PER	-	-
            3	lives	O	-	-
            4	in	O	-	-
            5	Oslo	B-LOC	-	-

            -DOCSTART-
            1	Statoil	B-ORG	-	-
            2	Norwegian	B-MISC	-	-

            """);
        try
        {
            var gold = GoldReader.Read(path, []);
            Assert.Equal(2, gold.Count);
            Assert.Equal(["B-ORG", "O"], gold[1].Tags);
            // Predictions: PER exact (correct), LOC too long (wrong), ORG missed, one spurious PER.
            string[][] predicted = [["B-PER", "I-PER", "O", "B-LOC", "I-LOC"], ["O", "B-PER"]];
            var scores = ConllScore.Score(gold.Select((g, i) => (g.Tags, (IReadOnlyList<string>)predicted[i])));
            // Gold chunks 3 (PER, LOC, ORG), predicted 3 (PER, LOC, PER), correct 1:
            // conlleval prints precision 33.33%, recall 33.33%, FB1 33.33 overall;
            // PER: precision 50.00%, recall 100.00%, FB1 66.67; LOC 0/1/1; ORG 0/0/1.
            Assert.Equal(1.0 / 3, scores["micro"].Precision, 6);
            Assert.Equal(1.0 / 3, scores["micro"].Recall, 6);
            Assert.Equal(0.5, scores["PER"].Precision, 6);
            Assert.Equal(1.0, scores["PER"].Recall, 6);
            Assert.Equal(2.0 / 3, scores["PER"].F1, 6);
            Assert.Equal(0, scores["LOC"].F1);
            Assert.Equal(0, scores["ORG"].Recall);

            var json = JsonDocument.Parse(NerEvaluation.ToJson(scores)).RootElement;
            Assert.Equal(["micro", "PER", "LOC", "ORG"], json.EnumerateObject().Select(p => p.Name));
            Assert.Equal(0.6667, json.GetProperty("PER").GetProperty("f1").GetDouble());
            Assert.Equal(0.3333, json.GetProperty("micro").GetProperty("precision").GetDouble());
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void CommandPrintsContractJsonForAFile()
    {
        var path = Path.Combine(Path.GetTempPath(), $"switchtag-eval-{Guid.NewGuid():N}.conll");
        // CoNLL layout: token first, tag last.
        File.WriteAllText(path, "John\tNNP\tB-PER\nSmith\tNNP\tI-PER\nvisited\tVBD\tO\nLondon\tNNP\tB-LOC\n.\t.\tO\n");
        try
        {
            var output = new StringWriter();
            int code = EvalNerCommand.Run([path], json: true, output, new StringWriter());
            Assert.Equal(0, code);
            var json = JsonDocument.Parse(output.ToString()).RootElement;
            foreach (var key in new[] { "micro", "PER", "LOC", "ORG" })
                foreach (var field in new[] { "precision", "recall", "f1" })
                    Assert.InRange(json.GetProperty(key).GetProperty(field).GetDouble(), 0, 1);
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void MissingGoldFileIsRejectedWithExitCode1()
    {
        var error = new StringWriter();
        Assert.Equal(1, EvalNerCommand.Run(["/nonexistent/gold.iob2"], json: true, new StringWriter(), error));
        Assert.Contains("no such file", error.ToString());
    }

    [Fact]
    public void DanishDdtTestStaysAboveFloor()
    {
        // Universal NER v1, Danish-DDT test split (CC BY-SA 4.0), never trained on or selected on.
        var path = TestPaths.RequireData("ner/uner/Danish-DDT/da_ddt-ud-test.iob2");
        var output = new StringWriter();
        Assert.Equal(0, EvalNerCommand.Run([path], json: true, output, new StringWriter()));
        var f1 = JsonDocument.Parse(output.ToString()).RootElement.GetProperty("micro").GetProperty("f1").GetDouble();
        Assert.True(f1 >= 0.65, $"Danish-DDT test micro-F1 {f1}");
    }

    [Theory]
    // FactRuEval-2016 test file (MIT; Russian, Cyrillic) and NorNE bokmål test file (annotations
    // CC0): never trained on or selected on (models/ner.md). Floors sit a few points under the
    // shipped model's 0.691 and 0.793 so a retrain that loses Cyrillic or Norwegian fails here.
    [InlineData("ner-extra/factrueval2016/factrueval-test.tsv", 0.65)]
    [InlineData("ner-extra/norne/nob/nob-test.tsv", 0.75)]
    public void NewLanguageTestSetsStayAboveFloor(string relative, double floor)
    {
        var path = TestPaths.RequireData(relative);
        var output = new StringWriter();
        Assert.Equal(0, EvalNerCommand.Run([path], json: true, output, new StringWriter()));
        var f1 = JsonDocument.Parse(output.ToString()).RootElement.GetProperty("micro").GetProperty("f1").GetDouble();
        Assert.True(f1 >= floor, $"{relative} micro-F1 {f1}");
    }

    [Fact]
    public void NerKorConllupIsReadByItsHeaderColumns()
    {
        // NerKor (CC BY-SA 4.0) CoNLL-U Plus: FORM and CONLL:NER named in '# global.columns'.
        var dir = TestPaths.RequireData("ner/nerkor/data/test/news");
        var file = Directory.GetFiles(dir, "*.conllup").Order(StringComparer.Ordinal).First();
        var sentences = GoldReader.Read(file, []);
        Assert.NotEmpty(sentences);
        Assert.All(sentences.SelectMany(s => s.Tags), t => Assert.Matches("^(O|[BI]-(PER|LOC|ORG))$", t));
        Assert.Contains(sentences.SelectMany(s => s.Tags), t => t != "O");
    }
}
