using System.Diagnostics;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Formats;

// Reader benchmark: times TranscriptFile.Parse on generated inputs (best of three runs, after one warm-up)
// and prints one line per case. Arguments: files to read and report on instead (diagnostics printed).
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
    return;
}

var words = string.Concat(Enumerable.Repeat("palavra słowo ", 10_000_000 / 14 + 1));
var cases = new (string Name, string Path, string Text)[]
{
    ("webvtt 10 MB single line", "huge.vtt", "WEBVTT\n\n00:01.000 --> 00:02.000\n" + words),
    ("srt 10 MB single line", "huge.srt", "1\n00:00:01,000 --> 00:00:02,000\n" + words),
    ("text 10 MB single line", "huge.txt", "[00:00:01] ANNA: " + words),
    ("markdown 10 MB single line", "huge.md", "# T\n\n**[00:00:01] ANNA:** " + words),
    ("unknown 10 MB single line", "huge-prose.txt", new string('a', 10_000_000)),
    ("webvtt 100k cues", "many.vtt", Many(100_000, i => $"{T(i)} --> {T(i + 1)}\n<v Speaker {i % 3}>Cue number {i} with <i>some</i> &amp; <{new Timecode(i * 2000L + 500)}>words", "WEBVTT\n\n")),
    ("srt 100k cues", "many.srt", Many(100_000, i => $"{i + 1}\n{T(i).Replace('.', ',')} --> {T(i + 1).Replace('.', ',')}\n{(i % 4 == 0 ? "ANNA: " : "")}Cue number {i} with some words", "")),
    ("text 100k entries", "many.txt", Many(100_000, i => $"[{T(i)}] {(i % 4 == 0 ? "ANNA: " : "")}Entry number {i} with some words", "", "\n")),
    ("markdown 100k entries", "many.md", "# Interview\n\n" + Many(100_000, i => $"**[{T(i)}] ANNA:** Entry number {i} with *some* words", "")),
};

foreach (var (name, path, text) in cases)
{
    TranscriptFile.Parse(path, text);
    double best = double.MaxValue;
    ReadResult last = null!;
    for (int run = 0; run < 3; run++)
    {
        var sw = Stopwatch.StartNew();
        last = TranscriptFile.Parse(path, text);
        best = Math.Min(best, sw.Elapsed.TotalSeconds);
    }
    Console.WriteLine($"{name,-28} {text.Length / 1e6,6:0.0} M chars  {best,7:0.000} s  {last.Transcript?.Cues.Length ?? 0,7} cues  {last.Diagnostics.Length} diagnostics");
}

static string T(int i) => new Timecode(i * 2000L).ToString();

static string Many(int n, Func<int, string> cue, string head, string separator = "\n\n")
{
    var sb = new StringBuilder(head);
    for (int i = 0; i < n; i++) sb.Append(cue(i)).Append(separator);
    return sb.ToString();
}
