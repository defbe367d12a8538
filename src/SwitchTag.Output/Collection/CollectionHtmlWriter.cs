using SwitchTag.Core.Documents;
using System.Text;
using SwitchTag.Output.Report;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.Collection;

/// <summary><c>collection.html</c>: the collection's headings as one readable page.</summary>
public sealed class CollectionHtmlWriter : ICollectionWriter
{
    public string FileName => "collection.html";

    public void Write(IReadOnlyList<CollectionEntry> entries, Stream stream) =>
        Utf8Text.Write(stream, HtmlReport.Render("Collection index", RenderMarkdown(entries)));

    public static string RenderMarkdown(IReadOnlyList<CollectionEntry> entries)
    {
        var md = new StringBuilder("# Collection index\n\n> ").Append(ReportMarkdownWriter.Caution).Append("\n\n");
        md.Append("Interviews: ").Append(string.Join(", ", entries.Select(e => MarkdownText.Escape(e.Interview)))).Append("\n\n");
        var table = new MarkdownTable(md, "| Heading | Label | Place | Interview | Times |", "| --- | --- | --- | --- | --- |");
        foreach (var row in CollectionRows.Of(entries))
            foreach (var (entry, heading) in row.Uses)
                table.Row().Append("| **").Append(MarkdownText.Escape(row.Name)).Append("** | ").Append(row.Label).Append(" | ")
                  .Append(row.Place is null ? "" : MarkdownText.Escape(row.Place.Country)).Append(" | ")
                  .Append(MarkdownText.Escape(entry.Interview)).Append(" | ")
                  .Append(string.Join(", ", heading.Times.Select(t => t.ToString()))).Append(" |\n");
        return md.ToString();
    }
}
