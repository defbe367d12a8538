using System.Text.Json;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Pipeline.Tests;

/// <summary>The <c>switchtag eval ner</c> contract of DESIGN.md: JSON with micro, PER, LOC and ORG
/// precision/recall/f1, missing gold files rejected.</summary>
public class NameModelEvaluationTests
{
    [Fact]
    public void PrintsContractJsonForAFile()
    {
        var path = Path.Combine(Path.GetTempPath(), $"switchtag-eval-{Guid.NewGuid():N}.conll");
        // CoNLL layout: token first, tag last.
        File.WriteAllText(path, "John\tNNP\tB-PER\nSmith\tNNP\tI-PER\nvisited\tVBD\tO\nLondon\tNNP\tB-LOC\n.\t.\tO\n");
        try
        {
            var output = new StringWriter();
            Assert.Equal(NameEvaluationResult.Scored, NameModelEvaluation.Run([path], json: true, output, new StringWriter()));
            var json = JsonDocument.Parse(output.ToString()).RootElement;
            foreach (var key in new[] { "micro", "PER", "LOC", "ORG" })
                foreach (var field in new[] { "precision", "recall", "f1" })
                    Assert.InRange(json.GetProperty(key).GetProperty(field).GetDouble(), 0, 1);
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void MissingGoldFileIsRejected()
    {
        var error = new StringWriter();
        Assert.Equal(NameEvaluationResult.SomeInputsRejected, NameModelEvaluation.Run(["/nonexistent/gold.iob2"], json: true, new StringWriter(), error));
        Assert.Contains("no such file", error.ToString());
    }

    [Fact]
    public void DanishDdtTestStaysAboveFloor()
    {
        // Universal NER v1, Danish-DDT test split (CC BY-SA 4.0), never trained on or selected on.
        var path = TestPaths.RequireData("ner/uner/Danish-DDT/da_ddt-ud-test.iob2");
        var output = new StringWriter();
        Assert.Equal(NameEvaluationResult.Scored, NameModelEvaluation.Run([path], json: true, output, new StringWriter()));
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
        Assert.Equal(NameEvaluationResult.Scored, NameModelEvaluation.Run([path], json: true, output, new StringWriter()));
        var f1 = JsonDocument.Parse(output.ToString()).RootElement.GetProperty("micro").GetProperty("f1").GetDouble();
        Assert.True(f1 >= floor, $"{relative} micro-F1 {f1}");
    }
}
