using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Indexing;

namespace SwitchTag.Cli;

/// <summary>One run of <c>switchtag index</c>: reads every input, runs the pipeline, writes the
/// outputs, reports rejected inputs (file:line and reason) and the decisions applied on
/// <paramref name="log"/>. Returns the exit code: 0, or 1 when any input was rejected.</summary>
public static class IndexRun
{
    public static int Execute(IndexOptions options, TextWriter log)
    {
        foreach (var p in options.DecisionProblems) log.WriteLine(p);
        var problems = new List<Diagnostic>();
        var files = TranscriptFile.Expand(options.Paths, problems).ToList();
        bool rejected = problems.Count > 0;
        foreach (var p in problems) log.WriteLine(p);

        string? error = null;
        IndexStages? LoadStages()
        {
            var stages = IndexStages.Load(options.Names, options.AuthorityPath, out error);
            if (stages is not null)
                foreach (var note in stages.Notes) log.WriteLine(note);
            return stages;
        }

        CollectionRunResult? run;
        try
        {
            run = CollectionRun.Execute(options, LoadStages, files, log);
        }
        catch (Exception e) when (e is Microsoft.Data.Sqlite.SqliteException or InvalidDataException)
        {
            log.WriteLine($"switchtag index: the collection store in {options.OutDir} cannot be used: {e.Message}");
            return ExitCodes.InputsRejected;
        }
        if (run is null)
        {
            log.WriteLine($"switchtag index: {error}");
            return ExitCodes.Usage;
        }
        rejected |= run.Rejected;
        var outcomes = run.Outcomes.ToList();
        ReportDecisions(options.Decisions, outcomes, log);
        log.WriteLine($"switchtag index: {run.Indexed} of {files.Count} interviews indexed, {run.Skipped} unchanged, into {options.OutDir}");
        return rejected ? ExitCodes.InputsRejected : ExitCodes.Success;
    }

    private static void ReportDecisions(ImmutableArray<Decision> decisions, List<DecisionOutcome> outcomes, TextWriter log)
    {
        foreach (var d in decisions)
        {
            int applied = outcomes.Where(o => ReferenceEquals(o.Decision, d)).Sum(o => o.Applied);
            log.WriteLine(applied > 0 ? $"decision applied {applied}x: {d}" : $"decision no longer matches anything: {d}");
        }
    }
}
