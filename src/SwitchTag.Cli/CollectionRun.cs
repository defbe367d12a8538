using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.Output;
using SwitchTag.Store;

namespace SwitchTag.Cli;

/// <summary>The outcome of indexing a list of files into one output folder.</summary>
public sealed record CollectionRunResult(int Indexed, int Skipped, bool Rejected, ImmutableArray<DecisionOutcome> Outcomes);

/// <summary>Indexes files into the output folder's collection store: an interview whose bytes and
/// <see cref="ModelFingerprint"/> are unchanged is skipped (unless forced); the others run on
/// <see cref="IndexOptions.Jobs"/> workers. Each worker writes its interview's folder; the store is
/// written by this thread alone, in input order, and the log too, so files, store rows and log are the
/// same whatever the number of workers. At most a few interviews wait to be stored, so memory does not
/// grow with the collection. The collection index is rebuilt from the store at the end.</summary>
public static class CollectionRun
{
    private sealed record Planned(string File, string Folder, StoredInterview? Stored, bool Unchanged);

    private sealed record Done(ImmutableArray<string> Log, bool Rejected, bool Skipped, InterviewIndex? Index, Planned Plan, ImmutableArray<DecisionOutcome> Outcomes);

    /// <summary>Runs the files; <paramref name="loadStages"/> is called only when some interview must be
    /// indexed (an unchanged collection needs no model), and a null from it ends the run with null.</summary>
    public static CollectionRunResult? Execute(IndexOptions options, Func<IndexStages?> loadStages, IReadOnlyList<string> files, TextWriter log)
    {
        using var store = CollectionStore.Open(options.OutDir);
        string fingerprint = ModelFingerprint.Of(options);
        var plan = Plan(files, store.Interviews(), options, fingerprint);
        IndexStages? loaded = null;
        if (plan.Any(p => !p.Unchanged) && (loaded = loadStages()) is null) return null;
        var stages = loaded!;
        int jobs = options.Jobs > 0 ? options.Jobs : Environment.ProcessorCount;
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
                try { results[i].SetResult(Work(plan[i], options, stages)); }
                catch (Exception e) { results[i].SetException(e); }
            }
        }, cancel.Token, TaskCreationOptions.LongRunning, TaskScheduler.Default)).ToArray();

        int indexed = 0, skipped = 0;
        bool rejected = false;
        var outcomes = ImmutableArray.CreateBuilder<DecisionOutcome>();
        int committed = 0;
        try
        {
            IndexProgress.Run(log, plan.Select(p => p.File).ToList(), _ =>
            {
                var done = results[committed].Task.GetAwaiter().GetResult();
                results[committed] = null!;
                committed++;
                foreach (var line in done.Log) log.WriteLine(line);
                rejected |= done.Rejected;
                if (done.Skipped)
                {
                    skipped++;
                    log.WriteLine($"unchanged, skipped (--force redoes it): {done.Plan.File}");
                    outcomes.AddRange(StoredOutcomes(store, done.Plan, options.Decisions));
                }
                else if (done.Index is { } index)
                {
                    store.Save(index, done.Plan.Folder, fingerprint,
                        done.Outcomes.Select(o => new StoredDecision(o.Decision.ToString(), o.Applied)).ToList(), DateTimeOffset.UtcNow);
                    indexed++;
                    outcomes.AddRange(done.Outcomes);
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

        PruneOrReport(store, options, log);
        try
        {
            InterviewOutputs.WriteCollection(store.Collection().Select(Entry).ToList(), options.OutDir);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            log.WriteLine($"switchtag index: cannot write the collection index in {options.OutDir}: {e.Message}");
            rejected = true;
        }
        return new CollectionRunResult(indexed, skipped, rejected, outcomes.ToImmutable());
    }

    /// <summary>Each distinct file with its folder: the one the store already gives its source, else
    /// its name, numbered past any folder taken (in the store or earlier in this run); and whether it
    /// is unchanged (same bytes, same fingerprint, outputs still there), found from the bytes' SHA-256
    /// alone, without parsing.</summary>
    private static List<Planned> Plan(IReadOnlyList<string> files, IReadOnlyList<StoredInterview> stored, IndexOptions options, string fingerprint)
    {
        var bySource = stored.ToDictionary(s => s.SourcePath, StringComparer.Ordinal);
        var used = new HashSet<string>(stored.Select(s => s.Folder), StringComparer.OrdinalIgnoreCase);
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var plan = new List<Planned>();
        foreach (var file in files)
        {
            string full = Path.GetFullPath(file);
            if (!seen.Add(full)) continue;
            if (bySource.TryGetValue(full, out var known))
            {
                bool unchanged = !options.Force && known.ModelVersions == fingerprint && Sha256Of(file) == known.Sha256
                                 && File.Exists(Path.Combine(options.OutDir, known.Folder, "index.json"));
                plan.Add(new Planned(file, known.Folder, known, unchanged));
                continue;
            }
            string name = Path.GetFileNameWithoutExtension(file), folder = name;
            for (int k = 2; !used.Add(folder); k++) folder = $"{name}-{k}";
            plan.Add(new Planned(file, folder, null, false));
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

    private static Done Work(Planned plan, IndexOptions options, IndexStages stages)
    {
        if (plan.Unchanged) return new Done([], false, true, null, plan, []);
        var read = TranscriptFile.Read(plan.File, options.Format);
        var log = read.Diagnostics.Select(d => d.ToString()).ToImmutableArray();
        if (read.Transcript is null) return new Done(log, true, false, null, plan, []);
        string folder = Path.Combine(options.OutDir, plan.Folder);
        var (index, applied) = stages.Run(read.Transcript, options.MainLanguage, options.Decisions);
        try
        {
            InterviewOutputs.Write(index, folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new Done(log.Add(new Diagnostic(new SourceLine(plan.File, 0), Severity.Error, $"cannot write the outputs: {e.Message}").ToString()),
                true, false, null, plan, []);
        }
        return new Done(log, false, false, index, plan, applied);
    }

    /// <summary>The decisions a skipped interview had applied when it was indexed, matched back to
    /// this run's decisions by their text, so the decision report counts them.</summary>
    private static IEnumerable<DecisionOutcome> StoredOutcomes(CollectionStore store, Planned plan, ImmutableArray<Decision> decisions)
    {
        var applied = store.Decisions(plan.File);
        foreach (var d in decisions)
            if (applied.TryGetValue(d.ToString(), out int n))
                yield return new DecisionOutcome(d, plan.Stored!.Name, n);
    }

    private static void PruneOrReport(CollectionStore store, IndexOptions options, TextWriter log)
    {
        foreach (var gone in store.Interviews().Where(i => !File.Exists(i.SourcePath)))
        {
            if (!options.Prune)
            {
                log.WriteLine($"source gone, kept in the collection (--prune removes it): {gone.SourcePath} ({gone.Folder})");
                continue;
            }
            store.Remove(gone.SourcePath);
            string folder = Path.Combine(options.OutDir, gone.Folder);
            foreach (var name in InterviewOutputs.FileNames)
                if (File.Exists(Path.Combine(folder, name))) File.Delete(Path.Combine(folder, name));
            if (Directory.Exists(folder) && !Directory.EnumerateFileSystemEntries(folder).Any()) Directory.Delete(folder);
            log.WriteLine($"source gone, pruned from the collection: {gone.SourcePath} ({gone.Folder})");
        }
    }

    private static CollectionEntry Entry(CollectionInterview i) => new(i.Name, i.Folder, i.MainLanguage, i.Duration,
        i.Headings.Select(h => new CollectionHeading(h.Id, h.Label, h.Name, h.Place, h.Times)).ToImmutableArray());
}
