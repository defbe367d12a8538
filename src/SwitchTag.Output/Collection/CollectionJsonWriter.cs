using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using System.Text.Json;
using SwitchTag.Output.IndexJson;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.Collection;

/// <summary><c>collection.json</c> (schema <c>switchtag.collection/1</c>): every interview of the run
/// and, for every heading id, which interviews mention it and when.</summary>
public sealed class CollectionJsonWriter : ICollectionWriter
{
    public const string Schema = "switchtag.collection/1";

    public string FileName => "collection.json";

    void ICollectionWriter.Write(IReadOnlyList<CollectionEntry> entries, Stream stream) => Write(entries, stream);

    public static void Write(IReadOnlyList<CollectionEntry> entries, Stream stream)
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
            w.WriteString("mainLanguage", e.MainLanguage.Code);
            IndexJsonWriter.Seconds(w, "duration", e.Duration);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("headings");
        foreach (var row in CollectionRows.Of(entries))
        {
            w.WriteStartObject();
            w.WriteString("id", row.Id.Value);
            w.WriteString("label", row.Label.ToString());
            w.WriteString("name", row.Name);
            if (row.Place is null) w.WriteNull("place");
            else
            {
                w.WriteStartObject("place");
                if (row.Place.HasGeonameId) w.WriteNumber("geonameId", row.Place.GeonameId); else w.WriteNull("geonameId");
                JsonNumbers.WriteOrNull(w, "lat", row.Place.Latitude);
                JsonNumbers.WriteOrNull(w, "lon", row.Place.Longitude);
                w.WriteString("country", row.Place.Country);
                if (row.Place.Region is not null) w.WriteString("region", row.Place.Region);
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
                foreach (var t in heading.Times)
                {
                    w.WriteNumberValue(t.Milliseconds / 1000m);
                    // A writer over a stream keeps the whole document until disposed unless flushed.
                    if (w.BytesPending >= 1 << 16) w.Flush();
                }
                w.WriteEndArray();
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }
}
