using System.Diagnostics;
using System.Text;
using SwitchTag.LanguageId.Model;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Training;
using SwitchTag.Core.Languages;

namespace LangIdTools;

/// <summary>Prints load time, single-thread throughput of Identify and Segment on the held-out
/// lines (repeated to a few MB), and the time for one 1 MB line.</summary>
public static class BenchCommand
{
    public static int Run(string dataRoot, string modelPath)
    {
        var loads = new List<double>();
        NgramLanguageModel? model = null;
        for (int i = 0; i < 5; i++)
        {
            var clock = Stopwatch.StartNew();
            model = NgramLanguageModel.Load(modelPath);
            loads.Add(clock.Elapsed.TotalMilliseconds);
        }
        Console.WriteLine($"model size {new FileInfo(modelPath).Length / 1048576.0:F2} MB; load ms (5 runs): {string.Join(", ", loads.Select(l => l.ToString("F0")))}");
        var segmenter = new CodeSwitchSegmenter(model!);
        var lines = LidCorpus.Load(dataRoot).Where(l => l.Split == Split.Evaluation).Select(l => l.Text).ToList();
        long bytes = lines.Sum(t => (long)Encoding.UTF8.GetByteCount(t));
        Console.WriteLine($"held-out lines: {lines.Count:N0}, {bytes / 1048576.0:F2} MB UTF-8; machine load average {File.ReadAllText("/proc/loadavg").Split(' ')[0]} on {Environment.ProcessorCount} cores");
        Report("Identify", bytes, 3, () => { foreach (var t in lines) segmenter.Identify(t); });
        Report("Segment (main en)", bytes, 3, () => { foreach (var t in lines) segmenter.Segment(t, new LanguageCode("en")); });
        // Interviews: the held-out lines in chunks of 200 (the corpus is ordered by language, so
        // most chunks hold one language and some two), and the Miami dev conversations as they are.
        var interviews = lines.Chunk(200).Select(c => (IReadOnlyList<string>)c).ToList();
        Report("Identify+Segment per line", bytes, 3, () => { foreach (var t in lines) segmenter.Segment(t, segmenter.Identify(t).Language); });
        Report("SegmentInterview (profile)", bytes, 3, () => { foreach (var i in interviews) segmenter.SegmentInterview(i); });
        var miamiPath = Path.Combine(dataRoot, SpeechGold.MiamiDev);
        if (File.Exists(miamiPath))
        {
            var conversations = SpeechGold.Load(dataRoot).Select(c => (IReadOnlyList<string>)c.Select(u => u.Text).ToList()).ToList();
            long speech = conversations.Sum(c => c.Sum(t => (long)Encoding.UTF8.GetByteCount(t)));
            Console.WriteLine($"Miami dev conversations: {conversations.Count}, {speech / 1048576.0:F2} MB UTF-8");
            Report("speech: per line", speech, 3, () => { foreach (var c in conversations) foreach (var t in c) segmenter.Segment(t, segmenter.Identify(t).Language); });
            Report("speech: SegmentInterview", speech, 3, () => { foreach (var c in conversations) segmenter.SegmentInterview(c); });
        }
        var big = BigLine(lines, 1 << 20);
        long bigBytes = Encoding.UTF8.GetByteCount(big);
        Report("Identify, one 1 MB line", bigBytes, 3, () => segmenter.Identify(big));
        Report("Segment, one 1 MB line", bigBytes, 3, () => segmenter.Segment(big, new LanguageCode("en")));
        return 0;
    }

    private static string BigLine(List<string> lines, int chars)
    {
        var sb = new StringBuilder(chars + 1000);
        for (int i = 0; sb.Length < chars; i++) sb.Append(lines[i % lines.Count]).Append(' ');
        return sb.ToString(0, chars);
    }

    private static void Report(string name, long bytes, int passes, Action pass)
    {
        var r = Throughput.Measure(bytes, passes, pass);
        Console.WriteLine($"{name,-26} {r.CpuMBps,8:F2} MB/s per CPU-second  {r.WallMBps,8:F2} MB/s wall  ({r.WallMs:F0} ms per pass)");
    }
}
