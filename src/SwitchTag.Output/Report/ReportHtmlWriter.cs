using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Output.Html;
using SwitchTag.Output.Map;
using SwitchTag.Output.Text;
using SwitchTag.Output.Timeline;
using static SwitchTag.Output.Html.HtmlText;

namespace SwitchTag.Output.Report;

/// <summary><c>index.html</c>: the interview's report as one self-contained page to navigate: the
/// caution first, contents, languages in time and words, a timeline of languages per speaker, a map of
/// the linked places, every heading linked to its mentions (each with its time, speaker and sentence),
/// the mentions held for review, the worklist and the reading notes. No script; all transcript text is
/// escaped and carries <c>dir="auto"</c>.</summary>
public sealed class ReportHtmlWriter : IInterviewWriter
{
    public string FileName => "index.html";

    private static readonly (NameLabel Label, string Id, string Title)[] Sections =
        [(NameLabel.PER, "people", "People"), (NameLabel.LOC, "places", "Places"), (NameLabel.ORG, "organisations", "Organisations")];

    public void Write(InterviewIndex index, Stream stream)
    {
        using var text = Utf8Text.Writer(stream);
        Render(index, text);
    }

    public static string Render(InterviewIndex index)
    {
        var text = new StringWriter();
        Render(index, text);
        return text.ToString();
    }

    /// <summary>The page, written to <paramref name="b"/> as it is made.</summary>
    public static void Render(InterviewIndex index, TextWriter b)
    {
        string name = index.Transcript.Id;
        HtmlPage.Start(b, $"Interview index: {name}");
        b.Append("<h1>Interview index: ").Append(Said(name)).Append("</h1>\n");
        b.Append(CautionBlock());
        Facts(b, index);
        Contents(b, index);
        Languages(b, index);
        b.Append("<section id=\"timeline\">\n<h2>Timeline of languages</h2>\n").Append(LanguageTimeline.Render(index)).Append("</section>\n");
        b.Append("<section id=\"map\">\n<h2>Map of places</h2>\n").Append(PlaceMap.Render(Places(index), $"Places named in {name}")).Append("</section>\n");
        foreach (var (label, id, title) in Sections) Headings(b, index, label, id, title);
        Review(b, index);
        Worklist(b, index);
        Notes(b, index);
        HtmlPage.End(b);
    }

    /// <summary>The caution of the Markdown report, its bold lead kept bold.</summary>
    public static string CautionBlock()
    {
        var parts = ReportMarkdownWriter.Caution.Split("**");
        return $"<div class=\"caution\" role=\"note\"><strong>{Esc(parts[1])}</strong>{Esc(parts[2])}</div>\n";
    }

    /// <summary>One marker per heading linked to a place, linking to the heading's mentions.</summary>
    public static List<MapPlace> Places(InterviewIndex index) =>
        index.Headings.Where(h => h.Place is { HasCoordinates: true })
            .Select(h => new MapPlace(h.Id.Value, h.Name, h.Place!.Latitude!.Value, h.Place.Longitude!.Value, "#" + HeadingAnchor(h.Id))).ToList();

    private static void Facts(TextWriter b, InterviewIndex index)
    {
        var source = index.Transcript.Source;
        b.Append("<ul class=\"facts\">\n")
         .Append("<li>Source: ").Append(Said(source.Path)).Append(" (").Append(source.Format.Name).Append(")</li>\n")
         .Append("<li>SHA-256: <code>").Append(Esc(source.Sha256)).Append("</code></li>\n")
         .Append("<li>Main language: ").Append(Esc(LanguageNames.WithCode(index.MainLanguage)))
         .Append(MainLanguageText.Basis(index) is { } basis ? ", " + Esc(basis) : "").Append("</li>\n")
         .Append("<li>Duration: <span class=\"time\" title=\"").Append(index.Duration).Append("\">").Append(Clock(index.Duration)).Append("</span></li>\n")
         .Append("<li>Turns: ").Append(index.Turns.Length).Append(", mentions indexed: ").Append(index.Mentions.Count(m => m.HeadingId is not null))
         .Append(", held for review: ").Append(index.Review.Length).Append("</li>\n")
         .Append("<li>Recording: ");
        if (index.Media is null) b.Append("<span class=\"muted\">not given (switchtag index --media URL makes every time open it)</span>");
        else b.Append("<a href=\"").Append(Esc(index.Media)).Append("\">").Append(Esc(index.Media)).Append("</a>; every time opens it at that second");
        b.Append("</li>\n</ul>\n");
    }

