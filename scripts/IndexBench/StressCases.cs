using System.Collections.Immutable;
using System.Diagnostics;
using System.Globalization;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Text;
using SwitchTag.Formats;
using SwitchTag.Pipeline;

/// <summary>Whole <c>switchtag index</c> runs (<see cref="IndexRun"/>, one worker, models loaded inside
/// the timed run as on the command line) over <see cref="StressInputs"/>, each case in a child process
/// of its own so its peak working set is its own. The demo set is run with and without the 100k-row
/// decisions file, so the difference is what the decisions cost.</summary>
internal static class StressCases
{
    private static readonly (string Name, string[] Files, string? Decisions)[] Cases =
    [
        ("one turn 10 cues", ["turn10.vtt"], null),
        ("one turn 50k cues", ["turn50k.vtt"], null),
        ("one turn 200k cues", ["turn200k.vtt"], null),
        ("one line 10 MB", ["line10mb.txt"], null),
        ("demo set", [], null),
        ("demo set + 100k decisions", [], "decisions100k.csv"),
    ];

    /// <summary>Writes every generated input into <paramref name="dir"/>, for runs of the command itself.</summary>
    public static void WriteInputs(string dir)
    {
        Directory.CreateDirectory(dir);
        foreach (var name in Cases.SelectMany(c => c.Files.Append(c.Decisions)).OfType<string>().Distinct())
            File.WriteAllText(Path.Combine(dir, name), Make(name));
    }

    private static string Make(string name) => name switch
    {
        "turn10.vtt" => StressInputs.OneTurn(10),
        "turn50k.vtt" => StressInputs.OneTurn(50_000),
        "turn200k.vtt" => StressInputs.OneTurn(200_000),
        "line10mb.txt" => StressInputs.OneLine(10_000_000),
        "decisions100k.csv" => StressInputs.Decisions(100_000, ["esposito-2011", "ferreira-2003", "kowalczyk-1998", "lindner-1987"]),
        _ => throw new ArgumentException(name),
    };

