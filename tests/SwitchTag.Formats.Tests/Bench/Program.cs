using System.Diagnostics;
using System.Globalization;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Time;
using SwitchTag.Formats;
using SwitchTag.Indexing;

// Reader benchmark. Each case runs in a child process of its own, so its peak working set is its own;
// a case times TranscriptFile.Parse on a generated input (best of three runs, after one warm-up) and
// prints one line. The "one turn" cases also build the turn and place one mention per cue in time
// (TimeAligner), the work that grew quadratically inside one long speaker turn; the 200k/50k time
// ratio is printed after them (linear cost gives 4). The "stress" cases read the inputs that
// scripts/bench-index runs through the whole pipeline (StressInputs), and the decisions case parses
// a decisions file of 100k rows. Arguments: "--case NAME" runs one case; files to read and report on
// instead (diagnostics printed).
if (args is ["--case", var only]) return RunCase(only);
if (args.Length > 0)
{
    var problems = new List<Diagnostic>();
    foreach (var file in TranscriptFile.Expand(args, problems))
    {
        var result = TranscriptFile.Read(file);
        Console.WriteLine($"{file}: {(result.Transcript is null ? "rejected" : $"{result.Transcript.Source.Format.Name}, {result.Transcript.Cues.Length} cues")}, {result.Diagnostics.Length} diagnostics");
        foreach (var d in result.Diagnostics) Console.WriteLine("  " + d);
    }
    foreach (var p in problems) Console.WriteLine(p);
    return 0;
}

var seconds = new Dictionary<string, double>();
foreach (var name in Cases().Select(c => c.Name))
{
    var start = new ProcessStartInfo(Environment.ProcessPath!, ["--case", name]) { RedirectStandardOutput = true };
    using var child = Process.Start(start)!;
    string line = child.StandardOutput.ReadToEnd().TrimEnd();
    child.WaitForExit();
    Console.WriteLine(line);
    seconds[name] = double.Parse(line.Split('\t')[2].TrimEnd('s', ' '), CultureInfo.InvariantCulture);
}
Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
    $"one turn, 200k cues / 50k cues time ratio: {seconds["webvtt one turn 200k cues"] / seconds["webvtt one turn 50k cues"]:0.00}, stress text {seconds["stress one turn 200k cues"] / seconds["stress one turn 50k cues"]:0.00} (linear: 4)"));
return 0;

static int RunCase(string name)
{
    var (_, path, make, kind) = Cases().Single(c => c.Name == name);
    string text = make();
    Run(path, text, kind);
    double best = double.MaxValue;
    (int Items, int Diagnostics, string Unit) last = default;
    for (int run = 0; run < 3; run++)
    {
        var sw = Stopwatch.StartNew();
        last = Run(path, text, kind);
        best = Math.Min(best, sw.Elapsed.TotalSeconds);
    }
    Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
        $"{name,-30}\t{text.Length / 1e6,6:0.0} M chars\t{best,7:0.000} s\t{last.Items,7} {last.Unit}\t{last.Diagnostics} diagnostics\tpeak {Process.GetCurrentProcess().PeakWorkingSet64 / (1024.0 * 1024):0} MB"));
    return 0;
}

static (int Items, int Diagnostics, string Unit) Run(string path, string text, Kind kind)
{
    if (kind == Kind.Decisions)
    {
        var (decisions, problems) = SwitchTag.Indexing.Decisions.DecisionsFile.Parse(path, text);
        return (decisions.Length, problems.Length, "rows");
    }
    var result = Read(path, text, kind == Kind.Align);
    return (result.Transcript?.Cues.Length ?? 0, result.Diagnostics.Length, "cues");
}

