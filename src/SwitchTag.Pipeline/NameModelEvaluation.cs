using SwitchTag.Pipeline.Models;
using SwitchTag.Tagging;

namespace SwitchTag.Pipeline;

public enum NameEvaluationResult { Scored, SomeInputsRejected, NoInput, ModelNotLoaded }

/// <summary>The <c>switchtag eval ner</c> contract (DESIGN.md): the shipped name model scored on
/// pre-tokenised gold files (format rules in <see cref="GoldReader"/>), pooled and per source and
/// language (<see cref="GoldFileLabel"/>), printed as a table or JSON; <c>lowercase</c> scores
/// lower-cased copies.</summary>
public static class NameModelEvaluation
{
    public static NameEvaluationResult Run(IReadOnlyList<string> goldFiles, bool json, TextWriter output, TextWriter error, ModelLocation? models = null, bool lowercase = false)
    {
        if (goldFiles.Count == 0)
        {
            error.WriteLine("switchtag eval ner: give at least one --gold FILE");
            return NameEvaluationResult.NoInput;
        }
        var problems = new List<string>();
        var files = new List<(GoldFileLabel, IReadOnlyList<GoldSentence>)>();
        int rejected = 0;
        foreach (var file in goldFiles)
        {
            if (!File.Exists(file)) { problems.Add($"{file}: no such file"); rejected++; continue; }
            var read = GoldReader.Read(file, problems);
            files.Add((GoldFileLabel.Of(file), lowercase ? [.. read.Select(NerEvaluation.LowerCased)] : read));
        }
        foreach (var p in problems) error.WriteLine($"switchtag eval ner: {p}");
        var model = ShippedModels.LoadNameModel(models ?? ModelLocation.Default, out var loadError);
        if (model is null)
        {
            error.WriteLine($"switchtag eval ner: {loadError}");
            return NameEvaluationResult.ModelNotLoaded;
        }
        var report = NerEvaluation.Report(new SequenceTagger(model), files);
        output.WriteLine(json ? NerEvaluation.ToJson(report) : NerEvaluation.ToTable(report));
        return rejected > 0 ? NameEvaluationResult.SomeInputsRejected : NameEvaluationResult.Scored;
    }
}
