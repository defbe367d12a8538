using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Formats;
using SwitchTag.Formats.Files;
using SwitchTag.Output;
using SwitchTag.Pipeline.Collection;
using SwitchTag.Store;

namespace SwitchTag.Pipeline;

/// <summary>How a run ended: everything indexed, some inputs rejected, or nothing started (a model
/// or the authority list could not be loaded).</summary>
public enum IndexRunResult { Indexed, InputsRejected, NotStarted }

/// <summary>One run over many files into the output folder's collection store (STORE.md): an
/// interview whose bytes and <see cref="RunFingerprint"/> are unchanged is skipped (unless
/// <see cref="IndexRequest.Force"/>); the others run on <see cref="IndexRequest.Jobs"/> workers, each
/// writing its interview's folder. The store and the log are written by the calling thread alone, in
/// input order, so files, store rows and log are the same whatever the number of workers; at most a
/// few interviews wait to be stored, so memory does not grow with the collection. The collection
/// outputs are then rebuilt from the store and cover every interview in it.</summary>
public static class IndexRun
{
    /// <summary>Runs <paramref name="work"/> once per file, in order; a caller may wrap it (a progress bar).</summary>
    public delegate void FileLoop(TextWriter log, IReadOnlyList<string> files, Action<string> work);

    private sealed record Planned(string File, string Id, string Folder, StoredInterview? Stored, bool Unchanged);

    private sealed record Done(Planned Plan, ImmutableArray<string> Log, bool Rejected, InterviewIndex? Index);

    public static IndexRunResult Execute(IndexRequest request, TextWriter log, FileLoop? loop = null, IndexPipelineBuilder? builder = null)
    {
        foreach (var p in request.DecisionProblems) log.WriteLine(p);
        var problems = new List<Diagnostic>();
        // The output folder is never read as input, even when it lies inside an input folder.
        string outReal = RealPath.Resolve(request.OutDir, out _) ?? Path.GetFullPath(request.OutDir);
        // Hidden entries are skipped on purpose: reported, but no reason to reject the run.
        var hidden = new List<Diagnostic>();
        var files = InputWalker.Find(request.Paths, problems, (request.SkipFolders.IsDefault ? [] : request.SkipFolders).Append(outReal), hidden);
        // A decisions row that could not be read is a rejected input: the run says so and exits 1.
        bool rejected = problems.Count > 0 || request.DecisionProblems.Any(p => p.Severity == Severity.Error);
        foreach (var p in problems.Concat(hidden)) log.WriteLine(p);

        CollectionStore store;
        try
        {
            store = WriteGate.Step(() => CollectionStore.Open(request.OutDir));
        }
        catch (Exception e) when (e is Microsoft.Data.Sqlite.SqliteException or InvalidDataException or IOException or UnauthorizedAccessException)
        {
            log.WriteLine($"switchtag index: the collection store in {request.OutDir} cannot be used: {e.Message}");
            return IndexRunResult.InputsRejected;
        }
        foreach (var swept in FolderSwap.Sweep(request.OutDir)) log.WriteLine($"removed what an interrupted run left: {swept}");
        using var swap = new FolderSwap();
        using (store)
        {
            var stored = store.Interviews();
            var ids = Ids(files, stored);
            // Decisions find their interview by id; the builder is made after, so the pipeline applies them so.
            var (decisions, targetProblems) = DecisionTargets.Resolve(request.Decisions, files, ids);
            foreach (var p in targetProblems) log.WriteLine(p);
            rejected |= !targetProblems.IsEmpty;
            request = request with { Decisions = decisions };
            builder ??= request.Builder();
            string fingerprint = RunFingerprint.Of(request, builder.Models);
            var plan = Plan(files, ids, stored, request, fingerprint);
            IndexPipeline? pipeline = null;
            if (plan.Any(p => !p.Unchanged))
            {
                // Models are loaded only when something must be indexed: an unchanged collection needs none.
                var build = builder.Build();
                if (build.Pipeline is null)
                {
                    log.WriteLine($"switchtag index: {build.Error}");
                    return IndexRunResult.NotStarted;
                }
                foreach (var note in build.Notes) log.WriteLine(note);
                rejected |= build.Notes.Any(n => n.Severity == Severity.Error); // a refused authority-list row
                pipeline = build.Pipeline;
            }

            var (indexed, skipped, failed, outcomes) = RunPlan(plan, request, pipeline, swap, store, fingerprint, log, loop ?? Sequential);
            ReportStale(request.OutDir, store, pipeline?.Writers ?? builder.Writers, log);
            rejected |= failed;
            PruneOrReport(store, request, pipeline?.Writers ?? OutputWriters.Default, log);
            try
            {
                // Every interview's index is garbage by now, but after a long interview the GC has
                // not yet taken it back (some 400 MB after one 200k-cue turn), and the collection
                // pages read every mention back on top of it. One full collection first, once per
                // run: that turn's peak 992 -> 791 MB for a fraction of a second. It compacts and
                // gives the memory back too, since the pages are built on top of what it leaves.
                LongTalk.Compact();
                (pipeline?.Writers ?? builder.Writers).WriteCollection(StoreEntries.Of(store, request.Decisions), request.OutDir);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                log.WriteLine($"switchtag index: cannot write the collection index in {request.OutDir}: {e.Message}");
                rejected = true;
            }
            ReportDecisions(request.Decisions, outcomes, log);
            log.WriteLine($"switchtag index: {indexed} of {files.Length} interviews indexed, {skipped} unchanged, into {request.OutDir}");
        }
        return rejected ? IndexRunResult.InputsRejected : IndexRunResult.Indexed;
    }