static ReadResult Read(string path, string text, bool align)
{
    var result = TranscriptFile.Parse(path, text);
    if (!align || result.Transcript is null) return result;
    var turns = TurnBuilder.Build(result.Transcript);
    var aligner = new TimeAligner(result.Transcript);
    long sum = 0;
    foreach (var turn in turns)
        foreach (var part in turn.Cues)
            sum += aligner.Align(turn, part.CharStart, Math.Min(part.CharEnd, part.CharStart + 6)).End.Milliseconds;
    GC.KeepAlive(sum);
    return result;
}

// Inputs are made only in the child that runs the case, so no case's peak holds another's input.
static (string Name, string Path, Func<string> Text, Kind Kind)[] Cases()
{
    static string Words() => string.Concat(Enumerable.Repeat("palavra słowo ", 10_000_000 / 14 + 1));
    return
    [
        ("webvtt 10 MB single line", "huge.vtt", () => "WEBVTT\n\n00:01.000 --> 00:02.000\n" + Words(), Kind.Read),
        ("srt 10 MB single line", "huge.srt", () => "1\n00:00:01,000 --> 00:00:02,000\n" + Words(), Kind.Read),
        ("text 10 MB single line", "huge.txt", () => "[00:00:01] ANNA: " + Words(), Kind.Read),
        ("markdown 10 MB single line", "huge.md", () => "# T\n\n**[00:00:01] ANNA:** " + Words(), Kind.Read),
        ("unknown 10 MB single line", "huge-prose.txt", () => new string('a', 10_000_000), Kind.Read),
        ("webvtt 100 KB of '<'", "lt.vtt", () => "WEBVTT\n\n00:01.000 --> 00:02.000\n" + new string('<', 100_000), Kind.Read),
        ("webvtt 100k cues", "many.vtt", () => Many(100_000, i => $"{T(i)} --> {T(i + 1)}\n<v Speaker {i % 3}>Cue number {i} with <i>some</i> &amp; <{new Timecode(i * 2000L + 500)}>words", "WEBVTT\n\n"), Kind.Read),
        ("srt 100k cues", "many.srt", () => Many(100_000, i => $"{i + 1}\n{T(i).Replace('.', ',')} --> {T(i + 1).Replace('.', ',')}\n{(i % 4 == 0 ? "ANNA: " : "")}Cue number {i} with some words", ""), Kind.Read),
        ("text 100k entries", "many.txt", () => Many(100_000, i => $"[{T(i)}] {(i % 4 == 0 ? "ANNA: " : "")}Entry number {i} with some words", "", "\n"), Kind.Read),
        ("markdown 100k entries", "many.md", () => "# Interview\n\n" + Many(100_000, i => $"**[{T(i)}] ANNA:** Entry number {i} with *some* words", ""), Kind.Read),
        ("webvtt one turn 50k cues", "turn50k.vtt", () => OneTurn(50_000), Kind.Align),
        ("webvtt one turn 200k cues", "turn200k.vtt", () => OneTurn(200_000), Kind.Align),
        ("stress one turn 50k cues", "turn50k.vtt", () => StressInputs.OneTurn(50_000), Kind.Align),
        ("stress one turn 200k cues", "turn200k.vtt", () => StressInputs.OneTurn(200_000), Kind.Align),
        ("stress one line 10 MB", "line10mb.txt", () => StressInputs.OneLine(10_000_000), Kind.Read),
        ("decisions 100k rows", "decisions.csv", () => StressInputs.Decisions(100_000, ["a", "b", "c", "d"]), Kind.Decisions),
    ];
}

static string OneTurn(int n) => Many(n, i => $"{T(i)} --> {T(i + 1)}\n<v Anna>Then we went from Warsaw to Paris, number {i}.", "WEBVTT\n\n");

static string T(int i) => new Timecode(i * 2000L).ToString();

static string Many(int n, Func<int, string> cue, string head, string separator = "\n\n")
{
    var sb = new StringBuilder(head);
    for (int i = 0; i < n; i++) sb.Append(cue(i)).Append(separator);
    return sb.ToString();
}

internal enum Kind { Read, Align, Decisions }
