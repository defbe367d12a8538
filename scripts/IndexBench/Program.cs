using System.Collections.Immutable;
using System.Diagnostics;
using System.Globalization;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Text;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.Output;
using SwitchTag.Pipeline;
using SwitchTag.Tagging;
using SwitchTag.Core.Languages;

// End-to-end throughput of `switchtag index` on one core: the demo interviews read from disk, run
// through every stage and written out (all outputs and the collection index), repeated until each
// target word count is reached. Prints words/s per size and the process's peak working set.
// With --stress, the generated inputs of StressCases instead, one child process per case.
// Usage: IndexBench DEMO_DIR [--names rules-only|default] [SIZES...]
//        IndexBench DEMO_DIR --stress [CASE...]    (IndexBench --inputs DIR writes those inputs)
//        IndexBench DEMO_DIR --stages CASE         (one generated input, time and memory per stage)
if (args is ["--inputs", var inputDir]) { StressCases.WriteInputs(inputDir); return 0; }
if (args is [var stressDemo, "--case", var stressCase]) return StressCases.RunCase(stressDemo, stressCase);
if (args is [_, "--stages", var stagesCase]) return StressCases.RunStages(stagesCase);
if (args.Length >= 2 && args[1] == "--stress") return StressCases.RunAll(args[0], args[2..]);
if (args.Length < 1) { Console.Error.WriteLine("usage: IndexBench DEMO_DIR [--names rules-only|default] [words...] | DEMO_DIR --stress [CASE...] | --inputs DIR"); return 2; }
string demo = args[0];
var mode = TaggingMode.RulesThenModel;
var sizes = new List<long>();
for (int i = 1; i < args.Length; i++)
{
    if (args[i] == "--names" && i + 1 < args.Length) { mode = args[++i] == "rules-only" ? TaggingMode.RulesOnly : TaggingMode.RulesThenModel; continue; }
    sizes.Add(long.Parse(args[i], CultureInfo.InvariantCulture));
}
if (sizes.Count == 0) sizes = [10_000, 100_000, 200_000, 1_000_000];

var files = TranscriptFile.Expand([demo], new List<SwitchTag.Core.Documents.Diagnostic>()).ToList();
var load = Stopwatch.StartNew();
var build = new IndexPipelineBuilder().UseShippedModels(mode).Build();
var pipeline = build.Pipeline ?? throw new InvalidOperationException(build.Error);
Console.WriteLine($"models loaded in {load.Elapsed.TotalSeconds:0.00} s; names: {(mode == TaggingMode.RulesOnly ? "rules-only" : "default")}; notes: {build.Notes.Length}");
foreach (var n in build.Notes) Console.WriteLine($"  {n}");

long setWords = files.Sum(f => TurnBuilder.Build(TranscriptFile.Read(f).Transcript!).Sum(t => WordCount.Of(t.Text)));
Console.WriteLine($"demo set: {files.Count} interviews, {setWords} words");

// Warm-up so JIT time is not billed to the smallest size, and where one copy's time goes.
RunOnce(1);
StageTimes();

Console.WriteLine("target_words\twords\tinterviews\tseconds\twords_per_s\tpeak_working_set_MB");
foreach (long target in sizes)
{
    int copies = (int)Math.Ceiling((double)target / setWords);
    var (words, interviews, seconds) = RunOnce(copies);
    Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
        $"{target}\t{words}\t{interviews}\t{seconds:0.000}\t{words / seconds:0}\t{Process.GetCurrentProcess().PeakWorkingSet64 / (1024.0 * 1024):0}"));
}
return 0;

void StageTimes()
{
    var t = new double[6];
    var clock = Stopwatch.StartNew();
    double Lap() { double s = clock.Elapsed.TotalSeconds; clock.Restart(); return s; }
    string outDir = Path.Combine(Path.GetTempPath(), "switchtag-bench-" + Guid.NewGuid().ToString("N"));
    foreach (var file in files)
    {
        clock.Restart();
        var transcript = TranscriptFile.Read(file).Transcript!;
        t[0] += Lap();
        var turns = TurnBuilder.Build(transcript);
        var main = MainLanguage.Detect(pipeline.Languages, turns);
        t[1] += Lap();
        var spans = turns.Select(x => pipeline.Languages.Segment(x.Text, main)).ToImmutableArray();
        t[2] += Lap();
        var mentions = turns.SelectMany((x, i) => pipeline.Names.Tag(x.Id, x.Text, spans[i])).ToImmutableArray();
        t[3] += Lap();
        var index = new IndexBuilder(pipeline.Lexicon).Build(transcript, turns, main, spans, mentions);
        t[4] += Lap();
        pipeline.Write(index, Path.Combine(outDir, index.Transcript.Name));
        t[5] += Lap();
    }
    Directory.Delete(outDir, recursive: true);
    Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
        $"one demo set, seconds per stage: read {t[0]:0.000}, turns+main language {t[1]:0.000}, segment {t[2]:0.000}, tag {t[3]:0.000}, index {t[4]:0.000}, write {t[5]:0.000}"));
}

(long Words, int Interviews, double Seconds) RunOnce(int copies)
{
    string outDir = Path.Combine(Path.GetTempPath(), "switchtag-bench-" + Guid.NewGuid().ToString("N"));
    var entries = new List<CollectionEntry>();
    long words = 0;
    var clock = Stopwatch.StartNew();
    for (int c = 0; c < copies; c++)
        foreach (var file in files)
        {
            var transcript = TranscriptFile.Read(file).Transcript!;
            var index = pipeline.Run(transcript);
            string folder = $"{index.Transcript.Name}-{c}";
            pipeline.Write(index, Path.Combine(outDir, folder));
            entries.Add(CollectionEntry.From(index, folder));
            words += index.Turns.Sum(t => WordCount.Of(t.Text));
        }
    pipeline.WriteCollection(entries, outDir);
    double seconds = clock.Elapsed.TotalSeconds;
    Directory.Delete(outDir, recursive: true);
    return (words, entries.Count, seconds);
}
