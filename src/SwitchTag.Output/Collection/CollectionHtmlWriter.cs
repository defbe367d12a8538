using SwitchTag.Core.Documents;
using SwitchTag.Output.Html;
using SwitchTag.Output.Map;
using SwitchTag.Output.Report;
using SwitchTag.Output.Text;
using static SwitchTag.Output.Html.HtmlText;

namespace SwitchTag.Output.Collection;

/// <summary><c>collection.html</c>: every heading of the run with its variants and counts, the
/// interviews naming it linked to their reports (relative links, so the folder can move), a filter box
/// (a few lines of inline script, nothing fetched) and a map of the run's places.</summary>
public sealed class CollectionHtmlWriter : ICollectionWriter
{
    public string FileName => "collection.html";

    /// <summary>Hides the rows whose text does not contain what is typed (any case) and says how many show.</summary>
    private const string FilterScript =
        "const box=document.getElementById('filter'),rows=[...document.querySelectorAll('tr.row')],shown=document.getElementById('shown');\n" +
        "function filter(){const q=box.value.trim().toLowerCase();let n=0;\n" +
        "for(const r of rows){const on=!q||r.dataset.text.includes(q);r.hidden=!on;if(on)n++;}shown.textContent=n;}\n" +
        "box.addEventListener('input',filter);filter(); // a browser may restore the box's text on going back\n";

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
        var rows = CollectionRows.Of(entries);
        Html.HtmlPage.Start(b, "Collection index");
        b.Append("<h1>Collection index</h1>\n").Append(ReportHtmlWriter.CautionBlock());
        b.Append("<p>").Append(entries.Count).Append(entries.Count == 1 ? " interview, " : " interviews, ").Append(rows.Count).Append(" headings (")
         .Append(string.Join(", ", Enum.GetValues<NameLabel>().Select(l => $"{rows.Count(r => r.Label == l)} {l}"))).Append("), ")
         .Append(rows.Sum(r => r.Uses.Sum(u => u.Heading.Times.Length))).Append(" mentions. Review every interview at once in <a href=\"review.html\">review.html</a>.</p>\n");
        b.Append("<table>\n<tr><th>Interview</th><th>Main language</th><th>Duration</th><th>Headings</th></tr>\n");
        foreach (var e in entries)
            b.Append("<tr><td><a href=\"").Append(Esc(Uri.EscapeDataString(e.Folder))).Append("/index.html\">").Append(Said(e.Interview)).Append("</a></td><td>")
             .Append(Esc(LanguageNames.WithCode(e.MainLanguage))).Append("</td><td class=\"n\">").Append(Clock(e.Duration)).Append("</td><td class=\"n\">")
             .Append(e.Headings.Length).Append("</td></tr>\n");
        b.Append("</table>\n");

        b.Append("<h2 id=\"map\">Map of the collection's places</h2>\n").Append(PlaceMap.Render(Places(rows), "Places named in the collection"));

        b.Append("<h2 id=\"headings\">Headings</h2>\n<p><label>Filter: <input id=\"filter\" type=\"search\" placeholder=\"a name, variant, label or interview\"></label> ")
         .Append("<span id=\"shown\">").Append(rows.Count).Append("</span> of ").Append(rows.Count).Append(" shown</p>\n");
        b.Append("<table id=\"headings-table\">\n<tr><th>Heading</th><th>Label</th><th>Variants</th><th>Mentions</th><th>Interviews</th><th>Place</th></tr>\n");
        foreach (var row in rows)
        {
            var variants = row.Uses.SelectMany(u => u.Heading.Variants.IsDefault ? [] : u.Heading.Variants).Distinct(StringComparer.Ordinal).ToList();
            string filterText = string.Join(' ', [row.Name, row.Label.ToString(), row.Place?.Country ?? "", .. variants, .. row.Uses.Select(u => u.Entry.Interview)]).ToLowerInvariant();
            b.Append("<tr class=\"row\" id=\"").Append(Esc("c-" + row.Id.Value)).Append("\" data-text=\"").Append(Esc(filterText)).Append("\"><td>").Append(Said(row.Name))
             .Append("</td><td>").Append(row.Label).Append("</td><td class=\"variants\">").Append(string.Join(", ", variants.Select(Said)))
             .Append("</td><td class=\"n\">").Append(row.Uses.Sum(u => u.Heading.Times.Length)).Append("</td><td>")
             .Append(string.Join("<br>", row.Uses.Select(u =>
                 $"<a href=\"{Esc(Uri.EscapeDataString(u.Entry.Folder))}/index.html#{Esc(HeadingAnchor(u.Heading.Id))}\">{Said(u.Entry.Interview)}</a> " +
                 $"({u.Heading.Times.Length}; first {Clock(u.Heading.Times.IsEmpty ? default : u.Heading.Times[0])})")))
             .Append("</td><td>").Append(row.Place is null ? "" : $"{Esc(row.Place.Name)}, {Esc(row.Place.Country)}").Append("</td></tr>\n");
        }
        b.Append("</table>\n");
        Html.HtmlPage.End(b, FilterScript);
    }

    private static List<MapPlace> Places(List<CollectionRows.Row> rows) =>
        rows.Where(r => r.Place is { HasCoordinates: true })
            .Select(r => new MapPlace(r.Id.Value, r.Name, r.Place!.Latitude!.Value, r.Place.Longitude!.Value, "#" + "c-" + r.Id.Value)).ToList();
}