    public static int RunAll(string demo, string[] only)
    {
        var seconds = new Dictionary<string, double>();
        var peaks = new Dictionary<string, double>();
        Console.WriteLine("case\tinput_MB\twords\tseconds\tcpu_seconds\twords_per_s\tpeak_working_set_MB\tresult");
        foreach (var (name, _, _) in Cases.Where(c => only.Length == 0 || only.Contains(c.Name)))
        {
            var start = new ProcessStartInfo(Environment.ProcessPath!, [demo, "--case", name]) { RedirectStandardOutput = true };
            using var child = Process.Start(start)!;
            string line = child.StandardOutput.ReadToEnd().TrimEnd();
            child.WaitForExit();
            Console.WriteLine(line);
            if (child.ExitCode != 0) continue;
            seconds[name] = double.Parse(line.Split('\t')[3], CultureInfo.InvariantCulture);
            peaks[name] = double.Parse(line.Split('\t')[6], CultureInfo.InvariantCulture);
        }
        if (seconds.TryGetValue("one turn 50k cues", out double t50) && seconds.TryGetValue("one turn 200k cues", out double t200))
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"one turn, 200k cues / 50k cues time ratio: {t200 / t50:0.00} (linear: 4)"));
        // The 10-cue turn's peak is what loading the models costs; the 200k-cue turn's target is 500 MB.
        if (peaks.TryGetValue("one turn 10 cues", out double p10) && peaks.TryGetValue("one turn 200k cues", out double p200))
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"one turn, 200k cues peak working set: {p200:0} MB, {p200 - p10:0} MB over the 10-cue turn's {p10:0} MB (target: 500 MB in all)"));
        if (seconds.TryGetValue("demo set", out double d0) && seconds.TryGetValue("demo set + 100k decisions", out double d1))
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"100k decisions add {d1 - d0:0.00} s"));
        return 0;
    }

    /// <summary>One case's first input through the stages one by one (as <see cref="IndexPipeline.Run"/>
    /// chains them), with each stage's seconds, the bytes it allocated and the working set after it:
    /// where a case's time and memory go.</summary>
    public static int RunStages(string name)
    {
        var (_, files, _) = Cases.Single(c => c.Name == name);
        if (files.Length == 0) { Console.Error.WriteLine($"{name}: no generated input"); return 2; }
        var build = new IndexPipelineBuilder().UseShippedModels(SwitchTag.Tagging.TaggingMode.RulesThenModel).Build();
        var pipeline = build.Pipeline ?? throw new InvalidOperationException(build.Error);
        string dir = Path.Combine(Path.GetTempPath(), "switchtag-stress-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string path = Path.Combine(dir, files[0]);
            File.WriteAllText(path, Make(files[0]));
            var clock = Stopwatch.StartNew();
            long allocated = GC.GetTotalAllocatedBytes();
            void Report(string stage)
            {
                long now = GC.GetTotalAllocatedBytes();
                Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{stage,-10}\t{clock.Elapsed.TotalSeconds,8:0.00} s\tallocated {(now - allocated) / 1048576.0,8:0} MB\tworking set {Process.GetCurrentProcess().WorkingSet64 / 1048576.0,6:0} MB\tpeak {Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0,6:0} MB"));
                allocated = now;
                clock.Restart();
            }
            var transcript = pipeline.Read(path).Transcript!;
            Report("read");
            var turns = TurnBuilder.Build(transcript);
            Report("turns");
            var languages = pipeline.Languages.SegmentInterview(turns, null);
            Report("languages");
            var mentions = turns.SelectMany((t, i) => pipeline.Names.Tag(t.Id, t.Text, languages.Spans[i])).ToImmutableArray();
            Report("names");
            var index = new SwitchTag.Indexing.IndexBuilder(pipeline.Lexicon, pipeline.Decisions, checkLanguageBelow: SwitchTag.LanguageId.Interview.StretchCalibration.CheckBelow)
                .Build(transcript, turns, languages.MainLanguage, languages.Spans, mentions);
            Report("index");
            pipeline.Write(index, Path.Combine(dir, "out"));
            Report("write");
            return 0;
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }

    public static int RunCase(string demo, string name)
    {
        var (_, files, decisions) = Cases.Single(c => c.Name == name);
        string dir = Path.Combine(Path.GetTempPath(), "switchtag-stress-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string[] paths = files.Length == 0 ? [demo] : files.Select(f => Path.Combine(dir, f)).ToArray();
            long bytes = 0;
            foreach (var f in files) { File.WriteAllText(Path.Combine(dir, f), Make(f)); bytes += new FileInfo(Path.Combine(dir, f)).Length; }
            if (files.Length == 0) bytes = Directory.EnumerateFiles(demo).Sum(f => new FileInfo(f).Length);
            string? decisionsPath = decisions is null ? null : Path.Combine(dir, decisions);
            if (decisionsPath is not null) File.WriteAllText(decisionsPath, Make(decisions!));
            GC.Collect();

            double cpuBefore = Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds;
            var clock = Stopwatch.StartNew();
            var request = IndexRequest.From(paths, Path.Combine(dir, "out"), null, null, "default", null, decisionsPath, out string? usage)
                ?? throw new InvalidOperationException(usage);
            var result = IndexRun.Execute(request with { Jobs = 1 }, TextWriter.Null);
            double seconds = clock.Elapsed.TotalSeconds;
            double cpu = Process.GetCurrentProcess().TotalProcessorTime.TotalSeconds - cpuBefore;
            double peak = Process.GetCurrentProcess().PeakWorkingSet64 / (1024.0 * 1024);

            long words = TranscriptFile.Expand(paths, []).Sum(f => TurnBuilder.Build(TranscriptFile.Read(f).Transcript!).Sum(t => (long)WordCount.Of(t.Text)));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{name}\t{bytes / 1e6:0.0}\t{words}\t{seconds:0.00}\t{cpu:0.00}\t{words / seconds:0}\t{peak:0}\t{result}"));
            return 0;
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
