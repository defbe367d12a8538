using System.Reflection;
using System.Text.Json;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Output.Text;
using static SwitchTag.Output.Html.HtmlText;

namespace SwitchTag.Output.Review;

/// <summary><c>review.html</c>: one page per run where a reviewer accepts, rejects, relabels, renames
/// and merges headings and mentions by clicking and exports the decisions file for the next run's
/// <c>--decisions</c>. Self-contained: the script (Review/review.js) is inline, nothing is fetched or
/// sent. The decisions this run already applied are carried into the export, since every run starts
/// again from the machine output.</summary>
public sealed class ReviewHtmlWriter : ICollectionWriter
{
    public string FileName => "review.html";

    private static readonly string Script = LoadScript();

    public void Write(IReadOnlyList<CollectionEntry> entries, Stream stream)
    {
        using var text = Utf8Text.Writer(stream);
        Render(entries, text);
    }

    public static string Render(IReadOnlyList<CollectionEntry> entries)
    {
        var text = new StringWriter();
        Render(entries, text);
        return text.ToString();
    }

    /// <summary>The page, written to <paramref name="b"/> as it is made.</summary>
    public static void Render(IReadOnlyList<CollectionEntry> entries, TextWriter b)
    {
        Html.HtmlPage.Start(b, "Review");
        b.Append("<h1>Review</h1>\n").Append(Report.ReportHtmlWriter.CautionBlock());
        b.Append("<p>Decide on the headings and the mentions held back, then export the decisions file and give it to the next run: " +
                 "<code>switchtag index ... --decisions decisions.csv</code>. The run reports which decisions applied and which no longer match. " +
                 "Headings are named by their id, mentions by their time and text, so the decisions hold when the transcript or the model changes a little.</p>\n");
        b.Append("<p><button id=\"export\">Export decisions</button> <span id=\"count\">0</span> decisions</p>\n<ol id=\"decisions\"></ol>\n")
         .Append("<textarea id=\"csv\" readonly rows=\"4\" cols=\"100\" aria-label=\"The exported decisions file\"></textarea>\n");
        foreach (var e in entries) Interview(b, e);
        b.Append("<script type=\"application/json\" id=\"prior\">").Append(PriorDecisions(entries)).Append("</script>\n");
        Html.HtmlPage.End(b, Script);
    }

    private static void Interview(TextWriter b, CollectionEntry e)
    {
        var mentions = e.Mentions.IsDefault ? [] : e.Mentions;
        b.Append("<section class=\"interview\" data-interview=\"").Append(Attr(e.Interview)).Append("\">\n<h2>").Append(Said(e.Interview))
         .Append(" <a class=\"muted\" href=\"").Append(Esc(Uri.EscapeDataString(e.Folder))).Append("/index.html\">report</a></h2>\n");
        b.Append("<table>\n<tr><th>Heading</th><th>Label</th><th>Variants</th><th>Mentions</th><th>Decide</th><th>Decided</th></tr>\n");
        foreach (var h in e.Headings)
        {
            b.Append("<tr class=\"heading\" data-id=\"").Append(Attr(h.Id.Value)).Append("\" data-original=\"").Append(Attr(h.Id.Value)).Append("\" data-name=\"").Append(Attr(h.Name))
             .Append("\" data-label=\"").Append(h.Label)
             .Append("\"><td>").Append(Said(h.Name)).Append(" <span class=\"muted\">").Append(Esc(h.Id.Value)).Append("</span></td><td>").Append(h.Label).Append("</td><td>")
             .Append(string.Join(", ", (h.Variants.IsDefault ? [] : h.Variants).Select(Said))).Append("</td><td class=\"n\">").Append(h.Times.Length).Append("</td><td>")
             .Append("<button data-act=\"accept\">Accept</button><button data-act=\"reject\">Reject</button>").Append(LabelSelect("relabel…"))
             .Append("<input data-act=\"rename\" placeholder=\"rename to…\" size=\"14\"><select data-act=\"merge\"><option value=\"\">merge into…</option></select></td><td class=\"status\"></td></tr>\n<tr class=\"mentions\"><td colspan=\"6\"><details><summary>")
             .Append(h.Times.Length).Append(h.Times.Length == 1 ? " mention" : " mentions").Append("</summary>\n<ul>\n");
            foreach (var m in mentions.Where(m => m.HeadingId == h.Id))
                b.Append("<li class=\"mention\" ").Append(Target(m)).Append('>').Append(InContext(m)).Append(' ').Append(MentionButtons()).Append(" <span class=\"status\"></span></li>\n");
            b.Append("</ul>\n</details></td></tr>\n");
        }
        b.Append("</table>\n");
        var held = mentions.Where(m => m.ReviewReason is not null).ToList();
        b.Append("<h3>Held for review (").Append(held.Count).Append(")</h3>\n");
        if (held.Count == 0) { b.Append("<p class=\"muted\">Nothing held back.</p>\n</section>\n"); return; }
        b.Append("<table>\n<tr><th>Mention in context</th><th>Label</th><th>Reason</th><th>Decide</th><th>Decided</th></tr>\n");
        foreach (var m in held)
            b.Append("<tr class=\"held\" ").Append(Target(m)).Append("><td>").Append(InContext(m)).Append("</td><td>").Append(m.Label).Append("</td><td>")
             .Append(Said(m.ReviewReason)).Append("</td><td>").Append(MentionButtons()).Append("</td><td class=\"status\"></td></tr>\n");
        b.Append("</table>\n</section>\n");
    }

    /// <summary>The attributes the script keys a mention decision by: its time in seconds and its text.</summary>
    private static string Target(CollectionMention m) =>
        $"data-time=\"{m.Time.ToSecondsString()}\" data-text=\"{Attr(m.Text)}\"";

    private static string InContext(CollectionMention m)
    {
        var c = m.Context;
        return $"<span class=\"time\">{Clock(m.Time)}</span> {(m.Speaker is null ? "" : $"<span class=\"speaker\">{Said(m.Speaker)}</span> ")}" +
               $"<span class=\"ctx\" dir=\"auto\">{Esc(c.Before)}<mark>{Esc(m.Text)}</mark>{Esc(c.After)}</span>";
    }

    private static string MentionButtons() =>
        "<button data-act=\"accept\">Accept</button><button data-act=\"reject\">Reject</button>" + LabelSelect("relabel…");

    private static string LabelSelect(string prompt) =>
        $"<select data-act=\"relabel\"><option value=\"\">{prompt}</option>" +
        string.Concat(Enum.GetNames<NameLabel>().Select(l => $"<option>{l}</option>")) + "</select>";

    /// <summary>The decisions the run applied, each once, in file order, as cell arrays; JSON escapes
    /// &lt; and &gt;, so no text can close the script element.</summary>
    private static string PriorDecisions(IReadOnlyList<CollectionEntry> entries)
    {
        var decisions = entries.SelectMany(e => e.Decisions.IsDefault ? [] : e.Decisions)
            .Distinct(ReferenceEqualityComparer.Instance).Cast<Decision>()
            .OrderBy(d => d.At.Path, StringComparer.Ordinal).ThenBy(d => d.At.Line);
        var rows = decisions.Select(d => d.Fields).Select(f => new[] { f.Action, f.Interview, f.Label, f.Name, f.Time, f.Turn, f.Char, f.Value }.Select(c => c ?? ""));
        return JsonSerializer.Serialize(rows);
    }

    private static string LoadScript()
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream("review.js")
            ?? throw new InvalidOperationException("the review script is not embedded in SwitchTag.Output");
        return new StreamReader(stream).ReadToEnd();
    }
}
