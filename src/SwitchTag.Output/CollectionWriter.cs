using System.Collections.Immutable;
using System.Text;
using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Output;

/// <summary>What the collection index keeps of one interview (small, so a long run holds little).</summary>
public sealed record CollectionEntry(string Interview, string Folder, string MainLanguage, Timecode Duration, ImmutableArray<CollectionHeading> Headings)
{
    public static CollectionEntry From(InterviewIndex index, string folder) => new(
        index.Transcript.Name, folder, index.MainLanguage, index.Duration,
        index.Headings.Select(h => new CollectionHeading(h.Id, h.Label, h.Name, h.Place,
            h.Mentions.Select(i => index.Mentions[i].Time.Start).ToImmutableArray())).ToImmutableArray());
}

public sealed record CollectionHeading(string Id, NameLabel Label, string Name, PlaceLink? Place, ImmutableArray<Timecode> Times);

/// <summary><c>collection.json</c> (schema <c>switchtag.collection/1</c>) and <c>collection.html</c>:
/// for every heading id across the run, which interviews mention it and when. Headings share an id
/// across interviews when they link to one gazetteer place or fold to one key.</summary>
public static class CollectionWriter
{
    public const string Schema = "switchtag.collection/1";

    private sealed record Row(string Id, NameLabel Label, string Name, PlaceLink? Place, List<(CollectionEntry Entry, CollectionHeading Heading)> Uses);

    private static List<Row> Rows(IReadOnlyList<CollectionEntry> entries)
    {
        var rows = new Dictionary<string, Row>(StringComparer.Ordinal);
        foreach (var e in entries)
            foreach (var h in e.Headings)
            {
                if (!rows.TryGetValue(h.Id, out var row)) rows[h.Id] = row = new Row(h.Id, h.Label, h.Name, h.Place, []);
                row.Uses.Add((e, h));
            }
        return rows.Values.OrderBy(r => r.Label).ThenBy(r => r.Name, StringComparer.InvariantCultureIgnoreCase).ThenBy(r => r.Id, StringComparer.Ordinal).ToList();
    }

    public static void WriteJson(IReadOnlyList<CollectionEntry> entries, Stream stream)
    {
        using var w = new Utf8JsonWriter(stream, IndexJsonWriter.Options);
        w.WriteStartObject();
        w.WriteString("schema", Schema);
        w.WriteStartArray("interviews");
        foreach (var e in entries)
        {
            w.WriteStartObject();
            w.WriteString("interview", e.Interview);
            w.WriteString("index", $"{e.Folder}/index.json");
            w.WriteString("mainLanguage", e.MainLanguage);
            IndexJsonWriter.Seconds(w, "duration", e.Duration);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("headings");
        foreach (var row in Rows(entries))
        {
            w.WriteStartObject();
            w.WriteString("id", row.Id);
            w.WriteString("label", row.Label.ToString());
            w.WriteString("name", row.Name);
            if (row.Place is null) w.WriteNull("place");
            else
            {
                w.WriteStartObject("place");
                if (row.Place.HasGeonameId) w.WriteNumber("geonameId", row.Place.GeonameId); else w.WriteNull("geonameId");
                w.WriteNumber("lat", row.Place.Latitude);
                w.WriteNumber("lon", row.Place.Longitude);
                w.WriteString("country", row.Place.Country);
                w.WriteEndObject();
            }
            w.WriteStartArray("interviews");
            foreach (var (entry, heading) in row.Uses)
            {
                w.WriteStartObject();
                w.WriteString("interview", entry.Interview);
                w.WriteString("name", heading.Name);
                w.WriteNumber("count", heading.Times.Length);
                w.WriteStartArray("times");
                foreach (var t in heading.Times) w.WriteNumberValue(t.Milliseconds / 1000m);
                w.WriteEndArray();
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    public static string RenderMarkdown(IReadOnlyList<CollectionEntry> entries)
    {
        var md = new StringBuilder("# Collection index\n\n> ").Append(ReportMarkdownWriter.Caution).Append("\n\n");
        md.Append("Interviews: ").Append(string.Join(", ", entries.Select(Link))).Append("\n\n");
        var table = new MarkdownTable(md, "| Heading | Label | Place | Interview | Times |", "| --- | --- | --- | --- | --- |");
        foreach (var row in Rows(entries))
            foreach (var (entry, heading) in row.Uses)
                table.Row().Append("| **").Append(MarkdownText.Escape(row.Name)).Append("** | ").Append(row.Label).Append(" | ")
                  .Append(row.Place is null ? "" : MarkdownText.Escape(row.Place.Country)).Append(" | ")
                  .Append(Link(entry)).Append(" | ")
                  .Append(string.Join(", ", heading.Times.Select(t => t.ToString()))).Append(" |\n");
        return md.ToString();
    }

    /// <summary>The interview's name linking its report by a path relative to the collection page.</summary>
    private static string Link(CollectionEntry e) => $"[{MarkdownText.Escape(e.Interview)}]({Uri.EscapeDataString(e.Folder)}/index.html)";
}