    private static (int Indexed, int Skipped, bool Rejected, List<DecisionOutcome> Outcomes) RunPlan(List<Planned> plan, IndexRequest request,
        IndexPipeline? pipeline, FolderSwap swap, CollectionStore store, string fingerprint, TextWriter log, FileLoop loop)
    {
        int jobs = request.Jobs > 0 ? request.Jobs : Environment.ProcessorCount;
        var results = plan.Select(_ => new TaskCompletionSource<Done>(TaskCreationOptions.RunContinuationsAsynchronously)).ToArray();
        using var window = new SemaphoreSlim(2 * jobs);
        int next = -1;
        using var cancel = new CancellationTokenSource();
        var workers = Enumerable.Range(0, jobs).Select(_ => Task.Factory.StartNew(() =>
        {
            while (true)
            {
                window.Wait(cancel.Token);
                int i = Interlocked.Increment(ref next);
                if (i >= plan.Count) return;
                try { results[i].SetResult(Work(plan[i], request, pipeline, swap)); }
                catch (Exception e) { results[i].SetException(e); }
            }
        }, cancel.Token, TaskCreationOptions.LongRunning, TaskScheduler.Default)).ToArray();

        int indexed = 0, skipped = 0, committed = 0;
        bool rejected = false;
        var outcomes = new List<DecisionOutcome>();
        try
        {
            loop(log, plan.Select(p => p.File).ToList(), _ =>
            {
                var done = results[committed].Task.GetAwaiter().GetResult();
                results[committed] = null!;
                committed++;
                foreach (var line in done.Log) log.WriteLine(line);
                rejected |= done.Rejected;
                if (done.Plan.Unchanged)
                {
                    skipped++;
                    log.WriteLine($"unchanged, skipped (--force redoes it): {done.Plan.File}");
                    outcomes.AddRange(StoredOutcomes(store, done.Plan, request.Decisions));
                }
                else if (done.Index is { } index)
                {
                    // One step, so a signal lets the transaction commit rather than leave a hot journal.
                    WriteGate.Step(() => store.Save(index, done.Plan.Folder, fingerprint,
                        index.Decisions.Select(o => new StoredDecision(StoreEntries.DecisionKey(o.Decision), o.Applied)).ToList(), DateTimeOffset.UtcNow));
                    indexed++;
                    outcomes.AddRange(index.Decisions);
                }
                window.Release();
            });
        }
        finally
        {
            cancel.Cancel();
            try { Task.WaitAll(workers); }
            catch (AggregateException e) when (e.InnerExceptions.All(x => x is OperationCanceledException)) { }
        }
        return (indexed, skipped, rejected, outcomes);
    }

    /// <summary>Each input's interview id (<see cref="InterviewIds"/>), kept off the ids of the store's
    /// interviews from other sources, so no two interviews of the collection share one.</summary>
    private static ImmutableArray<string> Ids(IReadOnlyList<InputFile> files, IReadOnlyList<StoredInterview> stored)
    {
        var inRun = files.Select(f => Path.GetFullPath(f.Path)).ToHashSet(StringComparer.Ordinal);
        return InterviewIds.Assign(files, stored.Where(s => !inRun.Contains(s.SourcePath)).Select(s => s.Name));
    }

    /// <summary>Each file (the walk gives each real file once) with its id and folder: the folder the
    /// store already gives its source, else a safe name made from the id (<see cref="InterviewFolderName"/>)
    /// past any folder taken in the store or earlier in this run; and whether it is unchanged (same
    /// bytes, fingerprint and id, outputs still there), found from the bytes' SHA-256 alone, without parsing.</summary>
    private static List<Planned> Plan(IReadOnlyList<InputFile> files, ImmutableArray<string> ids, IReadOnlyList<StoredInterview> stored,
        IndexRequest request, string fingerprint)
    {
        var bySource = stored.ToDictionary(s => s.SourcePath, StringComparer.Ordinal);
        var folders = new InterviewFolderName(stored.Select(s => s.Folder));
        var plan = new List<Planned>();
        for (int i = 0; i < files.Count; i++)
        {
            string file = files[i].Path, id = ids[i];
            if (bySource.TryGetValue(Path.GetFullPath(file), out var known))
            {
                bool unchanged = !request.Force && known.ModelVersions == fingerprint && known.Name == id && Sha256Of(file) == known.Sha256
                                 && File.Exists(Path.Combine(request.OutDir, known.Folder, "index.json"));
                plan.Add(new Planned(file, id, known.Folder, known, unchanged));
                continue;
            }
            plan.Add(new Planned(file, id, folders.Next(id), null, false));
        }
        return plan;
    }

