using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.Output;

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

        var stages = IndexStages.Load(options.Names, options.AuthorityPath, out string? error);
        if (stages is null)
        {
            log.WriteLine($"switchtag index: {error}");
            return ExitCodes.Usage;
        }
        foreach (var note in stages.Notes) log.WriteLine(note);

        var entries = new List<CollectionEntry>();
        var outcomes = new List<DecisionOutcome>();
        var folders = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        IndexProgress.Run(log, files, file =>
        {
            var read = TranscriptFile.Read(file, options.Format);
            foreach (var d in read.Diagnostics) log.WriteLine(d);
            if (read.Transcript is null) { rejected = true; return; }
            try
            {
                var (index, applied) = stages.Run(read.Transcript, options.MainLanguage, options.Decisions);
                string folder = UniqueFolder(index.Transcript.Name, folders);
                InterviewOutputs.Write(index, Path.Combine(options.OutDir, folder));
                entries.Add(CollectionEntry.From(index, folder));
                outcomes.AddRange(applied);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                log.WriteLine(new Diagnostic(new SourceLine(file, 0), Severity.Error, $"cannot write the outputs: {e.Message}"));
                rejected = true;
            }
        });

        try
        {
            InterviewOutputs.WriteCollection(entries, options.OutDir);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            log.WriteLine($"switchtag index: cannot write the collection index in {options.OutDir}: {e.Message}");
            rejected = true;
        }
        ReportDecisions(options.Decisions, outcomes, log);
        log.WriteLine($"switchtag index: {entries.Count} of {files.Count} interviews indexed into {options.OutDir}");
        return rejected ? ExitCodes.InputsRejected : ExitCodes.Success;
    }

    private static string UniqueFolder(string name, HashSet<string> used)
    {
        string folder = name;
        for (int k = 2; !used.Add(folder); k++) folder = $"{name}-{k}";
        return folder;
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
