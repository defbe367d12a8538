using System.Text;
using System.Text.Json;
using SwitchTag.Core.Stages;

namespace SwitchTag.Pipeline;

/// <summary>The <c>switchtag eval langid</c> contract (DESIGN.md): accuracy of whole-line
/// identification on DIR/&lt;code&gt;.txt (one text per line); files for unsupported codes are
/// listed as skipped.</summary>
public static class LanguageIdEvaluation
{
    public sealed record LanguageScore(double Accuracy, int N);

    public sealed record Result(double Mean, SortedDictionary<string, LanguageScore> Languages, List<string> Skipped);

    public static Result Evaluate(ILanguageSegmenter segmenter, string folder)
    {
        var supported = segmenter.Languages.Select(l => l.Code).ToHashSet(StringComparer.Ordinal);
        var scores = new SortedDictionary<string, LanguageScore>(StringComparer.Ordinal);
        var skipped = new List<string>();
        foreach (var file in Directory.GetFiles(folder, "*.txt").Order(StringComparer.Ordinal))
        {
            var code = Path.GetFileNameWithoutExtension(file);
            if (!supported.Contains(code)) { skipped.Add(code); continue; }
            int n = 0, right = 0;
            foreach (var line in File.ReadLines(file, Encoding.UTF8))
            {
                if (string.IsNullOrWhiteSpace(line)) continue;
                n++;
                if (segmenter.Identify(line).Language.Code == code) right++;
            }
            scores[code] = new LanguageScore(n == 0 ? 0 : (double)right / n, n);
        }
        double mean = scores.Count == 0 ? 0 : scores.Values.Average(s => s.Accuracy);
        return new Result(mean, scores, skipped);
    }

    public static string ToJson(Result result)
    {
        var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer))
        {
            w.WriteStartObject();
            w.WriteNumber("mean", Math.Round(result.Mean, 6));
            w.WriteStartObject("languages");
            foreach (var (code, s) in result.Languages)
            {
                w.WriteStartObject(code);
                w.WriteNumber("accuracy", Math.Round(s.Accuracy, 6));
                w.WriteNumber("n", s.N);
                w.WriteEndObject();
            }
            w.WriteEndObject();
            w.WriteStartArray("skipped");
            foreach (var code in result.Skipped) w.WriteStringValue(code);
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    public static string ToText(Result result)
    {
        var sb = new StringBuilder();
        foreach (var (code, s) in result.Languages) sb.AppendLine($"{code}\t{s.Accuracy:P1}\t{s.N}");
        sb.AppendLine($"mean\t{result.Mean:P1}");
        if (result.Skipped.Count > 0) sb.Append($"skipped\t{string.Join(" ", result.Skipped)}");
        return sb.ToString().TrimEnd();
    }
}