    private static void Contents(TextWriter b, InterviewIndex index)
    {
        b.Append("<nav class=\"contents\">\n<h2>Contents</h2>\n<ol>\n")
         .Append("<li><a href=\"#languages\">Languages</a></li>\n<li><a href=\"#timeline\">Timeline of languages</a></li>\n<li><a href=\"#map\">Map of places</a></li>\n");
        foreach (var (label, id, title) in Sections)
            b.Append("<li><a href=\"#").Append(id).Append("\">").Append(title).Append("</a> (").Append(index.Headings.Count(h => h.Label == label)).Append(")</li>\n");
        b.Append("<li><a href=\"#review\">For review</a> (").Append(index.Review.Length).Append(")</li>\n")
         .Append("<li><a href=\"#worklist\">Translators' worklist</a> (").Append(index.Worklist.Count(w => !w.Check)).Append(")</li>\n")
         .Append("<li><a href=\"#check-language\">Check the language</a> (").Append(index.Worklist.Count(w => w.Check)).Append(")</li>\n");
        if (!index.Diagnostics.IsEmpty) b.Append("<li><a href=\"#notes\">Reading notes</a> (").Append(index.Diagnostics.Length).Append(")</li>\n");
        b.Append("</ol>\n</nav>\n");
    }

    private static void Languages(TextWriter b, InterviewIndex index)
    {
        double total = index.Languages.Sum(s => s.Seconds);
        b.Append("<section id=\"languages\">\n<h2>Languages</h2>\n<table>\n<tr><th>Language</th><th>Time</th><th>Share of time</th><th>Words</th></tr>\n");
        foreach (var s in index.Languages)
            b.Append("<tr><td>").Append(Esc(LanguageNames.WithCode(s.Language))).Append("</td><td class=\"n\" title=\"")
             .Append(Number(s.Seconds, "0.###")).Append(" s\">").Append(Clock(s.Seconds)).Append("</td><td class=\"n\">")
             .Append(total > 0 ? Number(100 * s.Seconds / total, "0.0") + "%" : "").Append("</td><td class=\"n\">").Append(s.Words).Append("</td></tr>\n");
        b.Append("</table>\n</section>\n");
    }

    private static void Headings(TextWriter b, InterviewIndex index, NameLabel label, string id, string title)
    {
        var headings = index.Headings.Where(h => h.Label == label).ToList();
        b.Append("<section id=\"").Append(id).Append("\">\n<h2>").Append(title).Append("</h2>\n");
        if (headings.Count == 0) { b.Append("<p class=\"muted\">None found.</p>\n</section>\n"); return; }
        b.Append("<table>\n<tr><th>Heading</th><th>Variants</th><th>Mentions</th><th>First</th><th>Speakers</th><th>Place</th><th>Confidence</th></tr>\n");
        foreach (var h in headings)
        {
            b.Append("<tr><td><a class=\"heading\" href=\"#").Append(Esc(HeadingAnchor(h.Id))).Append("\">").Append(Said(h.Name)).Append("</a>")
             .Append(PossiblySame(index, h)).Append("</td><td>")
             .Append(string.Join(", ", h.Variants.Select(Said))).Append("</td><td class=\"n\">").Append(h.Mentions.Length).Append("</td><td>")
             .Append(h.Mentions.IsEmpty ? "" : TimeLink(index.MentionAt(h.Mentions[0]).Time.Start, index.Media)).Append("</td><td>")
             .Append(string.Join(", ", h.Speakers.Select(Said))).Append("</td><td>").Append(Place(h)).Append("</td><td>")
             .Append(Band(h.Confidence)).Append("</td></tr>\n");
        }
        b.Append("</table>\n");
        foreach (var h in headings)
        {
            b.Append("<section class=\"heading\" id=\"").Append(Esc(HeadingAnchor(h.Id))).Append("\">\n<h3>").Append(Said(h.Name))
             .Append(" <span class=\"muted\">").Append(h.Label).Append(", ").Append(h.Mentions.Length).Append(h.Mentions.Length == 1 ? " mention" : " mentions")
             .Append("</span></h3>\n<ol class=\"mentions\">\n");
            foreach (var m in h.Mentions) Mention(b, index, m);
            b.Append("</ol>\n</section>\n");
        }
        b.Append("</section>\n");
    }

    /// <summary>The headings the index says may be the same person (a probable merge it did not make),
    /// linked, for the reviewer to merge or leave apart.</summary>
    private static string PossiblySame(InterviewIndex index, Heading h)
    {
        var others = h.PossiblySame.Select(id => index.Headings.FirstOrDefault(o => o.Id == id)).OfType<Heading>().ToList();
        if (others.Count == 0) return "";
        return "<br><span class=\"muted possibly-same\">possibly the same person as " + string.Join(", ", others.Select(o =>
            $"<a href=\"#{Esc(HeadingAnchor(o.Id))}\">{Said(o.Name)}</a>")) + "</span>";
    }

