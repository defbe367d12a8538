using System.Diagnostics;
using SwitchTag.Tagging;

// Measures what the targets name: model load time, and tokens per second on one core from
// raw text (word tokenisation, features, ONNX inference, constrained decoding). Text: the
// "# text = " lines of the Universal NER v1 test files under ../shared/data (CC BY-SA 4.0).
if (args.Length < 2)
{
    Console.Error.WriteLine("usage: NerBench MODELS_DIR DATA_DIR [ROUNDS]");
    return 2;
}
int rounds = args.Length > 2 ? int.Parse(args[2]) : 3;
var lines = Directory.GetFiles(Path.Combine(args[1], "ner/uner"), "*-test.iob2", SearchOption.AllDirectories)
    .Order(StringComparer.Ordinal)
    .SelectMany(File.ReadLines)
    .Where(l => l.StartsWith("# text = ", StringComparison.Ordinal))
    .Select(l => l["# text = ".Length..])
    .ToList();

var self = Process.GetCurrentProcess();
var load = Stopwatch.StartNew();
var loadCpu = self.TotalProcessorTime;
using var model = NerModel.Load(args[0]);
load.Stop();
self.Refresh();
loadCpu = self.TotalProcessorTime - loadCpu;
var first = Stopwatch.StartNew();
var tagger = new SequenceTagger(model);
tagger.Spans([["Warm", "up"]]);
first.Stop();
Console.WriteLine($"model load: {load.Elapsed.TotalMilliseconds:F0} ms wall, {loadCpu.TotalMilliseconds:F0} ms CPU (first inference {first.Elapsed.TotalMilliseconds:F0} ms more)");

void Measure(string name, int batchLines)
{
    for (int r = 0; r < rounds; r++)
    {
        long tokens = 0, mentions = 0;
        self.Refresh();
        var cpu = self.TotalProcessorTime;
        var sw = Stopwatch.StartNew();
        for (int i = 0; i < lines.Count; i += batchLines)
        {
            var batch = lines.Skip(i).Take(batchLines)
                .Select(l => (IReadOnlyList<string>)WordTokenizer.Tokenize(l).Select(w => w.Text).ToArray()).ToList();
            tokens += batch.Sum(b => b.Count);
            foreach (var spans in tagger.Spans(batch)) mentions += spans.Length;
        }
        sw.Stop();
        self.Refresh();
        var cpuSeconds = (self.TotalProcessorTime - cpu).TotalSeconds;
        // CPU time is what one core spends; wall time also counts waiting for a core on a shared machine.
        Console.WriteLine($"{name} round {r + 1}: {tokens} tokens, {mentions} mentions, wall {sw.Elapsed.TotalSeconds:F2} s = {tokens / sw.Elapsed.TotalSeconds:F0} tokens/s, CPU {cpuSeconds:F2} s = {tokens / cpuSeconds:F0} tokens/CPU-s");
    }
}

Measure("batched (64 lines per call)", 64);
Measure("one line per call", 1);
return 0;
