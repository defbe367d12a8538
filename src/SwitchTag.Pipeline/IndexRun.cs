using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Output;

namespace SwitchTag.Pipeline;

/// <summary>How a run ended: everything indexed, some inputs rejected, or nothing started (a model
/// or the authority list could not be loaded).</summary>
public enum IndexRunResult { Indexed, InputsRejected, NotStarted }

/// <summary>One run over many files: reads every input, runs the pipeline, writes each interview's
/// outputs into <c>OUT/&lt;interview&gt;/</c> and the collection index into OUT, and reports on
/// <paramref name="log"/> rejected inputs (file:line and reason), notes, and each decision's outcome.</summary>
public static class IndexRun
{
    /// <summary>Runs <paramref name="work"/> once per file; a caller may wrap it (a progress bar).</summary>
    public delegate void FileLoop(TextWriter log, IReadOnlyList<string> files, Action<string> work);

    public static IndexRunResult Execute(IndexRequest request, TextWriter log, FileLoop? loop = null, IndexPipelineBuilder? builder = null)
    {
        foreach (var p in request.DecisionProblems) log.WriteLine(p);
        var problems = new List<Diagnostic>();
        var files = TranscriptFile.Expand(request.Paths, problems).ToList();
        bool rejected = problems.Count > 0;
        foreach (var p in problems) log.WriteLine(p);

        var build = (builder ?? request.Builder()).Build();
        if (build.Pipeline is not { } pipeline)
        {
            log.WriteLine($"switchtag index: {build.Error}");
            return IndexRunResult.NotStarted;
        }
        foreach (var note in build.Notes) log.WriteLine(note);

        var entries = new List<CollectionEntry>();
        var outcomes = new List<DecisionOutcome>();
        var folders = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        (loop ?? Sequential)(log, files, file =>
        {
            var read = pipeline.Read(file);
            foreach (var d in read.Diagnostics) log.WriteLine(d);
            if (read.Transcript is null) { rejected = true; return; }
            try
            {
                var index = pipeline.Run(read.Transcript) with { Media = request.MediaOf(read.Transcript.Name) };
                string folder = UniqueFolder(index.Transcript.Name, folders);
                pipeline.Write(index, Path.Combine(request.OutDir, folder));
                entries.Add(CollectionEntry.From(index, folder));
                outcomes.AddRange(index.Decisions);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                log.WriteLine(new Diagnostic(new SourceLine(file, 0), Severity.Error, $"cannot write the outputs: {e.Message}"));
                rejected = true;
            }
        });

        try
        {
            pipeline.WriteCollection(entries, request.OutDir);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            log.WriteLine($"switchtag index: cannot write the collection index in {request.OutDir}: {e.Message}");
            rejected = true;
        }
        ReportDecisions(request.Decisions, outcomes, log);
        log.WriteLine($"switchtag index: {entries.Count} of {files.Count} interviews indexed into {request.OutDir}");
        return rejected ? IndexRunResult.InputsRejected : IndexRunResult.Indexed;
    }

    private static void Sequential(TextWriter log, IReadOnlyList<string> files, Action<string> work)
    {
        foreach (var f in files) work(f);
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