    private static string? Sha256Of(string file)
    {
        try
        {
            using var stream = File.OpenRead(file);
            return Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(stream));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null; // reading it again in the worker reports why
        }
    }

    private static Done Work(Planned plan, IndexRequest request, IndexPipeline? pipeline, FolderSwap swap)
    {
        if (plan.Unchanged) return new Done(plan, [], false, null);
        var (transcript, log) = Read(pipeline!, plan.File);
        if (transcript is null) return new Done(plan, log, true, null);
        var index = pipeline!.Run(transcript with { Id = plan.Id }) with { Media = request.MediaOf(plan.Id) };
        try
        {
            swap.Replace(Path.Combine(request.OutDir, plan.Folder), folder => pipeline.Write(index, folder));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new Done(plan, log.Add(new Diagnostic(new SourceLine(plan.File, 0), Severity.Error, $"cannot write the outputs: {e.Message}").ToString()), true, null);
        }
        return new Done(plan, log, false, index);
    }

    /// <summary>The file's transcript and its diagnostics as log lines. The read result, which holds the
    /// file's whole text, ends here rather than staying in the caller's frame while the interview is
    /// indexed and written.</summary>
    private static (Transcript? Transcript, ImmutableArray<string> Log) Read(IndexPipeline pipeline, string file)
    {
        var read = pipeline.Read(file);
        return (read.Transcript, read.Diagnostics.Select(d => d.ToString()).ToImmutableArray());
    }

    /// <summary>The decisions a skipped interview had applied when it was indexed, matched back to
    /// this run's decisions by their text, so the decision report counts them.</summary>
    private static IEnumerable<DecisionOutcome> StoredOutcomes(CollectionStore store, Planned plan, ImmutableArray<Decision> decisions)
    {
        var applied = store.Decisions(plan.File);
        foreach (var d in decisions)
            if (applied.TryGetValue(StoreEntries.DecisionKey(d), out int n))
                yield return new DecisionOutcome(d, n);
    }

    private static void PruneOrReport(CollectionStore store, IndexRequest request, OutputWriters writers, TextWriter log)
    {
        foreach (var gone in store.Interviews().Where(i => !File.Exists(i.SourcePath)))
        {
            if (!request.Prune)
            {
                log.WriteLine($"source gone, kept in the collection (--prune removes it): {gone.SourcePath} ({gone.Folder})");
                continue;
            }
            string folder = Path.Combine(request.OutDir, gone.Folder);
            WriteGate.Step(() =>
            {
                store.Remove(gone.SourcePath);
                foreach (var name in writers.InterviewFileNames)
                    if (File.Exists(Path.Combine(folder, name))) File.Delete(Path.Combine(folder, name));
                if (Directory.Exists(folder) && !Directory.EnumerateFileSystemEntries(folder).Any()) Directory.Delete(folder);
            });
            log.WriteLine($"source gone, pruned from the collection: {gone.SourcePath} ({gone.Folder})");
        }
    }

    /// <summary>Reports folders of OUT that hold this tool's outputs but no interview of the store
    /// (left by an earlier run before the store, or by hand); they are not deleted.</summary>
    private static void ReportStale(string outDir, CollectionStore store, OutputWriters writers, TextWriter log)
    {
        var known = store.Interviews().Select(i => i.Folder).ToHashSet(StringComparer.OrdinalIgnoreCase);
        foreach (var dir in Directory.EnumerateDirectories(outDir).Order(StringComparer.Ordinal))
        {
            string name = Path.GetFileName(dir);
            if (!name.StartsWith('.') && !known.Contains(name) && writers.InterviewFileNames.Any(f => File.Exists(Path.Combine(dir, f))))
                log.WriteLine($"stale folder, no interview of the collection writes it (delete it if it is not needed): {dir}");
        }
    }

    private static void Sequential(TextWriter log, IReadOnlyList<string> files, Action<string> work)
    {
        foreach (var f in files) work(f);
    }

    private static void ReportDecisions(ImmutableArray<Decision> decisions, List<DecisionOutcome> outcomes, TextWriter log)
    {
        // Summed per decision in one pass: a file of many decisions over many interviews costs no
        // scan of every outcome per decision.
        var total = new Dictionary<Decision, int>(ReferenceEqualityComparer.Instance);
        foreach (var o in outcomes) total[o.Decision] = total.GetValueOrDefault(o.Decision) + o.Applied;
        foreach (var d in decisions)
        {
            int applied = total.GetValueOrDefault(d);
            log.WriteLine(applied > 0 ? $"decision applied {applied}x: {d}" : $"decision no longer matches anything: {d}");
        }
    }
}