    private static void Mention(TextWriter b, InterviewIndex index, MentionId id)
    {
        var m = index.MentionAt(id);
        b.Append("<li class=\"mention\" id=\"m-").Append(id.Index).Append("\">").Append(TimeLink(m.Time.Start, index.Media)).Append(' ');
        if (index.TurnAt(m.Mention.Turn).Speaker is { } speaker) b.Append("<span class=\"speaker\">").Append(Said(speaker)).Append("</span> ");
        b.Append(Context(index, m)).Append("</li>\n");
    }

    /// <summary>The sentence around a mention with the name marked, as one right-to-left-safe piece.</summary>
    public static string Context(InterviewIndex index, IndexedMention m)
    {
        var c = MentionContext.Of(index, m);
        return $"<span class=\"ctx\" dir=\"auto\">{Esc(c.Before)}<mark>{Esc(c.Name)}</mark>{Esc(c.After)}</span>";
    }

    private static string Place(Heading h)
    {
        string others = h.Alternatives.IsEmpty ? ""
            : "<br><span class=\"muted\">or: " + string.Join("; ", h.Alternatives.Take(5).Select(a => $"{Esc(a.Name)}, {Esc(a.Country)}")) + "</span>";
        if (h.Place is null)
            return h.Label != NameLabel.LOC ? "" : h.Alternatives.IsEmpty ? "<span class=\"muted\">not in the gazetteer</span>" : "<span class=\"muted\">not linked: may be a historical place</span>" + others;
        var p = h.Place;
        return $"{PlaceSource.Relation(h)}{Esc(p.Name)}, {Esc(p.Country)} <span class=\"muted\">({Esc(PlaceSource.Describe(h))})</span>" + others;
    }

    private static void Review(TextWriter b, InterviewIndex index)
    {
        b.Append("<section id=\"review\">\n<h2>For review</h2>\n<p>These mentions are held back from the index until a person decides " +
                 "(review.html in the output folder writes the decisions file).</p>\n");
        if (index.Review.IsEmpty) { b.Append("<p class=\"muted\">Nothing held back.</p>\n</section>\n"); return; }
        b.Append("<table>\n<tr><th>Time</th><th>Speaker</th><th>Mention in context</th><th>Label</th><th>Reason</th></tr>\n");
        foreach (var r in index.Review)
        {
            var m = index.MentionAt(r.Mention);
            b.Append("<tr id=\"m-").Append(r.Mention.Index).Append("\"><td>").Append(TimeLink(m.Time.Start, index.Media)).Append("</td><td>")
             .Append(Said(index.TurnAt(m.Mention.Turn).Speaker)).Append("</td><td>").Append(Context(index, m)).Append("</td><td>")
             .Append(m.Mention.Label).Append("</td><td>").Append(Said(r.Reason)).Append("</td></tr>\n");
        }
        b.Append("</table>\n</section>\n");
    }

    private static void Worklist(TextWriter b, InterviewIndex index)
    {
        b.Append("<section id=\"worklist\">\n<h2>Translators' worklist</h2>\n");
        WorklistTable(b, index, index.Worklist.Where(w => !w.Check).ToList(), "No stretch outside the main language was found.");
        b.Append("</section>\n<section id=\"check-language\">\n<h2>Check the language</h2>\n")
         .Append("<p class=\"muted\">Stretches whose language is too uncertain to claim: check the language before translating.</p>\n");
        WorklistTable(b, index, index.Worklist.Where(w => w.Check).ToList(), "None.");
        b.Append("</section>\n");
    }

    private static void WorklistTable(TextWriter b, InterviewIndex index, List<WorklistItem> items, string empty)
    {
        if (items.Count == 0) { b.Append("<p class=\"muted\">").Append(empty).Append("</p>\n"); return; }
        b.Append("<table>\n<tr><th>Start</th><th>End</th><th>Speaker</th><th>Language</th><th>Confidence</th><th>Text</th></tr>\n");
        foreach (var item in items)
            b.Append("<tr><td>").Append(TimeLink(item.Time.Start, index.Media)).Append("</td><td><span class=\"time\">").Append(Clock(item.Time.End))
             .Append("</span></td><td>").Append(Said(item.Speaker)).Append("</td><td>").Append(Esc(LanguageNames.WithCode(item.Language)))
             .Append("</td><td>").Append(Band(item.Confidence)).Append("</td><td>").Append(Said(item.Text)).Append("</td></tr>\n");
        b.Append("</table>\n");
    }

    private static void Notes(TextWriter b, InterviewIndex index)
    {
        if (index.Diagnostics.IsEmpty) return;
        b.Append("<section id=\"notes\">\n<h2>Reading notes</h2>\n<ul>\n");
        foreach (var d in index.Diagnostics) b.Append("<li>").Append(Said(d.ToString())).Append("</li>\n");
        b.Append("</ul>\n</section>\n");
    }
}
