using System.Globalization;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Output.Html;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.Timeline;

/// <summary>The interview's languages along time, one row per speaker, as inline SVG: one
/// <c>rect.band</c> per language span of a turn (as index.json lists them), coloured by language, so
/// a translator sees at a glance where the other-language stretches are.</summary>
public static class LanguageTimeline
{
    private const double Left = 130, Plot = 850, Row = 24, Top = 8, Axis = 22;

    /// <summary>The main language in a quiet colour, the others in distinct ones (most time first).</summary>
    public static IReadOnlyDictionary<LanguageCode, string> Colours(InterviewIndex index)
    {
        string[] palette = ["#d95f02", "#1b9e77", "#7570b3", "#e7298a", "#66a61e", "#e6ab02", "#a6761d", "#1f78b4"];
        var colours = new Dictionary<LanguageCode, string> { [index.MainLanguage] = "#a9bccc", [LanguageCode.Undetermined] = "#dddddd" };
        int next = 0;
        foreach (var share in index.Languages)
            if (!colours.ContainsKey(share.Language)) colours[share.Language] = palette[next++ % palette.Length];
        foreach (var span in index.Spans.SelectMany(s => s))
            if (!colours.ContainsKey(span.Value.Language)) colours[span.Value.Language] = palette[next++ % palette.Length];
        return colours;
    }

    public static string Render(InterviewIndex index)
    {
        double total = Math.Max(1, index.Duration.Milliseconds);
        var speakers = index.Turns.Select(t => t.Speaker ?? "").Distinct().ToList();
        var colours = Colours(index);
        double height = Top + speakers.Count * Row + Axis;
        string N(double v) => v.ToString("0.#", CultureInfo.InvariantCulture);
        double X(long ms) => Left + ms / total * Plot;

        var svg = new StringBuilder();
        svg.Append(CultureInfo.InvariantCulture, $"<svg class=\"timeline\" viewBox=\"0 0 {Left + Plot + 10:0} {height:0}\" role=\"img\" aria-label=\"Languages along time per speaker\">\n");
        for (int r = 0; r < speakers.Count; r++)
        {
            double y = Top + r * Row;
            svg.Append("<text class=\"lbl\" x=\"4\" y=\"").Append(N(y + Row * 0.65)).Append("\">")
               .Append(HtmlText.Esc(speakers[r].Length == 0 ? "(no speaker)" : Shorten(speakers[r]))).Append("</text>\n");
            svg.Append("<line class=\"axis\" x1=\"").Append(N(Left)).Append("\" x2=\"").Append(N(Left + Plot)).Append("\" y1=\"").Append(N(y + Row / 2))
               .Append("\" y2=\"").Append(N(y + Row / 2)).Append("\"/>\n");
        }
        for (int t = 0; t < index.Turns.Length && t < index.Spans.Length; t++)
        {
            double y = Top + speakers.IndexOf(index.Turns[t].Speaker ?? "") * Row + 3;
            foreach (var span in index.Spans[t])
            {
                double x = X(span.Time.Start.Milliseconds), w = Math.Max(1.2, X(span.Time.End.Milliseconds) - x);
                var language = span.Value.Language;
                svg.Append("<rect class=\"band\" data-lang=\"").Append(HtmlText.Esc(language.Code)).Append("\" x=\"").Append(N(x)).Append("\" y=\"").Append(N(y))
                   .Append("\" width=\"").Append(N(w)).Append("\" height=\"").Append(N(Row - 6)).Append("\" fill=\"").Append(colours[language]).Append("\"><title>")
                   .Append(HtmlText.Esc(LanguageNames.Of(language))).Append(' ').Append(HtmlText.Clock(span.Time.Start)).Append('–').Append(HtmlText.Clock(span.Time.End))
                   .Append("</title></rect>\n");
            }
        }
        double axisY = Top + speakers.Count * Row + 14;
        long step = TickStep((long)total);
        for (long ms = 0; ms <= total; ms += step)
            svg.Append("<text x=\"").Append(N(X(ms))).Append("\" y=\"").Append(N(axisY)).Append("\" text-anchor=\"middle\">")
               .Append(HtmlText.Clock(new Core.Time.Timecode(ms))).Append("</text>\n");
        svg.Append("</svg>\n<p class=\"legend\">");
        foreach (var (language, colour) in colours.Where(c => index.Spans.Any(s => s.Any(x => x.Value.Language == c.Key))))
            svg.Append("<span><span class=\"swatch\" style=\"background:").Append(colour).Append("\"></span>").Append(HtmlText.Esc(LanguageNames.WithCode(language))).Append("</span>");
        return svg.Append("</p>\n").ToString();
    }

    private static string Shorten(string speaker) => speaker.Length <= 18 ? speaker : speaker[..17] + "…";

    /// <summary>A round tick spacing giving at most about eight labels.</summary>
    private static long TickStep(long totalMs)
    {
        long[] steps = [10_000, 30_000, 60_000, 120_000, 300_000, 600_000, 900_000, 1_800_000, 3_600_000];
        return steps.FirstOrDefault(s => totalMs / s <= 8, 7_200_000);
    }
}
